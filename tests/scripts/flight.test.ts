import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { optimiseLaunch, simulateFlight } from '@/analysis/flight';

const ROOT = path.resolve(__dirname, '../..');
// NIST SP 811 (2008), Appendix B: mph 0.44704 m/s, yard 0.9144 m.
const MPH = 0.44704;
const YARD = 0.9144;

function flight(...args: string[]) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/flight.ts', ...args], { cwd: ROOT, encoding: 'utf8' });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

jest.setTimeout(60000);

describe('scripts/flight.ts', () => {
  it('flight --json prints the model flight in canonical units', () => {
    const { status, stdout } = flight('--ball-speed', '70', '--launch', '12', '--spin', '3000', '--axis', '4', '--direction', '-1', '--json');
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    const model = simulateFlight({ ballSpeedMps: 70, launchAngleDeg: 12, spinRateRpm: 3000, spinAxisDeg: 4, launchDirectionDeg: -1 });
    expect(Object.keys(out).sort()).toEqual(['airDensity', 'apexHeight', 'carry', 'descentAngle', 'flightTime', 'landingSpeed', 'offline']);
    expect(out.carry).toBeCloseTo(model.carryM, 10);
    expect(out.offline).toBeCloseTo(model.offlineM, 10);
    expect(out.apexHeight).toBeCloseTo(model.apexHeightM, 10);
    expect(out.flightTime).toBeCloseTo(model.flightTimeS, 10);
    expect(out.descentAngle).toBeCloseTo(model.descentAngleDeg, 10);
    expect(out.landingSpeed).toBeCloseTo(model.landingSpeedMps, 10);
    expect(out.airDensity).toBeCloseTo(model.airDensityKgM3, 10);
  });
  it('flight with air conditions passes them to the model', () => {
    const { stdout } = flight('--ball-speed', '70', '--launch', '12', '--spin', '3000', '--temperature', '30', '--altitude', '1200', '--humidity', '60', '--json');
    const model = simulateFlight({ ballSpeedMps: 70, launchAngleDeg: 12, spinRateRpm: 3000 }, { temperatureC: 30, altitudeM: 1200, humidityPct: 60 });
    expect(JSON.parse(stdout).carry).toBeCloseTo(model.carryM, 10);
  });
  it('flight with --units imperial reads mph and prints yards and feet', () => {
    const { status, stdout } = flight('--ball-speed', '167', '--launch', '10.9', '--spin', '2686', '--units', 'imperial');
    expect(status).toBe(0);
    const model = simulateFlight({ ballSpeedMps: 167 * MPH, launchAngleDeg: 10.9, spinRateRpm: 2686 });
    expect(stdout).toContain(`Carry           ${(model.carryM / YARD).toFixed(1)} yd`);
    expect(stdout).toContain(`Apex height     ${(model.apexHeightM / 0.3048).toFixed(0)} ft`);
  });
  it('flight --units imperial --json still prints canonical units', () => {
    const { stdout } = flight('--ball-speed', '167', '--launch', '10.9', '--spin', '2686', '--units', 'imperial', '--json');
    expect(JSON.parse(stdout).carry).toBeCloseTo(simulateFlight({ ballSpeedMps: 167 * MPH, launchAngleDeg: 10.9, spinRateRpm: 2686 }).carryM, 10);
  });
  it('flight with a wind from the right lands the ball left', () => {
    const { stdout } = flight('--ball-speed', '55', '--launch', '16', '--spin', '6500', '--wind-speed', '6', '--wind-from', '90', '--json');
    expect(JSON.parse(stdout).offline).toBeLessThan(-1);
  });
  it('flight --optimise --json prints the best launch and the window', () => {
    const { status, stdout } = flight('--optimise', '--ball-speed', '60', '--json');
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    const model = optimiseLaunch(60);
    expect(out.best.launchAngle).toBeCloseTo(model.best.launchAngleDeg, 10);
    expect(out.best.spinRate).toBeCloseTo(model.best.spinRateRpm, 10);
    expect(out.best.carry).toBeCloseTo(model.best.carryM, 10);
    expect(out.window.launchAngle).toEqual(model.window.launchRangeDeg);
    expect(out.window.polygon).toHaveLength(model.window.polygon.length);
  });
  it('flight --optimise prints a readable window', () => {
    const { status, stdout } = flight('--optimise', '--ball-speed', '60');
    expect(status).toBe(0);
    expect(stdout).toMatch(/Best launch/);
    expect(stdout).toMatch(/Within 1 %/);
  });
  it('flight --help explains wind-from and exits 0', () => {
    const { status, stdout } = flight('--help');
    expect(status).toBe(0);
    expect(stdout).toMatch(/--wind-from DEG/);
    expect(stdout).toMatch(/0 = from the target toward the player \(headwind\), 90 = from the right/);
  });
  it.each([
    [['--ball-speed', '70', '--launch', 'abc', '--spin', '3000'], /--launch must be a number/],
    [['--ball-speed', '70', '--launch', '12'], /--spin is required/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--bogus'], /unknown option --bogus/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--humidity', '140'], /--humidity must be 0-100/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--wind-speed', '4'], /--wind-speed and --wind-from go together/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--units', 'furlongs'], /--units must be si or imperial/],
    [['--ball-speed', '-5', '--launch', '12', '--spin', '3000'], /--ball-speed must be positive/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--altitude', '20000'], /altitude 20000 m is outside/],
  ])('flight with bad arguments %j explains on stderr and exits 2', (args, message) => {
    const { status, stdout, stderr } = flight(...args);
    expect(status).toBe(2);
    expect(stderr).toMatch(message);
    expect(stdout).toBe('');
  });
});
