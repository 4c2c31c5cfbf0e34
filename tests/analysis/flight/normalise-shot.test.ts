import { normaliseShot, simulateFlight } from '@/analysis/flight';

const launch = { ballSpeed: 74.65, launchAngle: 10.9, spinRate: 2686, launchDirection: 1, spinAxis: 3 };
const modelLaunch = { ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686, launchDirectionDeg: 1, spinAxisDeg: 3 };
const bay = { temperatureC: 20, altitudeM: 0, humidityPct: 40 };
const course = { temperatureC: 28, altitudeM: 1500, humidityPct: 30 };

describe('normaliseShot', () => {
  it('normaliseShot scales measured carry, apex and flight time by the model ratio', () => {
    const measured = { ...launch, carry: 230, apexHeight: 27, flightTime: 6.4 };
    const { values, normalised } = normaliseShot(measured, bay, course);
    const before = simulateFlight(modelLaunch, bay);
    const after = simulateFlight(modelLaunch, course);
    expect(values.carry).toBeCloseTo(230 * (after.carryM / before.carryM), 10);
    expect(values.apexHeight).toBeCloseTo(27 * (after.apexHeightM / before.apexHeightM), 10);
    expect(values.flightTime).toBeCloseTo(6.4 * (after.flightTimeS / before.flightTimeS), 10);
    expect(values.carry!).toBeGreaterThan(230);
    expect(normalised).toEqual(['carry', 'apexHeight', 'flightTime']);
  });
  it('normaliseShot shifts offline and descent angle by the model difference', () => {
    const { values } = normaliseShot({ ...launch, offline: 4, descentAngle: 38 }, bay, course);
    const before = simulateFlight(modelLaunch, bay);
    const after = simulateFlight(modelLaunch, course);
    expect(values.offline).toBeCloseTo(4 + after.offlineM - before.offlineM, 10);
    expect(values.descentAngle).toBeCloseTo(38 + after.descentAngleDeg - before.descentAngleDeg, 10);
  });
  it('normaliseShot moves total with the normalised carry and the model’s change of roll', () => {
    const { values, normalised } = normaliseShot({ ...launch, carry: 230, total: 255 }, bay, course);
    const before = simulateFlight(modelLaunch, bay);
    const after = simulateFlight(modelLaunch, course);
    expect(values.total!).toBeCloseTo(values.carry! + 25 + (after.rollM - before.rollM), 10);
    expect(normalised).toContain('total');
  });
  it('normaliseShot to firmer ground at the same air lengthens total, not carry', () => {
    const { values, normalised } = normaliseShot({ ...launch, carry: 230, total: 255 }, { ...bay, firmness: 'soft' }, { ...bay, firmness: 'firm' });
    expect(values.carry).toBeCloseTo(230, 10);
    expect(values.total!).toBeGreaterThan(255 + 10);
    expect(normalised).toContain('total');
  });
  it('normaliseShot of a total without carry shifts it by the model’s change of total', () => {
    const { values } = normaliseShot({ ...launch, total: 260 }, bay, course);
    expect(values.total).toBeCloseTo(260 + simulateFlight(modelLaunch, course).totalM - simulateFlight(modelLaunch, bay).totalM, 10);
  });
  it('normaliseShot fills missing flight fields from the model in the target conditions', () => {
    const { values, derived } = normaliseShot({ ...launch, carry: 230 }, bay, course);
    expect(derived).toEqual(['total', 'offline', 'apexHeight', 'descentAngle', 'flightTime']);
    expect(values.total).toBeCloseTo(values.carry! + simulateFlight(modelLaunch, course).rollM, 10);
    expect(values.apexHeight).toBe(simulateFlight(modelLaunch, course).apexHeightM);
  });
  it('normaliseShot to the same conditions changes nothing', () => {
    const measured = { ...launch, carry: 230, total: 250, offline: 4, apexHeight: 27, descentAngle: 38, flightTime: 6.4 };
    const { values } = normaliseShot(measured, bay, bay);
    for (const field of ['carry', 'total', 'offline', 'apexHeight', 'descentAngle', 'flightTime'] as const) {
      expect(values[field]).toBeCloseTo(measured[field], 12);
    }
  });
  it('normaliseShot without launch inputs returns the input unchanged', () => {
    const input = { carry: 200 };
    const result = normaliseShot(input, bay, course);
    expect(result.values).toBe(input);
    expect(result.derived).toEqual([]);
    expect(result.normalised).toEqual([]);
  });

  // The approach stated in normalise-shot.ts applied to the model itself: a shot whose measured
  // values are exactly the model's flight in the bay must come out as the model's flight on the
  // course, every field, each listed once.
  it('normaliseShot of the model’s own bay flight gives the model’s course flight, each field once', () => {
    const bayFlight = simulateFlight(modelLaunch, bay);
    const courseFlight = simulateFlight(modelLaunch, course);
    const measured = {
      ...launch, carry: bayFlight.carryM, total: bayFlight.totalM, offline: bayFlight.offlineM,
      apexHeight: bayFlight.apexHeightM, descentAngle: bayFlight.descentAngleDeg, flightTime: bayFlight.flightTimeS,
    };
    const { values, derived, normalised } = normaliseShot(measured, bay, course);
    expect(values.carry).toBeCloseTo(courseFlight.carryM, 9);
    expect(values.total).toBeCloseTo(courseFlight.totalM, 9);
    expect(values.offline).toBeCloseTo(courseFlight.offlineM, 9);
    expect(values.apexHeight).toBeCloseTo(courseFlight.apexHeightM, 9);
    expect(values.descentAngle).toBeCloseTo(courseFlight.descentAngleDeg, 9);
    expect(values.flightTime).toBeCloseTo(courseFlight.flightTimeS, 9);
    expect(values.ballSpeed).toBe(74.65);
    expect(values.spinAxis).toBe(3);
    expect(derived).toEqual([]);
    expect(normalised).toEqual(['carry', 'offline', 'apexHeight', 'descentAngle', 'flightTime', 'total']);
  });
  it('normaliseShot with a measured carry derives the missing fields from the model on the course', () => {
    const courseFlight = simulateFlight(modelLaunch, course);
    const { values, derived } = normaliseShot({ ...launch, carry: 230 }, bay, course);
    expect(derived).toEqual(['total', 'offline', 'apexHeight', 'descentAngle', 'flightTime']);
    expect(values.total).toBeCloseTo(values.carry! + courseFlight.rollM, 10);
    expect(values.offline).toBe(courseFlight.offlineM);
    expect(values.apexHeight).toBe(courseFlight.apexHeightM);
    const { derived: withoutSide } = normaliseShot({ ballSpeed: 74.65, launchAngle: 10.9, spinRate: 2686, carry: 230 }, bay, course);
    expect(withoutSide).toEqual(['total', 'apexHeight', 'descentAngle', 'flightTime']);
  });
  it('normaliseShot to the same conditions leaves a measured total as it was and does not list it', () => {
    const { values, normalised } = normaliseShot({ ...launch, carry: 230, total: 255 }, bay, bay);
    expect(values.total).toBe(255);
    expect(normalised).not.toContain('total');
  });
  it('normaliseShot of a ball launched downward keeps its measured carry: the model has no flight to scale by', () => {
    const { values, normalised } = normaliseShot({ ballSpeed: 30, launchAngle: -3, spinRate: 2000, carry: 12 }, bay, course);
    expect(values.carry).toBe(12);
    expect(normalised).not.toContain('carry');
  });
});
