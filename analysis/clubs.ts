/**
 * Canonical club codes and their order in a bag, longest club first.
 * DR; 2W–9W fairway woods; 2H–7H hybrids; 1I–9I irons; PW, GW, SW, LW; W46–W64 a wedge known
 * only by loft; PT the putter.
 */
export type ClubKind = 'driver' | 'wood' | 'hybrid' | 'iron' | 'wedge' | 'putter';

export interface ClubInfo {
  code: string;
  kind: ClubKind;
  /** Sort key: smaller is longer (driver first, putter last). */
  order: number;
  /** A typical loft in degrees, for ordering and display only (common practice, no source). */
  typicalLoftDeg: number;
  label: string;
}

const TYPICAL_IRON_LOFT: Record<number, number> = {
  1: 16, 2: 18, 3: 20, 4: 22, 5: 25, 6: 28, 7: 32, 8: 36, 9: 40,
};
const TYPICAL_WOOD_LOFT: Record<number, number> = {
  2: 13, 3: 15, 4: 16.5, 5: 18, 6: 19.5, 7: 21, 8: 22.5, 9: 24,
};
const TYPICAL_HYBRID_LOFT: Record<number, number> = {
  2: 17, 3: 19, 4: 22, 5: 25, 6: 28, 7: 31,
};
const NAMED_WEDGES: Record<string, { loft: number; label: string }> = {
  PW: { loft: 45, label: 'Pitching wedge' },
  GW: { loft: 50, label: 'Gap wedge' },
  SW: { loft: 56, label: 'Sand wedge' },
  LW: { loft: 60, label: 'Lob wedge' },
};

/** Information about a canonical club code, or null when the code is not canonical. */
export function clubInfo(code: string): ClubInfo | null {
  if (code === 'DR') return { code, kind: 'driver', order: 0, typicalLoftDeg: 10.5, label: 'Driver' };
  if (code === 'PT') return { code, kind: 'putter', order: 1000, typicalLoftDeg: 3, label: 'Putter' };
  let m = /^([2-9])W$/.exec(code);
  if (m) {
    const n = Number(m[1]);
    return { code, kind: 'wood', order: TYPICAL_WOOD_LOFT[n], typicalLoftDeg: TYPICAL_WOOD_LOFT[n], label: `${n} wood` };
  }
  m = /^([2-7])H$/.exec(code);
  if (m) {
    const n = Number(m[1]);
    return { code, kind: 'hybrid', order: TYPICAL_HYBRID_LOFT[n] + 0.2, typicalLoftDeg: TYPICAL_HYBRID_LOFT[n], label: `${n} hybrid` };
  }
  m = /^([1-9])I$/.exec(code);
  if (m) {
    const n = Number(m[1]);
    return { code, kind: 'iron', order: TYPICAL_IRON_LOFT[n] + 0.4, typicalLoftDeg: TYPICAL_IRON_LOFT[n], label: `${n} iron` };
  }
  const named = NAMED_WEDGES[code];
  if (named) return { code, kind: 'wedge', order: named.loft + 0.6, typicalLoftDeg: named.loft, label: named.label };
  m = /^W(\d\d)$/.exec(code);
  if (m) {
    const loft = Number(m[1]);
    if (loft >= 46 && loft <= 64) {
      return { code, kind: 'wedge', order: loft + 0.8, typicalLoftDeg: loft, label: `${loft}° wedge` };
    }
  }
  return null;
}

/** Every canonical code, in bag order. */
export const CLUB_CODES: readonly string[] = [
  'DR',
  ...[2, 3, 4, 5, 6, 7, 8, 9].map((n) => `${n}W`),
  ...[2, 3, 4, 5, 6, 7].map((n) => `${n}H`),
  ...[1, 2, 3, 4, 5, 6, 7, 8, 9].map((n) => `${n}I`),
  'PW', 'GW', 'SW', 'LW',
  ...Array.from({ length: 19 }, (_, i) => `W${46 + i}`),
  'PT',
].sort((a, b) => clubInfo(a)!.order - clubInfo(b)!.order);

/** Compare two club codes in bag order; unknown codes go last, by name. */
export function compareClubs(a: string, b: string): number {
  const ia = clubInfo(a);
  const ib = clubInfo(b);
  if (ia && ib) return ia.order - ib.order || a.localeCompare(b);
  if (ia) return -1;
  if (ib) return 1;
  return a.localeCompare(b);
}
