import { lieChangeForLengthChangeDeg } from './lie-for-length';

/**
 * A static-fit starting point: a length change from the maker's standard set (in) for a band of
 * player height and a band of wrist-to-floor, each band [from, to) in cm; a missing bound is open.
 * The shop edits the table; the lie change follows the length change (1° per ½ in).
 */
export interface StaticFitRow {
  heightFromCm: number | null;
  heightToCm: number | null;
  wristFromCm: number | null;
  wristToCm: number | null;
  lengthChangeIn: number;
}

export type StaticFitTable = readonly StaticFitRow[];

/**
 * The default table's plain rule, our own and common practice only as a starting point (no
 * source, never a maker's chart): standard length fits a player of about 178 cm with about
 * 86 cm from wrist crease to floor; ¼ in longer per 10 cm of height above that and per 5 cm of
 * wrist-to-floor above it (shorter below), rounded to ¼ in and kept within ±1½ in. A fitter
 * then checks the lie dynamically.
 */
export const STATIC_FIT_RULE = {
  heightMidCm: 178,
  heightStepCm: 10,
  wristMidCm: 86,
  wristStepCm: 5,
  stepIn: 0.25,
  maxChangeIn: 1.5,
} as const;

/**
 * The plain rule itself for one player: length change (in) from height and wrist-to-floor (cm).
 * O(1).
 * @example staticFitRuleIn(188, 91) // => 0.5
 */
export function staticFitRuleIn(heightCm: number, wristToFloorCm: number): number {
  const r = STATIC_FIT_RULE;
  const raw = r.stepIn * ((heightCm - r.heightMidCm) / r.heightStepCm + (wristToFloorCm - r.wristMidCm) / r.wristStepCm);
  const rounded = Math.round(raw / r.stepIn) * r.stepIn;
  return Math.max(-r.maxChangeIn, Math.min(r.maxChangeIn, rounded)) + 0; // + 0 turns −0 into 0
}

const HEIGHT_EDGES = [158, 168, 178, 188, 198];
const WRIST_EDGES = [73.5, 78.5, 83.5, 88.5, 93.5, 98.5];

/**
 * The default table: the plain rule evaluated at the middle of 5-cm wrist-to-floor bands and
 * 10-cm height bands (open bands at both ends take the rule at their inner edge ± half a band).
 * O(1): 6 × 7 rows.
 */
export function defaultStaticFitTable(): StaticFitRow[] {
  const bands = (edges: number[], width: number) => {
    const out: { from: number | null; to: number | null; mid: number }[] = [{ from: null, to: edges[0], mid: edges[0] - width / 2 }];
    for (let i = 0; i + 1 < edges.length; i++) out.push({ from: edges[i], to: edges[i + 1], mid: (edges[i] + edges[i + 1]) / 2 });
    out.push({ from: edges[edges.length - 1], to: null, mid: edges[edges.length - 1] + width / 2 });
    return out;
  };
  const rows: StaticFitRow[] = [];
  for (const h of bands(HEIGHT_EDGES, 10)) {
    for (const w of bands(WRIST_EDGES, 5)) {
      rows.push({ heightFromCm: h.from, heightToCm: h.to, wristFromCm: w.from, wristToCm: w.to, lengthChangeIn: staticFitRuleIn(h.mid, w.mid) });
    }
  }
  return rows;
}

const inBand = (value: number, from: number | null, to: number | null) => (from === null || value >= from) && (to === null || value < to);

/** A static-fit starting point. */
export interface StaticFitStart {
  lengthChangeIn: number;
  /** Follows the length change (about 1° per ½ in, common practice). */
  lieChangeDeg: number;
  /** Index of the table row used. */
  row: number;
}

/**
 * The starting point for a player's length and lie from the shop's table: the first row whose
 * height and wrist-to-floor bands hold the player's measures. Null when a measure is missing or
 * no row holds them. O(rows).
 * @throws RangeError when a measure is given but not a positive number
 * @example staticFitStart(188, 91, defaultStaticFitTable()) // => { lengthChangeIn: 0.5, lieChangeDeg: 1, row: … }
 */
export function staticFitStart(heightCm: number | null, wristToFloorCm: number | null, table: StaticFitTable): StaticFitStart | null {
  if (heightCm === null || wristToFloorCm === null) return null;
  for (const [name, v] of [['height', heightCm], ['wrist-to-floor', wristToFloorCm]] as const) {
    if (!Number.isFinite(v) || v <= 0) throw new RangeError(`${name} ${v} cm is not a positive number`);
  }
  for (let i = 0; i < table.length; i++) {
    const r = table[i];
    if (inBand(heightCm, r.heightFromCm, r.heightToCm) && inBand(wristToFloorCm, r.wristFromCm, r.wristToCm)) {
      return { lengthChangeIn: r.lengthChangeIn, lieChangeDeg: lieChangeForLengthChangeDeg(r.lengthChangeIn) + 0, row: i };
    }
  }
  return null;
}
