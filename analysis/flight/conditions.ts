import type { AirConditions } from './air-conditions';
import type { GroundFirmness } from './ground-run';

/**
 * The conditions a ball flies and runs in: the air (air-conditions.ts) and the firmness of the
 * ground it lands on (ground-run.ts; default normal).
 */
export interface Conditions extends AirConditions {
  firmness?: GroundFirmness;
}
