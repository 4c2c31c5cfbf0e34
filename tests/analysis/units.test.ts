import {
  displayUnits,
  findUnit,
  fromCanonical,
  toCanonical,
  unitFactor,
  UnitError,
  unitInfo,
  unitSystemOf,
  UNITS,
} from '@/analysis/units';
import { SHOT_FIELDS } from '@/analysis/fields';

describe('unit factors', () => {
  // NIST Special Publication 811 (2008 edition), Appendix B.8, exact conversion factors
  it.each([
    ['yd', 'carry', 0.9144],
    ['ft', 'apexHeight', 0.3048],
    ['mph', 'ballSpeed', 0.44704],
    ['km/h', 'clubSpeed', 1 / 3.6],
    ['ft/s', 'ballSpeed', 0.3048],
  ] as const)('unitFactor of %s for %s is the NIST SP 811 exact factor %d', (unit, field, factor) => {
    expect(unitFactor(unit, field)).toBe(factor);
  });

  // NIST SP 811 Appendix B.8: revolution per minute = π/30 rad/s (1.047198 E-01), so 1 rad/s = 30/π rpm
  it('unitFactor of rad/s for spin rate is 30/π rpm (NIST SP 811: rpm = π/30 rad/s)', () => {
    expect(unitFactor('rad/s', 'spinRate')).toBeCloseTo(30 / Math.PI, 12);
    expect(toCanonical(Math.PI / 30, 'rad/s', 'spinRate')).toBeCloseTo(1, 12);
  });

  // NIST SP 811 (2008), Appendix B.8: revolution per minute (r/min) = 1.047198 E−01 rad/s, and
  // Table 6: minute = 60 s, so one revolution per second is 60 r/min. Checked against the
  // tabulated factor, not by converting there and back.
  it('toCanonical of 1 rev/s is 60 rpm (NIST SP 811 Table 6 minute = 60 s; B.8 r/min = 1.047198 E−01 rad/s)', () => {
    expect(toCanonical(1, 'rps', 'spinRate')).toBe(60);
    expect(toCanonical(2.5, 'rev/s', 'spinRate')).toBe(150);
    // 1 rev/s = 2π rad/s; in r/min through the tabulated factor: 2π / 0.1047198 = 60.0000
    expect(toCanonical(1, 'rps', 'spinRate') * 1.047198e-1).toBeCloseTo(2 * Math.PI, 5);
    expect(fromCanonical(3000, 'rps', 'spinRate')).toBe(50);
  });

  // NIST SP 811 (2008), Appendix B.8: degree (°) = 1.745329 E−02 rad, so 1 rad = 57.29578°.
  it('toCanonical of 1 rad is 57.29578° (NIST SP 811 B.8: degree = 1.745329 E−02 rad)', () => {
    expect(toCanonical(1, 'rad', 'launchAngle')).toBeCloseTo(57.29578, 5);
    expect(toCanonical(1, 'rad', 'launchAngle') * 1.745329e-2).toBeCloseTo(1, 6);
    expect(fromCanonical(180, 'rad', 'launchAngle')).toBeCloseTo(Math.PI, 12);
    expect(unitFactor('radians', 'spinAxis')).toBeCloseTo(57.29578, 5);
  });

  // NIST SP 811 (2008), Appendix B.8: r/min = 1.047198 E−01 rad/s, so 1 rad/s = 9.549297 r/min.
  it('toCanonical of 10 rad/s is 95.49297 rpm (NIST SP 811 B.8 tabulated factor)', () => {
    expect(toCanonical(10, 'rad/s', 'spinRate')).toBeCloseTo(95.49297, 4);
    expect(fromCanonical(1, 'rad/s', 'spinRate')).toBeCloseTo(1.047198e-1, 6);
  });

  // NIST SP 811 (2008), Appendix B.8 (yard, foot, mile per hour, kilometre per hour); the
  // division of fromCanonical checked against the tabulated factors directly.
  it.each([
    ['yd', 'carry', 100, 91.44],
    ['ft', 'apexHeight', 100, 30.48],
    ['mph', 'ballSpeed', 100, 44.704],
    ['km/h', 'clubSpeed', 36, 10],
    ['ms', 'flightTime', 1000, 1],
  ] as const)('fromCanonical of the SP 811 value of 100 %s for %s gives it back as written', (unit, field, inUnit, canonical) => {
    expect(fromCanonical(canonical, unit, field)).toBeCloseTo(inUnit, 9);
  });

  // 1 mile = 1609.344 m (NIST SP 811 B.8); 1 h = 3600 s, so mph = 1609.344/3600 m/s
  it('toCanonical of 1 mph equals 1609.344 m / 3600 s (NIST SP 811 mile)', () => {
    expect(toCanonical(1, 'mph', 'ballSpeed')).toBeCloseTo(1609.344 / 3600, 15);
  });

  // 1 yd = 3 ft exactly (NIST SP 811 B.8: yard 0.9144 m, foot 0.3048 m)
  it('toCanonical of 3 ft equals 1 yd', () => {
    expect(toCanonical(3, 'ft', 'carry')).toBeCloseTo(toCanonical(1, 'yd', 'carry'), 15);
  });

  it('toCanonical of a canonical unit leaves the value unchanged', () => {
    expect(toCanonical(150.3, 'm', 'carry')).toBe(150.3);
    expect(toCanonical(50.1, 'm/s', 'ballSpeed')).toBe(50.1);
    expect(toCanonical(6500, 'rpm', 'spinRate')).toBe(6500);
    expect(toCanonical(12.5, 'deg', 'launchAngle')).toBe(12.5);
    expect(toCanonical(6.1, 's', 'flightTime')).toBe(6.1);
  });

  it('toCanonical of 2500 ms is 2.5 s (SI prefix milli)', () => {
    expect(toCanonical(2500, 'ms', 'flightTime')).toBeCloseTo(2.5, 12);
  });

  it('fromCanonical after toCanonical gives back the value for every known unit', () => {
    const fieldOf = { speed: 'ballSpeed', length: 'carry', angle: 'launchAngle', spin: 'spinRate', time: 'flightTime', ratio: 'smashFactor' } as const;
    for (const u of UNITS) {
      const field = fieldOf[u.dimension];
      expect(fromCanonical(toCanonical(123.456, u.unit, field), u.unit, field)).toBeCloseTo(123.456, 9);
    }
  });
});

describe('findUnit', () => {
  it.each([
    ['yds', 'yd'], ['Yards', 'yd'], ['yd', 'yd'], ['m', 'm'], ['metres', 'm'], ['Meters', 'm'],
    ['ft', 'ft'], ['feet', 'ft'], ['mph', 'mph'], ['km/h', 'km/h'], ['kph', 'km/h'], ['KMH', 'km/h'],
    ['m/s', 'm/s'], ['mps', 'm/s'], ['rpm', 'rpm'], ['deg', 'deg'], ['°', 'deg'], ['degrees', 'deg'],
    ['s', 's'], ['sec', 's'], [' seconds ', 's'],
  ])('findUnit of "%s" gives %s', (alias, unit) => {
    expect(findUnit(alias)?.unit).toBe(unit);
  });

  it('findUnit reads a unit written with a trailing full stop, capitals or doubled spaces', () => {
    expect(findUnit('Yds.')?.unit).toBe('yd');
    expect(findUnit('  MILES   PER  HOUR ')?.unit).toBe('mph');
    expect(findUnit('rev/min.')?.unit).toBe('rpm');
    // Only a full stop at the end is dropped, never one inside the name.
    expect(findUnit('ft./s')).toBeNull();
  });

  it('unitInfo of a known alias gives the unit; of an unknown one throws UNKNOWN_UNIT naming it', () => {
    expect(unitInfo('kph')).toMatchObject({ unit: 'km/h', dimension: 'speed' });
    expect(() => unitInfo('cubits')).toThrow(new UnitError('UNKNOWN_UNIT', 'cubits', 'Unknown unit "cubits"'));
    expect(() => unitInfo('cubits')).toThrow('Unknown unit "cubits"');
  });

  // Imperial units per NIST SP 811 (2008), Appendix B (yard, foot, mile per hour); SI and SI-accepted
  // units per the SI Brochure (metre, metre per second, kilometre per hour is SI-accepted).
  it.each([
    ['yards', 'imperial'], ['ft', 'imperial'], ['MPH', 'imperial'], ['fps', 'imperial'],
    ['metres', 'metric'], ['m/s', 'metric'], ['kph', 'metric'],
    ['rpm', null], ['deg', null], ['s', null], ['furlongs', null],
  ] as const)('unitSystemOf %s gives %s', (unit, system) => {
    expect(unitSystemOf(unit)).toBe(system);
  });

  it('findUnit of an unknown unit gives null', () => {
    expect(findUnit('furlongs')).toBeNull();
    expect(findUnit('')).toBeNull();
  });
});

describe('unit errors', () => {
  it('toCanonical with an unknown unit throws UnitError UNKNOWN_UNIT', () => {
    expect(() => toCanonical(1, 'furlongs', 'carry')).toThrow(UnitError);
    expect(() => toCanonical(1, 'furlongs', 'carry')).toThrow(expect.objectContaining({ code: 'UNKNOWN_UNIT', unit: 'furlongs', name: 'UnitError' }));
  });

  it('toCanonical with a unit of the wrong dimension throws UnitError UNIT_MISMATCH naming both dimensions', () => {
    expect(() => toCanonical(1, 'mph', 'carry')).toThrow(UnitError);
    expect(() => toCanonical(1, 'mph', 'carry')).toThrow(expect.objectContaining({ code: 'UNIT_MISMATCH', unit: 'mph' }));
    expect(() => toCanonical(1, 'mph', 'carry')).toThrow('Unit "mph" is a speed unit; carry needs a length unit');
  });

  it('fromCanonical with an unknown unit throws', () => {
    expect(() => fromCanonical(1, 'leagues', 'carry')).toThrow(UnitError);
  });
});

describe('displayUnits', () => {
  it('displayUnits imperial gives yards, mph and feet for apex', () => {
    const u = displayUnits('imperial');
    expect([u.carry, u.total, u.offline, u.ballSpeed, u.clubSpeed, u.apexHeight]).toEqual(['yd', 'yd', 'yd', 'mph', 'mph', 'ft']);
  });

  it('displayUnits metric gives metres and km/h', () => {
    const u = displayUnits('metric');
    expect([u.carry, u.offline, u.ballSpeed, u.apexHeight]).toEqual(['m', 'm', 'km/h', 'm']);
  });

  it('displayUnits of either system keeps angles in degrees, spin in rpm, time in seconds', () => {
    for (const system of ['imperial', 'metric'] as const) {
      const u = displayUnits(system);
      expect([u.launchAngle, u.spinAxis, u.spinRate, u.flightTime, u.smashFactor]).toEqual(['deg', 'deg', 'rpm', 's', 'ratio']);
    }
  });

  it('displayUnits gives every field a unit fromCanonical accepts', () => {
    for (const system of ['imperial', 'metric'] as const) {
      const u = displayUnits(system);
      for (const field of SHOT_FIELDS) expect(() => fromCanonical(1, u[field], field)).not.toThrow();
    }
  });
});
