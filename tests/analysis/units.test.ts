import {
  displayUnits,
  findUnit,
  fromCanonical,
  toCanonical,
  unitFactor,
  UnitError,
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

  it('findUnit of an unknown unit gives null', () => {
    expect(findUnit('furlongs')).toBeNull();
    expect(findUnit('')).toBeNull();
  });
});

describe('unit errors', () => {
  it('toCanonical with an unknown unit throws UnitError UNKNOWN_UNIT', () => {
    expect(() => toCanonical(1, 'furlongs', 'carry')).toThrow(UnitError);
    try {
      toCanonical(1, 'furlongs', 'carry');
    } catch (e) {
      expect((e as UnitError).code).toBe('UNKNOWN_UNIT');
    }
  });

  it('toCanonical with a unit of the wrong dimension throws UnitError UNIT_MISMATCH', () => {
    try {
      toCanonical(1, 'mph', 'carry');
      throw new Error('did not throw');
    } catch (e) {
      expect(e).toBeInstanceOf(UnitError);
      expect((e as UnitError).code).toBe('UNIT_MISMATCH');
    }
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

  it('displayUnits gives every field a unit fromCanonical accepts', () => {
    for (const system of ['imperial', 'metric'] as const) {
      const u = displayUnits(system);
      for (const field of SHOT_FIELDS) expect(() => fromCanonical(1, u[field], field)).not.toThrow();
    }
  });
});
