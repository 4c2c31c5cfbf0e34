import type { ClubKind } from '@/analysis/clubs';
import type { Conditions } from './conditions';
import { optimiseLaunch, type LaunchOptimum, type OptimiseOptions, type WindowObjective } from './optimise-launch';

/*
 * What a launch window aims at, per kind of club (common practice, no source — fitters optimise
 * different things with different clubs):
 * - driver and woods: the most total (carry and roll) at the player's course for the ball speed,
 *   among launches landing at least 35° steep (RUN_MODEL_MIN_DESCENT_DEG: assumed, the run
 *   model's bounce laws were fitted on approach-shot landings; flatter, low-spin landings make it
 *   run implausibly far, so the window keeps to where it can speak);
 * - hybrids and irons: the most carry among launches that land steep enough to hold a green — a
 *   descent-angle floor, editable; about 45° is often quoted for mid irons, and 40° is taken here
 *   for hybrids;
 * - wedges (and the putter): no window; their spin and descent are shown as they are.
 */

/** Default descent floors (deg), common practice, no source. */
export const DEFAULT_DESCENT_FLOOR_DEG: Readonly<Record<'hybrid' | 'iron', number>> = { hybrid: 40, iron: 45 };

/** Flattest landing (deg) the run model is trusted with when a window maximises total. Assumed. */
export const RUN_MODEL_MIN_DESCENT_DEG = 35;

/** The objective of a kind of club's window, or null when the kind has none (wedge, putter). */
export interface ClubWindowAim {
  objective: WindowObjective;
  minDescentDeg: number | null;
}

/**
 * The aim of a kind of club's launch window. O(1).
 * @example clubWindowAim('iron') // => { objective: 'carry', minDescentDeg: 45 }
 */
export function clubWindowAim(kind: ClubKind, descentFloorDeg?: number): ClubWindowAim | null {
  switch (kind) {
    case 'driver':
    case 'wood':
      return { objective: 'total', minDescentDeg: descentFloorDeg ?? RUN_MODEL_MIN_DESCENT_DEG };
    case 'hybrid':
    case 'iron':
      return { objective: 'carry', minDescentDeg: descentFloorDeg ?? DEFAULT_DESCENT_FLOOR_DEG[kind] };
    default:
      return null;
  }
}

/**
 * The launch window of a kind of club at a ball speed in the given conditions (air and ground),
 * or null for a wedge or a putter. O(optimiseLaunch).
 * @throws RangeError as optimiseLaunch
 * @example launchWindowForClub('driver', 74.65, { firmness: 'firm' })?.objective // => 'total'
 */
export function launchWindowForClub(
  kind: ClubKind,
  ballSpeedMps: number,
  conditions: Conditions = {},
  options: OptimiseOptions & { descentFloorDeg?: number } = {},
): LaunchOptimum | null {
  const aim = clubWindowAim(kind, options.descentFloorDeg);
  if (!aim) return null;
  return optimiseLaunch(ballSpeedMps, conditions, { ...options, objective: aim.objective, minDescentDeg: aim.minDescentDeg ?? undefined });
}
