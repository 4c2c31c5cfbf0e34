import type { CoefficientModel } from './coefficient-model';
import { lyuLiftCoefficient } from './lyu-coefficients';
import { smitsSmithDragCoefficient } from './smits-smith-coefficients';

/*
 * The default ball: drag from Smits & Smith (1994), CD = 0.24 + 0.18·S, and lift from Lyu,
 * Kensrud, Smith & Tosaya (2018), CL = 1.99·S − 3.25·S² (held at its peak above S ≈ 0.306).
 * Why this pair:
 * - drag must rise with spin ratio; Lyu et al.'s drag fit is in Reynolds number alone (a ball
 *   with little spin) and carries a tour-speed driver about 30 yd past the commonly quoted
 *   figure. Smits & Smith's drag rises with S and lies within 0.007 of Bearman & Harvey's
 *   wind-tunnel CD (Aeronautical Quarterly 27, 1976, Figs 7–8) at 55.2 m/s, 2000–3000 rpm;
 * - Lyu et al.'s lift lies within 0.015 of Bearman & Harvey's CL at the same points, where
 *   Smits & Smith's 0.54·S^0.4 is about 0.04 higher (and gives driver apexes well above the
 *   commonly quoted ones).
 * Neither fit has a Reynolds-number term, so the model ignores the drag crisis: it is meant for
 * full swings (ball speed above about 25 m/s), not chips.
 * The choice is pluggable: pass another CoefficientModel to simulateFlight.
 */

/** Default coefficient model: Smits & Smith (1994) drag with Lyu et al. (2018) lift. */
export const defaultCoefficients: CoefficientModel = {
  name: 'smits-smith-drag-lyu-lift',
  source:
    'drag: Smits & Smith, Science and Golf II, 1994; lift: Lyu, Kensrud, Smith & Tosaya, Proceedings 2(6):238, 2018',
  dragCoefficient: (spinRatio) => smitsSmithDragCoefficient(spinRatio),
  liftCoefficient: (spinRatio) => lyuLiftCoefficient(spinRatio),
};
