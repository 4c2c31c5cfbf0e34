import { launchVectors } from '@/analysis/flight';

const DEG = Math.PI / 180;
const dot = (a: number[], b: number[]) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];

// Geometry of the flight frame (x toward the target, y up, z right): checks of the definitions
// in launch-vectors.ts, no outside values.
describe('launchVectors', () => {
  it('launchVectors with angle and direction splits the speed into the three axes', () => {
    const v = launchVectors({ ballSpeedMps: 70, launchAngleDeg: 10, launchDirectionDeg: 5, spinRateRpm: 2500 });
    expect(v.vxMps).toBeCloseTo(70 * Math.cos(10 * DEG) * Math.cos(5 * DEG), 12);
    expect(v.vyMps).toBeCloseTo(70 * Math.sin(10 * DEG), 12);
    expect(v.vzMps).toBeCloseTo(70 * Math.cos(10 * DEG) * Math.sin(5 * DEG), 12);
  });
  it('launchVectors with no tilt gives a horizontal axis pointing right', () => {
    const { spinAxis } = launchVectors({ ballSpeedMps: 60, launchAngleDeg: 15, spinRateRpm: 5000 });
    expect(spinAxis.x).toBeCloseTo(0, 12);
    expect(spinAxis.y).toBeCloseTo(0, 12);
    expect(spinAxis.z).toBeCloseTo(1, 12);
  });
  it.each([
    [12, 3, 20],
    [25, -7, -35],
    [8, 0, 90],
  ])('launchVectors at %d° launch, %d° direction, %d° axis gives a unit axis across the velocity', (launchAngleDeg, launchDirectionDeg, spinAxisDeg) => {
    const v = launchVectors({ ballSpeedMps: 50, launchAngleDeg, launchDirectionDeg, spinRateRpm: 3000, spinAxisDeg });
    const axis = [v.spinAxis.x, v.spinAxis.y, v.spinAxis.z];
    expect(dot(axis, axis)).toBeCloseTo(1, 12);
    expect(dot(axis, [v.vxMps, v.vyMps, v.vzMps])).toBeCloseTo(0, 10);
  });
  it('launchVectors with a negative speed or a NaN angle throws', () => {
    expect(() => launchVectors({ ballSpeedMps: -1, launchAngleDeg: 10, spinRateRpm: 0 })).toThrow(RangeError);
    expect(() => launchVectors({ ballSpeedMps: 50, launchAngleDeg: Number.NaN, spinRateRpm: 0 })).toThrow(RangeError);
    expect(() => launchVectors({ ballSpeedMps: 50, launchAngleDeg: 10, spinRateRpm: -5 })).toThrow(RangeError);
  });
});
