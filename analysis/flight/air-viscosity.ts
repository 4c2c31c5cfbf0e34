/**
 * Dynamic viscosity of air (Pa·s) by Sutherland's law with the ISO 2533 constants:
 * μ = βs·T^1.5 / (T + S), βs = 1.458e-6 kg/(m·s·K^0.5), S = 110.4 K. O(1).
 * https://en.wikipedia.org/wiki/Viscosity#Sutherland's_formula
 * Humidity changes air viscosity by well under 1 %, which the model ignores.
 * @throws RangeError when the temperature is not a positive finite number of kelvins
 * @example sutherlandViscosityPaS(288.15) // => 1.78938e-5
 */
export function sutherlandViscosityPaS(temperatureK: number): number {
  if (!(temperatureK > 0) || !Number.isFinite(temperatureK)) throw new RangeError(`temperature ${temperatureK} K is not valid`);
  return (1.458e-6 * Math.pow(temperatureK, 1.5)) / (temperatureK + 110.4);
}
