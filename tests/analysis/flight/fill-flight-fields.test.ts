import { fillFlightFields, simulateFlight } from '@/analysis/flight';

const launch = { ballSpeed: 74.65, launchAngle: 10.9, spinRate: 2686 };

describe('fillFlightFields', () => {
  it('fillFlightFields with launch only fills carry, total, apex, descent and flight time from the model', () => {
    const { values, derived } = fillFlightFields(launch);
    const flight = simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686 });
    expect(derived).toEqual(['carry', 'total', 'apexHeight', 'descentAngle', 'flightTime']);
    expect(values.carry).toBe(flight.carryM);
    expect(values.total).toBe(flight.totalM);
    expect(values.apexHeight).toBe(flight.apexHeightM);
    expect(values.descentAngle).toBe(flight.descentAngleDeg);
    expect(values.flightTime).toBe(flight.flightTimeS);
    expect(values.offline).toBeUndefined();
  });
  it('fillFlightFields with direction and spin axis also fills offline', () => {
    const { values, derived } = fillFlightFields({ ...launch, launchDirection: -2, spinAxis: 6 });
    expect(derived).toContain('offline');
    expect(values.offline).toBe(
      simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686, launchDirectionDeg: -2, spinAxisDeg: 6 }).offlineM,
    );
  });
  it('fillFlightFields leaves present values untouched and derives only the missing ones', () => {
    const input = { ...launch, carry: 250, flightTime: 6.9 };
    const { values, derived } = fillFlightFields(input);
    expect(values.carry).toBe(250);
    expect(values.flightTime).toBe(6.9);
    expect(derived).toEqual(['total', 'apexHeight', 'descentAngle']);
    expect(input).toEqual({ ...launch, carry: 250, flightTime: 6.9 });
  });
  it('fillFlightFields with a measured carry fills total as that carry plus the model’s roll on the stated ground', () => {
    const { values } = fillFlightFields({ ...launch, carry: 250 }, { firmness: 'firm' });
    const flight = simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686 }, { firmness: 'firm' });
    expect(values.total).toBeCloseTo(250 + flight.rollM, 10);
    expect(flight.rollM).toBeGreaterThan(simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686 }, { firmness: 'soft' }).rollM);
  });
  it('fillFlightFields with a measured carry fills the other missing fields from the model, not from that carry', () => {
    const { values } = fillFlightFields({ ...launch, carry: 250 });
    const flight = simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686 });
    expect(values.apexHeight).toBe(flight.apexHeightM);
    expect(values.descentAngle).toBe(flight.descentAngleDeg);
    expect(values.flightTime).toBe(flight.flightTimeS);
  });
  it('fillFlightFields in thinner air fills a longer carry', () => {
    expect(fillFlightFields(launch, { altitudeM: 1800 }).values.carry!).toBeGreaterThan(fillFlightFields(launch).values.carry!);
  });
  it('fillFlightFields without launch inputs returns the input unchanged', () => {
    const input = { ballSpeed: 70, carry: 200 };
    const result = fillFlightFields(input);
    expect(result.values).toBe(input);
    expect(result.derived).toEqual([]);
  });
  it('fillFlightFields with every flight field present returns the input unchanged', () => {
    const input = { ...launch, carry: 1, total: 1, offline: 0, apexHeight: 1, descentAngle: 1, flightTime: 1 };
    expect(fillFlightFields(input).values).toBe(input);
  });
});

describe('fillFlightFields below full-swing speeds', () => {
  it('fillFlightFields for a putt (2 m/s) fills nothing: the fits describe full-swing flight', () => {
    // Lyu et al. 2018 measured from Re 5·10⁴ (about 17 m/s at sea level); MIN_FILL_BALL_SPEED_MPS is 15.
    const putt = { ballSpeed: 2, launchAngle: 2, spinRate: 35 };
    expect(fillFlightFields(putt).derived).toEqual([]);
  });
  it('fillFlightFields for a ball launched at or below the ground plane fills nothing', () => {
    expect(fillFlightFields({ ballSpeed: 40, launchAngle: -1, spinRate: 3000 }).derived).toEqual([]);
    expect(fillFlightFields({ ballSpeed: 40, launchAngle: 0, spinRate: 3000 }).derived).toEqual([]);
  });
  it('fillFlightFields fills from exactly 15 m/s and not below it', () => {
    expect(fillFlightFields({ ballSpeed: 15, launchAngle: 20, spinRate: 3000 }).derived).toContain('carry');
    expect(fillFlightFields({ ballSpeed: 14.999, launchAngle: 20, spinRate: 3000 }).derived).toEqual([]);
  });
});
