import type { CoefficientModel } from './coefficient-model';

/*
 * Smits & Smith, "A new aerodynamic model of a golf ball in flight", Science and Golf II (1994),
 * as quoted by secondary sources (from memory): CD ≈ 0.24 + 0.18·S, CL ≈ 0.54·S^0.4, fitted
 * for 0.08 < S < 0.2 at Reynolds numbers above the drag crisis. Used unchanged outside that
 * range.
 */

/**
 * Smits & Smith (1994) drag: CD = 0.24 + 0.18·S (S ≥ 0). O(1).
 * @example smitsSmithDragCoefficient(0.1) // => 0.258
 */
export function smitsSmithDragCoefficient(spinRatio: number): number {
  return 0.24 + 0.18 * (spinRatio > 0 ? spinRatio : 0);
}

/**
 * Smits & Smith (1994) lift: CL = 0.54·S^0.4 (0 at S ≤ 0). O(1).
 * @example smitsSmithLiftCoefficient(0.1) // => 0.21498
 */
export function smitsSmithLiftCoefficient(spinRatio: number): number {
  return spinRatio > 0 ? 0.54 * Math.pow(spinRatio, 0.4) : 0;
}

/** Smits & Smith (1994): drag and lift from spin ratio alone. */
export const smitsSmithCoefficients: CoefficientModel = {
  name: 'smits-smith-1994',
  source: 'Smits & Smith, A new aerodynamic model of a golf ball in flight, Science and Golf II, 1994',
  dragCoefficient: (spinRatio) => smitsSmithDragCoefficient(spinRatio),
  liftCoefficient: (spinRatio) => smitsSmithLiftCoefficient(spinRatio),
};
