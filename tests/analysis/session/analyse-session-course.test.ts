/**
 * "At the player's course": the figures are carried over to other air with the ball-flight
 * model, but the strays are decided on the measured shots, so normalising moves numbers, never
 * the set of strays. Seen: the demo's driver group went from 10 of 12 kept to 11 of 12 when
 * carried to 1,600 m and 30 °C (the stray rules ran on the carried-over carries).
 */
import fs from 'node:fs';
import path from 'node:path';
import { fillFlightFields, normaliseShot } from '@/analysis/flight';
import { importBayFile } from '@/analysis/import';
import { analyseSession } from '@/analysis/session';

const FILE = path.resolve(__dirname, '../../../fixtures/demo/nell-driver-and-7-iron.csv');
const BAY = { temperatureC: 18, altitudeM: 40, humidityPct: 55 };

describe('analyseSession with the measured shots', () => {
  const measured = importBayFile(fs.readFileSync(FILE, 'utf8'), { fillFlight: (v) => fillFlightFields(v) }).shots;
  it.each([
    { altitudeM: 1600, temperatureC: 30 },
    { altitudeM: 2000, temperatureC: 35 },
    { altitudeM: 0, temperatureC: 5 },
  ])('analyseSession of shots carried to %j keeps the measured strays and kept counts', (course) => {
    const carried = measured.map((s) => ({ ...s, values: normaliseShot(s.values, BAY, course).values }));
    const atBay = analyseSession(measured);
    const atCourse = analyseSession(carried, { measured });
    atCourse.groups.forEach((g, i) => {
      expect(g.strays.map((s) => [s.row, s.kind])).toEqual(atBay.groups[i].strays.map((s) => [s.row, s.kind]));
      expect(g.kept).toBe(atBay.groups[i].kept);
    });
    // …while the numbers did move: thinner or thicker air changes the driver's carry.
    expect(atCourse.groups[0].fields.carry!.mean).not.toBeCloseTo(atBay.groups[0].fields.carry!.mean, 1);
  });

  it('analyseSession with measured shots that are not the same shots throws', () => {
    expect(() => analyseSession(measured, { measured: measured.slice(1) })).toThrow(RangeError);
  });
});
