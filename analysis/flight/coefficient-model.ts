/**
 * A ball's aerodynamic coefficients as functions of spin ratio S = r·ω/v and Reynolds number
 * Re = ρ·v·d/μ. Drag acts against the air-relative velocity, lift (the Magnus force) along
 * ω̂ × v, each as ½·ρ·A·C·v². Implementations must be pure and cheap: they run four times per
 * integration step.
 */
export interface CoefficientModel {
  /** Short identifier, e.g. "lyu-2018". */
  readonly name: string;
  /** Where the fits come from (author, title, year). */
  readonly source: string;
  dragCoefficient(spinRatio: number, reynolds: number): number;
  liftCoefficient(spinRatio: number, reynolds: number): number;
}
