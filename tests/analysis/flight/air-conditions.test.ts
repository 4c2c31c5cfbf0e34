import { isaDensityKgM3, moistAirDensityKgM3, resolveAir } from '@/analysis/flight';

describe('resolveAir', () => {
  // Defaults are the ISO 2533 sea-level atmosphere (288.15 K, 101 325 Pa, dry).
  it('resolveAir with no conditions gives ISO sea level', () => {
    const air = resolveAir();
    expect(air.temperatureK).toBe(288.15);
    expect(air.pressurePa).toBe(101325);
    expect(Math.abs(air.densityKgM3 / 1.225 - 1)).toBeLessThan(5e-4); // CIPM-2007 vs the ideal gas of ISO 2533
    expect(air.windXMps).toBe(0);
  });
  // ISO 2533:1975 standard atmosphere, 1609.344 m: 83 427.6 Pa, 1.04662 kg/m³ (computed from its
  // troposphere formula); CIPM-2007 dry air at the same
  // pressure and temperature agrees within 0.05 %.
  it('resolveAir at 1609.344 m takes the standard pressure and temperature of that altitude', () => {
    const air = resolveAir({ altitudeM: 1609.344 });
    expect(air.pressurePa).toBeCloseTo(83427.6, 1);
    expect(Math.abs(air.densityKgM3 / isaDensityKgM3(1609.344) - 1)).toBeLessThan(5e-4);
  });
  // Picard et al., "Revised formula for the density of moist air (CIPM-2007)", Metrologia
  // 45:149 (2008), computed from its formula: 20 °C, 101 325 Pa, 50 % RH → 1.19931 kg/m³.
  it('resolveAir with temperature and humidity at sea level gives the CIPM-2007 density', () => {
    expect(resolveAir({ temperatureC: 20, humidityPct: 50 }).densityKgM3).toBeCloseTo(1.19931, 5);
  });
  it('resolveAir with a stated pressure uses it instead of the altitude', () => {
    expect(resolveAir({ altitudeM: 2000, pressurePa: 101325, temperatureC: 20 }).densityKgM3).toBeCloseTo(
      moistAirDensityKgM3(293.15, 101325, 0),
      10,
    );
  });
  it('resolveAir with a wind from the target blows toward the player', () => {
    const air = resolveAir({ wind: { speedMps: 5, fromDeg: 0 } });
    expect(air.windXMps).toBeCloseTo(-5, 12);
    expect(air.windZMps).toBeCloseTo(0, 12);
  });
  it('resolveAir with a wind from the right blows to the left', () => {
    const air = resolveAir({ wind: { speedMps: 4, fromDeg: 90 } });
    expect(air.windXMps).toBeCloseTo(0, 12);
    expect(air.windZMps).toBeCloseTo(-4, 12);
  });
  it('resolveAir with a temperature out of range or a negative wind throws', () => {
    expect(() => resolveAir({ temperatureC: 80 })).toThrow(RangeError);
    expect(() => resolveAir({ wind: { speedMps: -1, fromDeg: 0 } })).toThrow(RangeError);
  });
});
