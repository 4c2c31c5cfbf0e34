import { clubInfo } from '@/analysis/clubs';

/** Counts past which a wedge gets a reminder; the shop sets them. */
export interface WedgeWearLimits {
  rounds: number;
  practiceSessions: number;
}

/**
 * Our default until the shop sets its own. Common practice, no source: grooves wear with use,
 * so heavy users replace wedges more than once a year; 75 rounds or 100 practice sessions is a
 * plain starting point of ours.
 */
export const DEFAULT_WEDGE_WEAR_LIMITS: WedgeWearLimits = { rounds: 75, practiceSessions: 100 };

/** A wedge past a wear count. */
export interface WedgeWearReminder {
  over: ('rounds' | 'practice')[];
  roundsSince: number;
  practiceSessionsSince: number;
}

/**
 * The reminder for a wedge whose rounds or practice sessions since it went in have passed the
 * shop's counts (strictly more than the count); null for other clubs or below the counts. O(1).
 * @example wedgeWearReminder('W56', 80, 10, { rounds: 75, practiceSessions: 100 })?.over // => ['rounds']
 */
export function wedgeWearReminder(club: string, roundsSince: number, practiceSessionsSince: number, limits: WedgeWearLimits): WedgeWearReminder | null {
  if (clubInfo(club)?.kind !== 'wedge') return null;
  const over: WedgeWearReminder['over'] = [];
  if (roundsSince > limits.rounds) over.push('rounds');
  if (practiceSessionsSince > limits.practiceSessions) over.push('practice');
  return over.length ? { over, roundsSince, practiceSessionsSince } : null;
}
