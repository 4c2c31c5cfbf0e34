import type { CoefficientModel } from './coefficient-model';
import { lyuCoefficients, lyuLiftCoefficient } from './lyu-coefficients';
import { modernBallCoefficients } from './modern-ball-coefficients';
import { smitsSmithCoefficients, smitsSmithDragCoefficient } from './smits-smith-coefficients';

/*
 * Why the modern ball is the default: its drag has the two dependences a real ball's has — it
 * rises with spin ratio (Bearman & Harvey 1976, Figs 7–8) and it rises steeply below
 * Re ≈ 1·10⁵, the drag crisis (Jenkins et al. 2018; Lyu et al. 2018) — at the level of a modern
 * ball (CD ≈ 0.215 at driver launch). The earlier default, Smits & Smith's drag with Lyu's lift
 * (kept below as "smits-smith-drag-lyu-lift" for comparison), has a 1970s ball's drag level
 * (0.255 at driver launch) and no Reynolds term: against the published trajectory model it
 * carried drivers 6–8 % short and wedges 6–10 % long.
 * The choice is pluggable: pass another CoefficientModel to simulateFlight, or pick one by name.
 */

/**
 * The earlier default: Smits & Smith (1994) drag, CD = 0.24 + 0.18·S, with Lyu et al. (2018)
 * lift held at its peak above S ≈ 0.306. Kept for comparison.
 */
export const smitsSmithDragLyuLiftCoefficients: CoefficientModel = {
  name: 'smits-smith-drag-lyu-lift',
  source:
    'drag: Smits & Smith, Science and Golf II, 1994; lift: Lyu, Kensrud, Smith & Tosaya, Proceedings 2(6):238, 2018',
  dragCoefficient: (spinRatio) => smitsSmithDragCoefficient(spinRatio),
  liftCoefficient: (spinRatio) => lyuLiftCoefficient(spinRatio),
};

/** Default coefficient model: the modern ball (modern-ball-coefficients.ts). */
export const defaultCoefficients: CoefficientModel = modernBallCoefficients;

/** Every coefficient model by name, for comparison (`npm run flight -- --model NAME`). */
export const COEFFICIENT_MODELS: Readonly<Record<string, CoefficientModel>> = {
  [modernBallCoefficients.name]: modernBallCoefficients,
  [smitsSmithDragLyuLiftCoefficients.name]: smitsSmithDragLyuLiftCoefficients,
  [smitsSmithCoefficients.name]: smitsSmithCoefficients,
  [lyuCoefficients.name]: lyuCoefficients,
};

/**
 * A coefficient model by its name. O(1).
 * @throws RangeError when no model has that name
 * @example coefficientModel('smits-smith-drag-lyu-lift').name // => 'smits-smith-drag-lyu-lift'
 */
export function coefficientModel(name: string): CoefficientModel {
  const model = Object.prototype.hasOwnProperty.call(COEFFICIENT_MODELS, name) ? COEFFICIENT_MODELS[name] : undefined;
  if (!model) throw new RangeError(`no coefficient model "${name}"; known: ${Object.keys(COEFFICIENT_MODELS).join(', ')}`);
  return model;
}
