import { isaDensityKgM3, isaPressurePa, isaTemperatureK } from '@/analysis/flight';

// ISO 2533:1975 / ICAO standard atmosphere: sea-level values are the standard's definitions;
// the altitude values are computed from its troposphere formula.
describe('standard atmosphere', () => {
  it('isaDensityKgM3 at sea level gives the defined 1.225 kg/m³, 288.15 K, 101 325 Pa', () => {
    expect(isaTemperatureK(0)).toBe(288.15);
    expect(isaPressurePa(0)).toBe(101325);
    expect(isaDensityKgM3(0)).toBeCloseTo(1.225, 6);
  });
  it.each([
    [1000, 89874.6, 1.11164],
    [1609.344, 83427.6, 1.04662],
    [2000, 79495.2, 1.00649],
  ])('isaPressurePa and isaDensityKgM3 at %d m give %d Pa and %d kg/m³', (altitudeM, pressurePa, densityKgM3) => {
    expect(isaPressurePa(altitudeM)).toBeCloseTo(pressurePa, 1);
    expect(isaDensityKgM3(altitudeM)).toBeCloseTo(densityKgM3, 5);
  });
  it('isaTemperatureK at 1000 m falls by the 6.5 K/km lapse rate', () => {
    expect(isaTemperatureK(1000)).toBeCloseTo(281.65, 10);
  });
  it('isaPressurePa above the troposphere throws', () => {
    expect(() => isaPressurePa(12000)).toThrow(RangeError);
    expect(() => isaPressurePa(Number.NaN)).toThrow(RangeError);
  });
});
