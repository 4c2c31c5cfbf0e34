import { launchFromShot } from '@/analysis/flight';

// The product's canonical-data definitions (analysis/fields.ts): spinAxis = atan2(sideSpin, backSpin), spinRate = hypot(backSpin, sideSpin).
describe('launchFromShot', () => {
  it('launchFromShot with back and side spin derives the spin rate and axis', () => {
    const shot = launchFromShot({ ballSpeed: 70, launchAngle: 12, backSpin: 2800, sideSpin: -300, launchDirection: 1.5 })!;
    expect(shot.launch.spinRateRpm).toBeCloseTo(Math.hypot(2800, 300), 10);
    expect(shot.launch.spinAxisDeg).toBeCloseTo((Math.atan2(-300, 2800) * 180) / Math.PI, 10);
    expect(shot.launch.launchDirectionDeg).toBe(1.5);
    expect(shot.sideKnown).toBe(true);
  });
  it('launchFromShot with spinRate and spinAxis takes them as given', () => {
    const shot = launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: 5000, spinAxis: 4, backSpin: 1, sideSpin: 1 })!;
    expect(shot.launch.spinRateRpm).toBe(5000);
    expect(shot.launch.spinAxisDeg).toBe(4);
  });
  it('launchFromShot without a spin axis or launch direction marks the side as unknown', () => {
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: 5000, launchDirection: 2 })!.sideKnown).toBe(false);
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: 5000, spinAxis: 2 })!.sideKnown).toBe(false);
  });
  it('launchFromShot with ball speed, launch angle or spin missing gives null', () => {
    expect(launchFromShot({ launchAngle: 15, spinRate: 5000 })).toBeNull();
    expect(launchFromShot({ ballSpeed: 60, spinRate: 5000 })).toBeNull();
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15 })).toBeNull();
    expect(launchFromShot({ ballSpeed: 0, launchAngle: 15, spinRate: 5000 })).toBeNull();
    expect(launchFromShot({ ballSpeed: Number.NaN, launchAngle: 15, spinRate: 5000 })).toBeNull();
  });
  // ECMAScript Math.atan2 (ECMA-262, 2024, §21.3.2.9) follows IEEE 754: atan2(+0, −0) = +π and
  // atan2(−0, −0) = −π, so a spin pair written "-0" must not be read as a ball spun backwards.
  it('launchFromShot with pure side spin puts the axis at 90° and a zero pair at 0° whatever the signs', () => {
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin: 0, sideSpin: 500 })!.launch.spinAxisDeg).toBeCloseTo(90, 12);
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin: 0, sideSpin: -500 })!.launch.spinAxisDeg).toBeCloseTo(-90, 12);
    const zeroPairs: [number, number][] = [[-0, 0], [-0, -0], [0, -0], [0, 0]];
    for (const [backSpin, sideSpin] of zeroPairs) {
      const shot = launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin, sideSpin })!;
      expect(Math.abs(shot.launch.spinAxisDeg ?? Number.NaN)).toBe(0);
      expect(shot.launch.spinRateRpm).toBe(0);
      expect(shot.sideKnown).toBe(false);
    }
  });
  it('launchFromShot with back spin below zero (top spin) and no side spin turns the axis right round, to 180°', () => {
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin: -1500, sideSpin: 0 })!.launch.spinAxisDeg).toBeCloseTo(180, 12);
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin: -1500, sideSpin: 0 })!.launch.spinRateRpm).toBe(1500);
  });
  it('launchFromShot refuses a negative spin rate and takes a spin rate of zero', () => {
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: -1 })).toBeNull();
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: -1, backSpin: 2000 })).toBeNull();
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: 0 })!.launch.spinRateRpm).toBe(0);
    expect(launchFromShot({ ballSpeed: 60, launchAngle: 15, spinRate: Number.POSITIVE_INFINITY, backSpin: 2000 })!.launch.spinRateRpm).toBe(2000);
  });
  it('launchFromShot with back spin alone takes it as the spin rate with the axis at 0°', () => {
    const shot = launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin: 2400, spinAxis: Number.NaN, launchDirection: -2 })!;
    expect(shot.launch.spinRateRpm).toBe(2400);
    expect(shot.launch.spinAxisDeg).toBe(0);
    expect(shot.sideKnown).toBe(false);
  });
  it('launchFromShot with back spin, an unusable side spin and a direction keeps the side unknown', () => {
    const shot = launchFromShot({ ballSpeed: 60, launchAngle: 15, backSpin: 2400, sideSpin: Number.NaN, launchDirection: 1 })!;
    expect(shot.launch.spinRateRpm).toBe(2400);
    expect(shot.sideKnown).toBe(false);
  });
});
