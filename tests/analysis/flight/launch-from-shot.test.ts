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
});
