import { clubInfo } from '@/analysis/clubs';
import type { BagLadderRung, CarrySource, GapFlag, LoftStepFlag } from '@/analysis/ladder';
import { fromCanonical, type UnitSystem } from '@/analysis/units';
import { specNumber } from './spec-rows';

/** The figures behind one chosen build, from the fitting's analysis (canonical units). */
export interface ChoiceFigures {
  /** Kept shots of the chosen build. */
  n: number;
  carryMedianM: number | null;
  carryQ1M: number | null;
  carryQ3M: number | null;
  carrySdM: number | null;
  offlineSdM: number | null;
  /** The 95 % oval's width across and length along the line (m). */
  ovalWidthM: number | null;
  ovalLengthM: number | null;
  /** Against the club's other build with the most shots, if any. */
  rival: { label: string; carryDiffM: number; carryDiffCi95M: [number, number]; offlineSdRatio: number | null } | null;
  /**
   * On-target odds of the next shot (fairway, green) and the head-to-head's one-sentence summary
   * against the rival; null when the analysis cannot give them (too few shots, no rival).
   */
  onTargetOdds: { fairwayWidthM: number; fairway: number; greenRadiusM: number; green: number } | null;
  summary: string | null;
}

/** A distance in the user's units, rounded to whole yards or metres: "183 yd". */
export function distanceText(m: number, units: UnitSystem): string {
  const unit = units === 'imperial' ? 'yd' : 'm';
  return `${Math.round(fromCanonical(m, unit, 'carry'))} ${unit}`;
}

const signedDistance = (m: number, units: UnitSystem) => {
  const text = distanceText(Math.abs(m), units);
  return Math.round(fromCanonical(Math.abs(m), units === 'imperial' ? 'yd' : 'm', 'carry')) === 0 ? text : `${m < 0 ? '−' : '+'}${text}`;
};

/**
 * The figures of a chosen build as short lines in plain words, for the page, the PDF and the
 * e-mail alike. O(1).
 * @example figureLines(figures, 'imperial')[0] // => 'Carry 183 yd (middle half 178–187 yd), from 10 shots'
 */
export function figureLines(f: ChoiceFigures, units: UnitSystem): string[] {
  const lines: string[] = [];
  if (f.carryMedianM !== null) {
    const half = f.carryQ1M !== null && f.carryQ3M !== null ? ` (middle half ${distanceText(f.carryQ1M, units).replace(/ \w+$/, '')}–${distanceText(f.carryQ3M, units)})` : '';
    lines.push(`Carry ${distanceText(f.carryMedianM, units)}${half}, from ${f.n} shot${f.n === 1 ? '' : 's'}`);
  }
  const spread = [
    f.carrySdM !== null ? `carry within ±${distanceText(f.carrySdM, units)} (one sd)` : null,
    f.offlineSdM !== null ? `side to side ±${distanceText(f.offlineSdM, units)}` : null,
  ].filter(Boolean);
  if (spread.length) lines.push(`Spread: ${spread.join(', ')}`);
  if (f.ovalWidthM !== null && f.ovalLengthM !== null) lines.push(`95 % oval ${distanceText(f.ovalWidthM, units)} wide, ${distanceText(f.ovalLengthM, units)} long`);
  if (f.rival) {
    const [lo, hi] = f.rival.carryDiffCi95M;
    const name = f.rival.label === '' ? 'the build with no name' : f.rival.label;
    let line = `Against ${name}: carry ${signedDistance(f.rival.carryDiffM, units)} (95 % interval ${signedDistance(lo, units)} to ${signedDistance(hi, units)})`;
    if (f.rival.offlineSdRatio !== null) line += `, side-to-side spread ${specNumber(Math.round(f.rival.offlineSdRatio * 100) / 100)}× as wide`;
    lines.push(line);
  }
  if (f.onTargetOdds) {
    const o = f.onTargetOdds;
    lines.push(`On target: ${Math.round(o.fairway * 100)} % in a ${distanceText(o.fairwayWidthM, units)} fairway, ${Math.round(o.green * 100)} % on a green of ${distanceText(o.greenRadiusM, units)} radius`);
  }
  if (f.summary) lines.push(f.summary);
  return lines;
}

export const CARRY_SOURCE_WORDS: Readonly<Record<CarrySource, string>> = { hit: 'hit in a fitting', entered: 'entered', estimate: 'estimate' };
const GAP_WORDS: Readonly<Record<Exclude<GapFlag, null>, string>> = { tight: 'tight', wide: 'wide', reversed: 'reversed' };
const LOFT_WORDS: Readonly<Record<Exclude<LoftStepFlag, null>, string>> = { tight: 'tight', wide: 'wide' };

/** One row of the ladder table, as text. */
export interface LadderTextRow {
  id: string;
  club: string;
  loft: string;
  carry: string;
  from: string;
  gap: string;
  loftStep: string;
  flagged: boolean;
}

/**
 * The bag's ladder as table rows of text: club, loft, carry, where the carry comes from, the gap
 * and loft step to the next club with their flag words. O(n).
 * @example ladderTextRows(ladder, {}, 'imperial')[0].gap // => '14 yd'
 */
export function ladderTextRows(ladder: readonly BagLadderRung[], labels: Readonly<Record<string, string>>, units: UnitSystem): LadderTextRow[] {
  return ladder.map((r) => ({
    id: r.id,
    club: labels[r.id] ?? clubInfo(r.club)?.label ?? r.club,
    loft: r.loftDeg === null ? '–' : `${specNumber(r.loftDeg)}°`,
    carry: r.carryM === null ? '–' : distanceText(r.carryM, units),
    from: r.carrySource === null ? 'no carry yet' : CARRY_SOURCE_WORDS[r.carrySource],
    gap: r.gapToNextM === null ? '' : `${distanceText(r.gapToNextM, units)}${r.gapFlag ? ` · ${GAP_WORDS[r.gapFlag]}` : ''}`,
    loftStep: r.loftStepToNextDeg === null ? '' : `${specNumber(r.loftStepToNextDeg)}°${r.loftStepFlag ? ` · ${LOFT_WORDS[r.loftStepFlag]}` : ''}`,
    flagged: r.gapFlag !== null || r.loftStepFlag !== null,
  }));
}
