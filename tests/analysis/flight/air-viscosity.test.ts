import { reynoldsNumber, sutherlandViscosityPaS } from '@/analysis/flight';

// Sutherland's law with the ISO 2533 constants, μ = 1.458e-6·T^1.5/(T + 110.4); values computed
// from the formula (ISO 2533:1975, Sutherland's law with βs = 1.458e-6, S = 110.4 K). ISO 2533 tabulates 1.7894e-5 Pa·s at sea level.
describe('sutherlandViscosityPaS', () => {
  it('sutherlandViscosityPaS at 288.15 K gives 1.78938e-5 Pa·s', () => {
    expect(sutherlandViscosityPaS(288.15) / 1.78938e-5).toBeCloseTo(1, 5);
  });
  it('sutherlandViscosityPaS at 293.15 K gives 1.81341e-5 Pa·s', () => {
    expect(sutherlandViscosityPaS(293.15) / 1.81341e-5).toBeCloseTo(1, 5);
  });
  it('sutherlandViscosityPaS at zero kelvin throws', () => {
    expect(() => sutherlandViscosityPaS(0)).toThrow(RangeError);
  });
});

describe('reynoldsNumber', () => {
  // Definition Re = ρ·v·d/μ with the ISO sea-level density and Sutherland viscosity above, at
  // Bearman & Harvey's 55.2 m/s and the 42.67 mm ball: 1.225·55.2·0.04267/1.78938e-5.
  it('reynoldsNumber of a ball at 55.2 m/s in ISO sea-level air gives about 1.61e5', () => {
    expect(reynoldsNumber(1.225, 55.2, 1.78938e-5)).toBeCloseTo((1.225 * 55.2 * 0.04267) / 1.78938e-5, 6);
    expect(reynoldsNumber(1.225, 55.2, 1.78938e-5)).toBeCloseTo(161248, -1);
  });
  it('reynoldsNumber with zero viscosity throws', () => {
    expect(() => reynoldsNumber(1.225, 50, 0)).toThrow(RangeError);
  });
});
