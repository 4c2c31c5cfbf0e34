import fc from 'fast-check';
import { lyuCoefficients, simulateFlight, smitsSmithCoefficients } from '@/analysis/flight';

// Units: NIST SP 811 (2008), Appendix B: mph 0.44704 m/s, yard 0.9144 m.
const MPH = 0.44704;
const YARD = 0.9144;

const driver = { ballSpeedMps: 167 * MPH, launchAngleDeg: 10.9, spinRateRpm: 2686 };
const sevenIron = { ballSpeedMps: 120 * MPH, launchAngleDeg: 16.3, spinRateRpm: 7097 };

describe('simulateFlight plausibility', () => {
  // Memory, loose tolerance: commonly quoted tour-average launch figures, driver 167 mph, 10.9°,
  // 2686 rpm → about 275 yd carry; 7 iron 120 mph, 16.3°, 7097 rpm → about 172 yd. Not check
  // values: the default model need only land within ±8 %.
  it('simulateFlight of a tour-average driver carries within 8 % of about 275 yd', () => {
    expect(Math.abs(simulateFlight(driver).carryM / YARD / 275 - 1)).toBeLessThan(0.08);
  });
  it('simulateFlight of a tour-average 7 iron carries within 8 % of about 172 yd', () => {
    expect(Math.abs(simulateFlight(sevenIron).carryM / YARD / 172 - 1)).toBeLessThan(0.08);
  });
  // A drag fit in Reynolds number alone (Lyu et al., Proceedings 2(6):238, 2018, a ball with little
  // spin) carries a fast driver far too long; the
  // default model, whose drag rises with spin ratio, must carry it shorter.
  it('simulateFlight with drag that ignores spin carries the driver farther than the default', () => {
    expect(simulateFlight(driver, {}, { model: lyuCoefficients }).carryM).toBeGreaterThan(simulateFlight(driver).carryM + 10 * YARD);
  });
  // Plausibility bound only: the governing bodies' overall distance standard, carry + roll
  // ≤ 317 yd + 3 yd (R&A / USGA Overall Distance Standard; memory), so carry alone must stay under 320 yd. Launch from memory: the
  // standard's test club speed 120 mph, 10°, 2520 rpm; ball speed from the smash-factor bound
  // 1.48823 (Penner, "The physics of golf", Rep. Prog. Phys. 66:131, 2003: (1 + e)/(1 + m/M)
  // with e = 0.83, m 45.93 g, M 200 g; computed).
  it('simulateFlight of a strong-player driver stays under the distance standard bound', () => {
    const strong = { ballSpeedMps: 120 * 1.48823 * MPH, launchAngleDeg: 10, spinRateRpm: 2520 };
    expect(simulateFlight(strong).carryM / YARD).toBeLessThan(320);
    expect(simulateFlight(strong, {}, { model: smitsSmithCoefficients }).carryM / YARD).toBeLessThan(320);
  });
});

describe('simulateFlight properties', () => {
  it('simulateFlight with mirrored spin axis and launch direction mirrors the offline', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 85, noNaN: true }),
        fc.double({ min: 5, max: 35, noNaN: true }),
        fc.double({ min: 500, max: 10000, noNaN: true }),
        fc.double({ min: -30, max: 30, noNaN: true }),
        fc.double({ min: -8, max: 8, noNaN: true }),
        (ballSpeedMps, launchAngleDeg, spinRateRpm, spinAxisDeg, launchDirectionDeg) => {
          const right = simulateFlight({ ballSpeedMps, launchAngleDeg, spinRateRpm, spinAxisDeg, launchDirectionDeg });
          const left = simulateFlight({ ballSpeedMps, launchAngleDeg, spinRateRpm, spinAxisDeg: -spinAxisDeg, launchDirectionDeg: -launchDirectionDeg });
          expect(left.offlineM).toBeCloseTo(-right.offlineM, 9);
          expect(left.carryM).toBeCloseTo(right.carryM, 9);
        },
      ),
      { numRuns: 100 },
    );
  });
  it('simulateFlight with the axis tilted right curves the ball right of a straight start', () => {
    expect(simulateFlight({ ...driver, spinAxisDeg: 10 }).offlineM).toBeGreaterThan(5);
    expect(simulateFlight({ ...driver, launchDirectionDeg: 3 }).offlineM).toBeGreaterThan(5);
  });
  it('simulateFlight of a driver carries farther in thinner air (altitude, heat)', () => {
    const sea = simulateFlight(driver).carryM;
    expect(simulateFlight(driver, { altitudeM: 1600 }).carryM).toBeGreaterThan(sea);
    expect(simulateFlight(driver, { temperatureC: 35 }).carryM).toBeGreaterThan(simulateFlight(driver, { temperatureC: 5 }).carryM);
  });
  // Checked where the lift fit rises with spin ratio over the whole flight (launch S ≤ 0.15 with
  // the added spin: driver and wood launches). The default lift is held at its peak above
  // S ≈ 0.306 while its drag keeps rising, so at iron and wedge spin ratios more spin does not
  // raise the apex in this model (a known limit of the published fit's range).
  it('simulateFlight with more back spin at the same launch rises higher', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 35, max: 85, noNaN: true }),
        fc.double({ min: 8, max: 30, noNaN: true }),
        fc.double({ min: 300, max: 8000, noNaN: true }),
        (ballSpeedMps, launchAngleDeg, spinRateRpm) => {
          fc.pre((0.021335 * (spinRateRpm + 1000) * Math.PI) / 30 / ballSpeedMps <= 0.15);
          const low = simulateFlight({ ballSpeedMps, launchAngleDeg, spinRateRpm });
          const high = simulateFlight({ ballSpeedMps, launchAngleDeg, spinRateRpm: spinRateRpm + 1000 });
          expect(high.apexHeightM).toBeGreaterThan(low.apexHeightM);
        },
      ),
      { numRuns: 200 },
    );
  });
  it('simulateFlight with zero spin flies lower and shorter than with back spin, and straight', () => {
    const none = simulateFlight({ ...driver, spinRateRpm: 0, spinAxisDeg: 20 });
    const spun = simulateFlight(driver);
    expect(none.apexHeightM).toBeLessThan(spun.apexHeightM);
    expect(none.carryM).toBeLessThan(spun.carryM);
    expect(none.offlineM).toBeCloseTo(0, 12);
  });
  it('simulateFlight into a headwind carries shorter and with a tailwind farther', () => {
    const still = simulateFlight(sevenIron).carryM;
    expect(simulateFlight(sevenIron, { wind: { speedMps: 5, fromDeg: 0 } }).carryM).toBeLessThan(still);
    expect(simulateFlight(sevenIron, { wind: { speedMps: 5, fromDeg: 180 } }).carryM).toBeGreaterThan(still);
  });
  it('simulateFlight in a wind from the right lands left of the target line', () => {
    expect(simulateFlight(sevenIron, { wind: { speedMps: 5, fromDeg: 90 } }).offlineM).toBeLessThan(-1);
  });
  it('simulateFlight results are in range: descent steeper than launch, spin decayed, landing slower', () => {
    const flight = simulateFlight(sevenIron);
    expect(flight.descentAngleDeg).toBeGreaterThan(sevenIron.launchAngleDeg);
    expect(flight.landingSpinRpm).toBeLessThan(sevenIron.spinRateRpm);
    expect(flight.landingSpeedMps).toBeLessThan(sevenIron.ballSpeedMps);
    expect(flight.airDensityKgM3).toBeCloseTo(1.2255, 4);
  });
  it('simulateFlight with samplePath returns a path from the origin to the landing point', () => {
    const flight = simulateFlight(driver, {}, { samplePath: true });
    const path = flight.path!;
    expect(path[0]).toEqual({ timeS: 0, xM: 0, yM: 0, zM: 0 });
    expect(path[path.length - 1].xM).toBe(flight.carryM);
    expect(Math.max(...path.map((p) => p.yM))).toBeLessThanOrEqual(flight.apexHeightM);
    expect(simulateFlight(driver).path).toBeUndefined();
  });
  it('simulateFlight with a much finer step agrees with the default step within 0.01 %', () => {
    const coarse = simulateFlight(driver);
    const fine = simulateFlight(driver, {}, { stepS: 0.002 });
    expect(Math.abs(coarse.carryM / fine.carryM - 1)).toBeLessThan(1e-4);
    expect(Math.abs(coarse.apexHeightM / fine.apexHeightM - 1)).toBeLessThan(1e-4);
  });
});
