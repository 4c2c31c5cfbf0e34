/**
 * `npm run -s flight -- --ball-speed V --launch DEG --spin RPM [options]`: a ball flight from
 * launch conditions, or with `--optimise` the launch window for a ball speed. See --help.
 * Exit status: 0 done, 2 bad arguments.
 */
import { optimiseLaunch, simulateFlight, type AirConditions } from '@/analysis/flight';

// NIST SP 811 (2008), Appendix B: exact conversion factors.
const MPS_PER_MPH = 0.44704;
const M_PER_YARD = 0.9144;
const M_PER_FOOT = 0.3048;

const HELP = `Ovalyard ball flight

Usage:
  npm run -s flight -- --ball-speed V --launch DEG --spin RPM [options]
  npm run -s flight -- --optimise --ball-speed V [options]

Launch:
  --ball-speed V       ball speed (m/s; mph with --units imperial)
  --launch DEG         vertical launch angle, degrees, + upward
  --spin RPM           total spin rate, rpm
  --axis DEG           spin axis tilt, degrees, + tilted so the ball curves right (default 0)
  --direction DEG      launch direction, degrees, + starts right of the target line (default 0)

Air (defaults: ISO 2533 standard atmosphere at the altitude, dry, still):
  --temperature C      air temperature, °C
  --altitude M         altitude above sea level, metres (pressure from the standard atmosphere)
  --humidity PCT       relative humidity, 0-100 %
  --wind-speed V       wind speed (m/s; mph with --units imperial); needs --wind-from
  --wind-from DEG      where the wind comes from, seen from the player facing the target:
                       0 = from the target toward the player (headwind), 90 = from the right,
                       180 = from behind (tailwind), 270 = from the left

Output:
  --units si|imperial  si (default): m/s, metres; imperial: mph in, yards (carry, offline)
                       and feet (apex height) out
  --json               JSON in canonical units (m, s, deg, m/s, rpm, kg/m³)
  --optimise           the launch angle and spin rate that carry farthest at this ball speed,
                       and the window within 1 % of that carry
  --help               this text

Offline and directions: + is right of the target line.
`;

class UsageError extends Error {}

type Options = Record<string, string | true>;

const VALUE_FLAGS = new Set([
  'ball-speed', 'launch', 'spin', 'axis', 'direction', 'temperature', 'altitude', 'humidity',
  'wind-speed', 'wind-from', 'units',
]);
const SWITCHES = new Set(['json', 'optimise', 'help']);

function parseArgs(argv: readonly string[]): Options {
  const options: Options = {};
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (!arg.startsWith('--')) throw new UsageError(`unexpected argument "${arg}"`);
    const eq = arg.indexOf('=');
    const name = eq > 0 ? arg.slice(2, eq) : arg.slice(2);
    if (SWITCHES.has(name)) {
      if (eq > 0) throw new UsageError(`--${name} takes no value`);
      options[name] = true;
    } else if (VALUE_FLAGS.has(name)) {
      const value = eq > 0 ? arg.slice(eq + 1) : argv[++i];
      if (value === undefined || value === '' || (eq < 0 && value.startsWith('--'))) throw new UsageError(`--${name} needs a value`);
      if (name in options) throw new UsageError(`--${name} is given twice`);
      options[name] = value;
    } else {
      throw new UsageError(`unknown option --${name}`);
    }
  }
  return options;
}

function numberOption(options: Options, name: string): number | undefined {
  const raw = options[name];
  if (raw === undefined) return undefined;
  const value = Number(raw);
  if (typeof raw !== 'string' || raw.trim() === '' || !Number.isFinite(value)) throw new UsageError(`--${name} must be a number, got "${raw}"`);
  return value;
}

function required(options: Options, name: string): number {
  const value = numberOption(options, name);
  if (value === undefined) throw new UsageError(`--${name} is required`);
  return value;
}

function airFrom(options: Options, speedFactor: number): AirConditions {
  const air: AirConditions = {};
  const temperatureC = numberOption(options, 'temperature');
  const altitudeM = numberOption(options, 'altitude');
  const humidityPct = numberOption(options, 'humidity');
  const windSpeed = numberOption(options, 'wind-speed');
  const windFromDeg = numberOption(options, 'wind-from');
  if (temperatureC !== undefined) air.temperatureC = temperatureC;
  if (altitudeM !== undefined) air.altitudeM = altitudeM;
  if (humidityPct !== undefined) {
    if (humidityPct < 0 || humidityPct > 100) throw new UsageError(`--humidity must be 0-100, got ${humidityPct}`);
    air.humidityPct = humidityPct;
  }
  if ((windSpeed === undefined) !== (windFromDeg === undefined)) throw new UsageError('--wind-speed and --wind-from go together');
  if (windSpeed !== undefined && windFromDeg !== undefined) {
    if (windSpeed < 0) throw new UsageError(`--wind-speed must not be negative, got ${windSpeed}`);
    air.wind = { speedMps: windSpeed * speedFactor, fromDeg: windFromDeg };
  }
  return air;
}

function fixed(value: number, digits: number): string {
  return (Object.is(Math.round(value * 10 ** digits), -0) ? 0 : value).toFixed(digits);
}

function run(argv: readonly string[]): string {
  const options = parseArgs(argv);
  if (options.help) return HELP;
  const units = options.units ?? 'si';
  if (units !== 'si' && units !== 'imperial') throw new UsageError(`--units must be si or imperial, got "${units}"`);
  const imperial = units === 'imperial';
  const speedFactor = imperial ? MPS_PER_MPH : 1;
  const ballSpeedMps = required(options, 'ball-speed') * speedFactor;
  if (!(ballSpeedMps > 0)) throw new UsageError('--ball-speed must be positive');
  const air = airFrom(options, speedFactor);
  const distance = (m: number) => (imperial ? `${fixed(m / M_PER_YARD, 1)} yd` : `${fixed(m, 1)} m`);
  const height = (m: number) => (imperial ? `${fixed(m / M_PER_FOOT, 0)} ft` : `${fixed(m, 1)} m`);
  const speed = (mps: number) => (imperial ? `${fixed(mps / MPS_PER_MPH, 1)} mph` : `${fixed(mps, 1)} m/s`);

  if (options.optimise) {
    for (const name of ['launch', 'spin', 'axis', 'direction']) {
      if (name in options) throw new UsageError(`--${name} does not go with --optimise`);
    }
    const result = optimiseLaunch(ballSpeedMps, air);
    if (options.json) {
      return `${JSON.stringify({
        ballSpeed: ballSpeedMps,
        best: { launchAngle: result.best.launchAngleDeg, spinRate: result.best.spinRateRpm, carry: result.best.carryM },
        bestOnEdge: result.bestOnEdge,
        window: {
          withinPct: 1,
          carry: result.window.thresholdCarryM,
          launchAngle: result.window.launchRangeDeg,
          spinRate: result.window.spinRangeRpm,
          polygon: result.window.polygon.map((p) => [p.launchAngleDeg, p.spinRateRpm]),
        },
        airDensity: result.airDensityKgM3,
      })}\n`;
    }
    const { best, window } = result;
    return [
      `Ball speed      ${speed(ballSpeedMps)}`,
      `Best launch     ${fixed(best.launchAngleDeg, 1)}° with ${fixed(best.spinRateRpm, 0)} rpm: carry ${distance(best.carryM)}${result.bestOnEdge ? ' (on the edge of the searched range)' : ''}`,
      `Within 1 %      launch ${fixed(window.launchRangeDeg[0], 1)}–${fixed(window.launchRangeDeg[1], 1)}°, spin ${fixed(window.spinRangeRpm[0], 0)}–${fixed(window.spinRangeRpm[1], 0)} rpm (carry ≥ ${distance(window.thresholdCarryM)})`,
      ...window.rows.map((r) => `  at ${fixed(r.launchAngleDeg, 1).padStart(4)}°  ${fixed(r.spinMinRpm, 0).padStart(5)}–${fixed(r.spinMaxRpm, 0)} rpm`),
      `Air density     ${fixed(result.airDensityKgM3, 4)} kg/m³`,
      '',
    ].join('\n');
  }

  const flight = simulateFlight(
    {
      ballSpeedMps,
      launchAngleDeg: required(options, 'launch'),
      spinRateRpm: required(options, 'spin'),
      spinAxisDeg: numberOption(options, 'axis') ?? 0,
      launchDirectionDeg: numberOption(options, 'direction') ?? 0,
    },
    air,
  );
  if (options.json) {
    return `${JSON.stringify({
      carry: flight.carryM,
      offline: flight.offlineM,
      apexHeight: flight.apexHeightM,
      flightTime: flight.flightTimeS,
      descentAngle: flight.descentAngleDeg,
      landingSpeed: flight.landingSpeedMps,
      airDensity: flight.airDensityKgM3,
    })}\n`;
  }
  return [
    `Carry           ${distance(flight.carryM)}`,
    `Offline         ${distance(flight.offlineM)} (+ right)`,
    `Apex height     ${height(flight.apexHeightM)}`,
    `Flight time     ${fixed(flight.flightTimeS, 2)} s`,
    `Descent angle   ${fixed(flight.descentAngleDeg, 1)}°`,
    `Landing speed   ${speed(flight.landingSpeedMps)}`,
    `Air density     ${fixed(flight.airDensityKgM3, 4)} kg/m³`,
    '',
  ].join('\n');
}

try {
  process.stdout.write(run(process.argv.slice(2)));
} catch (error) {
  if (error instanceof UsageError || error instanceof RangeError) {
    process.stderr.write(`flight: ${error.message}\nTry --help.\n`);
    process.exitCode = 2;
  } else {
    throw error;
  }
}
