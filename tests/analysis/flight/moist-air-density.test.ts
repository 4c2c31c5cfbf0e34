import { isaDensityKgM3, moistAirDensityKgM3, saturationVapourPressurePa } from '@/analysis/flight';

// Picard, Davis, Gläser & Fujii, "Revised formula for the density of moist air (CIPM-2007)",
// Metrologia 45:149 (2008); values computed from the published formula.
describe('moistAirDensityKgM3', () => {
  it('moistAirDensityKgM3 at 20 °C, 101 325 Pa, 50 % RH gives 1.19931 kg/m³', () => {
    expect(moistAirDensityKgM3(293.15, 101325, 50)).toBeCloseTo(1.19931, 5);
  });
  it('moistAirDensityKgM3 of dry air at 20 °C, 101 325 Pa gives 1.20456 kg/m³', () => {
    expect(moistAirDensityKgM3(293.15, 101325, 0)).toBeCloseTo(1.20456, 5);
  });
  it('saturationVapourPressurePa at 20 °C gives 2339.16 Pa', () => {
    expect(saturationVapourPressurePa(293.15)).toBeCloseTo(2339.16, 2);
  });
  // ISO 2533 sea level (1.225 kg/m³) uses an ideal gas of fixed molar mass; CIPM-2007 adds
  // compressibility and CO₂, so the two agree only to about 0.05 %.
  it('moistAirDensityKgM3 of dry air at ISO sea level lies within 0.05 % of 1.225 kg/m³', () => {
    expect(Math.abs(moistAirDensityKgM3(288.15, 101325, 0) / isaDensityKgM3(0) - 1)).toBeLessThan(5e-4);
  });
  it('moistAirDensityKgM3 falls as humidity rises (water vapour is lighter than air)', () => {
    const densities = [0, 25, 50, 75, 100].map((rh) => moistAirDensityKgM3(303.15, 101325, rh));
    for (let i = 1; i < densities.length; i++) expect(densities[i]).toBeLessThan(densities[i - 1]);
  });
  it('moistAirDensityKgM3 with a humidity above 100 % throws', () => {
    expect(() => moistAirDensityKgM3(293.15, 101325, 120)).toThrow(RangeError);
    expect(() => moistAirDensityKgM3(293.15, 0, 50)).toThrow(RangeError);
  });
});
