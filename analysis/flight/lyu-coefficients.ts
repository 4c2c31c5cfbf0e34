import type { CoefficientModel } from './coefficient-model';

/*
 * Lyu, Kensrud, Smith & Tosaya, "Aerodynamics of Golf Balls in Still Air", Proceedings 2(6):238
 * (2018): fits averaged over 13 balls.
 * Lift: CL = 1.99·S − 3.25·S². The quadratic peaks at S = 1.99/6.5 ≈ 0.306 and would fall beyond
 * it, which is an artefact of the fit rather than measured behaviour, so CL is held at its peak
 * for larger S (and is 0 at S ≤ 0).
 * Drag (Reynolds number only): low branch 1.29e-10·Re² − 2.59e-5·Re + 1.50 (fitted on 5e4–1e5),
 * high branch 1.91e-11·Re² − 5.40e-6·Re + 0.56 (7.5e4–2e5). The branches overlap and cross at
 * Re ≈ 81 210, where this model switches so that CD is continuous; Re is clamped to 5e4…2e5.
 */

const LIFT_PEAK_SPIN_RATIO = 1.99 / (2 * 3.25);
const LIFT_PEAK = 1.99 * LIFT_PEAK_SPIN_RATIO - 3.25 * LIFT_PEAK_SPIN_RATIO * LIFT_PEAK_SPIN_RATIO;
/** Crossing of the two drag branches: root of 1.099e-10·Re² − 2.05e-5·Re + 0.94 in the overlap. */
export const LYU_DRAG_BRANCH_SWITCH_RE = (2.05e-5 - Math.sqrt(2.05e-5 * 2.05e-5 - 4 * 1.099e-10 * 0.94)) / (2 * 1.099e-10);
const RE_MIN = 5e4;
const RE_MAX = 2e5;

/**
 * Lyu et al. (2018) lift fit, CL = 1.99·S − 3.25·S², held at its peak above S ≈ 0.306. O(1).
 * https://doi.org/10.3390/proceedings2060238
 * @example lyuLiftCoefficient(0.2) // => 0.268
 */
export function lyuLiftCoefficient(spinRatio: number): number {
  if (spinRatio <= 0) return 0;
  if (spinRatio >= LIFT_PEAK_SPIN_RATIO) return LIFT_PEAK;
  return 1.99 * spinRatio - 3.25 * spinRatio * spinRatio;
}

/**
 * Lyu et al. (2018) drag fit in Reynolds number (a ball with little spin), two branches joined
 * where they cross, Re clamped to 5e4…2e5. O(1).
 * https://doi.org/10.3390/proceedings2060238
 * @example lyuDragCoefficient(1.5e5) // => 0.17975
 */
export function lyuDragCoefficient(reynolds: number): number {
  const re = reynolds < RE_MIN ? RE_MIN : reynolds > RE_MAX ? RE_MAX : reynolds;
  if (re < LYU_DRAG_BRANCH_SWITCH_RE) return 1.29e-10 * re * re - 2.59e-5 * re + 1.5;
  return 1.91e-11 * re * re - 5.4e-6 * re + 0.56;
}

/**
 * Lyu et al. (2018) as a whole: drag from Reynolds number alone, lift from spin ratio. Its drag
 * describes a ball with little spin, so it carries fast, spinning launches too far; kept for
 * comparison, not the default.
 */
export const lyuCoefficients: CoefficientModel = {
  name: 'lyu-2018',
  source: 'Lyu, Kensrud, Smith & Tosaya, Aerodynamics of Golf Balls in Still Air, Proceedings 2(6):238, 2018',
  dragCoefficient: (_spinRatio, reynolds) => lyuDragCoefficient(reynolds),
  liftCoefficient: (spinRatio) => lyuLiftCoefficient(spinRatio),
};
