import { celsiusTo, cmTo, inchesTo, metresTo, toCelsius, toCm, toInches, toMetres } from '@/analysis/units';

// B. N. Taylor and A. Thompson, "Guide for the Use of the International System of Units (SI)",
// NIST Special Publication 811 (2008), Appendix B.8 and B.9: inch = 2.54 E−02 m (exact),
// foot = 3.048 E−01 m (exact), t/°C = (t/°F − 32)/1.8.
describe('person-facing units (NIST SP 811)', () => {
  it('cmTo and toCm, inches, use 1 in = 2.54 cm exactly', () => {
    expect(cmTo(2.54, 'in')).toBeCloseTo(1, 12);
    expect(cmTo(182.88, 'in')).toBeCloseTo(72, 10); // 6 ft
    expect(toCm(72, 'in')).toBeCloseTo(182.88, 10);
    expect(cmTo(175, 'cm')).toBe(175);
  });

  it('inchesTo and toInches, a 45 in club, answer 114.3 cm', () => {
    expect(inchesTo(45, 'cm')).toBeCloseTo(114.3, 10);
    expect(toInches(114.3, 'cm')).toBeCloseTo(45, 10);
    expect(inchesTo(45, 'in')).toBe(45);
  });

  it('metresTo and toMetres, feet, use 1 ft = 0.3048 m exactly', () => {
    expect(toMetres(5280, 'ft')).toBeCloseTo(1609.344, 9); // one statute mile, NIST SP 811 B.9
    expect(metresTo(1609.344, 'ft')).toBeCloseTo(5280, 9);
    expect(metresTo(40, 'm')).toBe(40);
  });

  it('celsiusTo and toCelsius, the fixed points and the crossing, give °F = °C·9/5 + 32', () => {
    expect(celsiusTo(0, 'f')).toBeCloseTo(32, 12);
    expect(celsiusTo(100, 'f')).toBeCloseTo(212, 12);
    expect(celsiusTo(-40, 'f')).toBeCloseTo(-40, 12);
    expect(toCelsius(212, 'f')).toBeCloseTo(100, 12);
    expect(toCelsius(68, 'f')).toBeCloseTo(20, 12);
    expect(toCelsius(20, 'c')).toBe(20);
  });
});
