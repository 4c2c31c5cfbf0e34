import { spawnSync } from 'node:child_process';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');
// NIST SP 811 (2008), Appendix B: mph 0.44704 m/s, yard 0.9144 m.
const YARD = 0.9144;

function flight(...args: string[]) {
  const result = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/flight.ts', ...args], { cwd: ROOT, encoding: 'utf8' });
  return { status: result.status, stdout: result.stdout, stderr: result.stderr };
}

jest.setTimeout(60000);

describe('scripts/flight.ts', () => {
  // Reference carries computed with A. M. Nathan's "Trajectory Calculator: Golf Version"
  // (University of Illinois), ISA sea level: the model must stay within ±3 % (full shots) and
  // ±5 % (wedges) of them.
  it.each([
    [['--ball-speed', '54', '--launch', '16', '--spin', '7000'], 158.4, 0.03],
    [['--ball-speed', '45', '--launch', '24', '--spin', '9000'], 116.5, 0.05],
    [['--ball-speed', '35', '--launch', '28', '--spin', '8000'], 79.6, 0.05],
    [['--ball-speed', '71.5264', '--launch', '11', '--spin', '3000', '--temperature', '21', '--humidity', '50'], 246.0, 0.03],
  ])('flight %j --json carries within the bound of the published %d m', (args, carryM, bound) => {
    const { status, stdout } = flight(...args, '--json');
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    expect(Object.keys(out).sort()).toEqual(['airDensity', 'apexHeight', 'carry', 'descentAngle', 'flightTime', 'landingSpeed', 'offline', 'roll', 'total']);
    expect(Math.abs(out.carry / carryM - 1)).toBeLessThanOrEqual(bound);
    expect(out.total).toBeCloseTo(out.carry + out.roll, 9);
  });
  it('flight --units imperial reads mph and prints the published driver carry in yards, with roll and total', () => {
    // 167 mph, 10.9°, 2686 rpm → 256.1 m = 280.1 yd (1 yd = 0.9144 m, NIST SP 811).
    const { status, stdout } = flight('--ball-speed', '167', '--launch', '10.9', '--spin', '2686', '--units', 'imperial');
    expect(status).toBe(0);
    const carryYd = Number(/Carry +([\d.]+) yd/.exec(stdout)![1]);
    expect(Math.abs(carryYd / (256.1 / YARD) - 1)).toBeLessThanOrEqual(0.03);
    const rollYd = Number(/Roll +(-?[\d.]+) yd/.exec(stdout)![1]);
    const totalYd = Number(/Total +([\d.]+) yd/.exec(stdout)![1]);
    expect(totalYd).toBeCloseTo(carryYd + rollYd, 0);
    expect(stdout).toMatch(/Apex height +\d+ ft/);
  });
  // NIST SP 811 (2008), Appendix B.8: 1 mph = 0.44704 m/s, 1 yd = 0.9144 m, 1 ft = 0.3048 m
  // exactly. The same launch typed in mph and in m/s must fly the same ball, and the imperial
  // print must be the metric figures divided by those factors.
  it('flight --units imperial reads 167 mph as 74.65568 m/s and prints carry in yards and apex in feet by the SP 811 factors', () => {
    const si = JSON.parse(flight('--ball-speed', '74.65568', '--launch', '10.9', '--spin', '2686', '--json').stdout);
    const mph = JSON.parse(flight('--ball-speed', '167', '--launch', '10.9', '--spin', '2686', '--units', 'imperial', '--json').stdout);
    expect(mph.carry).toBeCloseTo(si.carry, 9);
    const { stdout } = flight('--ball-speed', '167', '--launch', '10.9', '--spin', '2686', '--units', 'imperial');
    expect(Number(/Carry +([\d.]+) yd/.exec(stdout)![1])).toBeCloseTo(si.carry / 0.9144, 1);
    expect(Number(/Apex height +(\d+) ft/.exec(stdout)![1])).toBeCloseTo(si.apexHeight / 0.3048, 0);
  });
  it('flight with air conditions at the ISO 2533 altitude uses the standard atmosphere density', () => {
    // ISO 2533: 1000 m → 1.11164 kg/m³ (dry; computed from the standard's troposphere formula).
    const { stdout } = flight('--ball-speed', '70', '--launch', '12', '--spin', '3000', '--altitude', '1000', '--json');
    expect(JSON.parse(stdout).airDensity).toBeCloseTo(1.11164, 3);
  });
  // Firmness acts on the ground only (common practice, no source: firm ground rolls farther).
  it('flight with --firmness rolls farther on firm ground than on soft, the carry unchanged', () => {
    const soft = JSON.parse(flight('--ball-speed', '70', '--launch', '12', '--spin', '2600', '--firmness', 'soft', '--json').stdout);
    const firm = JSON.parse(flight('--ball-speed', '70', '--launch', '12', '--spin', '2600', '--firmness', 'firm', '--json').stdout);
    expect(firm.carry).toBe(soft.carry);
    expect(firm.roll).toBeGreaterThan(soft.roll + 5);
  });
  it('flight with --model names the earlier default, which carries the published driver launch more than 5 % short', () => {
    const { stdout } = flight('--ball-speed', '167', '--launch', '10.9', '--spin', '2686', '--units', 'imperial', '--model', 'smits-smith-drag-lyu-lift', '--json');
    expect(JSON.parse(stdout).carry / 256.1 - 1).toBeLessThan(-0.05);
  });
  // Wind direction is where the wind blows from (WMO, "Guide to Instruments and Methods of
  // Observation", WMO-No. 8, ch. 5; from memory): from 90° (the right) it pushes the ball left.
  it('flight with a wind from the right lands the ball left', () => {
    const { stdout } = flight('--ball-speed', '55', '--launch', '16', '--spin', '6500', '--wind-speed', '6', '--wind-from', '90', '--json');
    expect(JSON.parse(stdout).offline).toBeLessThan(-1);
  });
  // Under the published model a 7-iron ball speed (120 mph) carries farthest near 20° launch;
  // for irons the window keeps to landings at least 45° steep (common practice, no source).
  it('flight --optimise --club iron at 120 mph finds a best launch near 20°, landing at least 45° steep', () => {
    const { status, stdout } = flight('--optimise', '--ball-speed', '120', '--units', 'imperial', '--club', 'iron', '--json');
    expect(status).toBe(0);
    const out = JSON.parse(stdout);
    expect(out.objective).toBe('carry');
    expect(out.minDescentAngle).toBe(45);
    expect(out.best.launchAngle).toBeGreaterThan(17);
    expect(out.best.launchAngle).toBeLessThan(23);
    expect(out.best.descentAngle).toBeGreaterThanOrEqual(45);
    expect(out.window.clipped).toBe(false);
  });
  it('flight --optimise --club driver maximises total, landing at least 35° steep', () => {
    const out = JSON.parse(flight('--optimise', '--ball-speed', '70', '--club', 'driver', '--json').stdout);
    expect(out.objective).toBe('total');
    expect(out.best.descentAngle).toBeGreaterThanOrEqual(35 - 1e-9);
    expect(out.best.total).toBeGreaterThan(out.best.carry);
  });
  it('flight --optimise --club wedge has no window and says so', () => {
    const { status, stdout } = flight('--optimise', '--ball-speed', '40', '--club', 'wedge');
    expect(status).toBe(0);
    expect(stdout).toMatch(/no launch window/);
  });
  it('flight --optimise prints a readable window', () => {
    const { status, stdout } = flight('--optimise', '--ball-speed', '60', '--club', 'hybrid', '--descent-floor', '42');
    expect(status).toBe(0);
    expect(stdout).toMatch(/Aim +most carry, landing at least 42° steep/);
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
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--firmness', 'muddy'], /--firmness must be soft, normal or firm/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--model', 'nope'], /--model: no coefficient model "nope"/],
    [['--optimise', '--ball-speed', '60', '--club', 'putter'], /--club must be driver, wood, hybrid, iron or wedge/],
    [['--optimise', '--ball-speed', '60', '--descent-floor', '40'], /--descent-floor goes with --club/],
    [['--ball-speed', '70', '--launch', '12', '--spin', '3000', '--club', 'iron'], /--club goes with --optimise/],
  ])('flight with bad arguments %j explains on stderr and exits 2', (args, message) => {
    const { status, stdout, stderr } = flight(...args);
    expect(status).toBe(2);
    expect(stderr).toMatch(message);
    expect(stdout).toBe('');
  });
});
