import type { ShotField, ShotValues } from '@/analysis/fields';
import type { Conditions } from './conditions';
import { launchFromShot } from './launch-from-shot';
import { simulateFlight, type FlightOptions, type FlightResult } from './simulate-flight';

/**
 * Below this ball speed the model fills nothing: the coefficient fits describe full-swing
 * flight (Lyu et al. 2018 measured Reynolds numbers from 5·10⁴ up, about 17 m/s at sea level),
 * and a chip or a putt rolls more than it flies.
 */
export const MIN_FILL_BALL_SPEED_MPS = 15;

/** The shot fields the ball-flight model can supply, in the order they are listed when derived. */
export const FLIGHT_FIELDS = ['carry', 'total', 'offline', 'apexHeight', 'descentAngle', 'flightTime'] as const;

export type FlightField = (typeof FLIGHT_FIELDS)[number];

/**
 * A flight result's value for a shot field, in canonical units (carry → carryM, …). O(1).
 * @example flightFieldValue(simulateFlight(launch), 'apexHeight') // => its apexHeightM
 */
export function flightFieldValue(flight: FlightResult, field: FlightField): number {
  switch (field) {
    case 'carry': return flight.carryM;
    case 'total': return flight.totalM;
    case 'offline': return flight.offlineM;
    case 'apexHeight': return flight.apexHeightM;
    case 'descentAngle': return flight.descentAngleDeg;
    case 'flightTime': return flight.flightTimeS;
  }
}

/**
 * Fill a shot's missing carry, total, offline, apexHeight, descentAngle and flightTime from the
 * ball-flight model, in the conditions the shot was hit in (`conditions`: the air, default the
 * ISO 2533 sea-level atmosphere, and the ground firmness for total, default normal). A missing
 * total is the shot's measured carry (or the model's) plus the model's roll. Values present are left untouched; offline is filled only when the shot has
 * both its launch direction and its spin axis (spinAxis, or backSpin with sideSpin), since
 * without them the model's offline would be a guess. Returns the input unchanged (same
 * object, no derived fields) when ball speed, launch angle or spin is missing, or nothing is
 * missing. O(one trajectory).
 * @throws RangeError when a launch or air value is out of range (e.g. humidity 120 %)
 * @example fillFlightFields({ ballSpeed: 74.65, launchAngle: 10.9, spinRate: 2686 })
 *   // => { values: { …, carry: 256.7, total: 281.0, apexHeight: 32.9, descentAngle: 41.8, flightTime: 7.2 },
 *   //      derived: ['carry', 'total', 'apexHeight', 'descentAngle', 'flightTime'] }
 */
export function fillFlightFields(
  values: ShotValues,
  conditions?: Conditions,
  options?: FlightOptions,
): { values: ShotValues; derived: ShotField[] } {
  const shot = launchFromShot(values);
  if (!shot || shot.launch.ballSpeedMps < MIN_FILL_BALL_SPEED_MPS || shot.launch.launchAngleDeg <= 0) return { values, derived: [] };
  const missing = FLIGHT_FIELDS.filter((field) => values[field] === undefined && (field !== 'offline' || shot.sideKnown));
  if (missing.length === 0) return { values, derived: [] };
  const flight = simulateFlight(shot.launch, conditions, options);
  const filled: ShotValues = { ...values };
  for (const field of missing) {
    filled[field] = field === 'total' && values.carry !== undefined ? values.carry + flight.rollM : flightFieldValue(flight, field);
  }
  return { values: filled, derived: missing };
}
