/**
 * `npm run -s flight -- --ball-speed V --launch DEG --spin RPM [options]`: a ball flight from
 * launch conditions, or with `--optimise` the launch window for a ball speed. See --help.
 * Exit status: 0 done, 2 bad arguments.
 */
import {
  coefficientModel,
  COEFFICIENT_MODELS,
  GROUND_FIRMNESSES,
  launchWindowForClub,
  optimiseLaunch,
  simulateFlight,
  type Conditions,
  type GroundFirmness,
  type LaunchOptimum,
} from '@/analysis/flight';
import type { ClubKind } from '@/analysis/clubs';

import { FOOT_M as M_PER_FOOT, MPH_MPS as MPS_PER_MPH, YARD_M as M_PER_YARD } from '@/analysis/units';

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
  --wind-speed V       wind speed at 10 m above the ground (m/s; mph with --units
                       imperial); it grows with height (log profile over grass); needs --wind-from
  --wind-from DEG      where the wind comes from, seen from the player facing the target:
                       0 = from the target toward the player (headwind), 90 = from the right,
                       180 = from behind (tailwind), 270 = from the left

Ground:
  --firmness F         soft, normal (default) or firm: the ground the ball runs on (total, roll)

Model:
  --model NAME         coefficient model: ${Object.keys(COEFFICIENT_MODELS).join(', ')}
                       (default modern-ball)

Output:
  --units si|imperial  si (default): m/s, metres; imperial: mph in, yards (carry, offline)
                       and feet (apex height) out
  --json               JSON in canonical units (m, s, deg, m/s, rpm, kg/m³)
  --optimise           the best launch angle and spin rate at this ball speed, and the
                       window within 1 % of the best; with --club, the kind's aim:
  --club KIND          driver or wood: most total (landing at least 35° steep);
                       hybrid or iron: most carry landing at least 40° / 45° steep;
                       wedge: no window (spin and descent only). Without --club: most carry
  --descent-floor DEG  the steepness the window keeps to (with --club driver|wood|hybrid|iron)
  --help               this text

Offline and directions: + is right of the target line.
`;

class UsageError extends Error {}

type Options = Record<string, string | true>;

const VALUE_FLAGS = new Set([
  'ball-speed', 'launch', 'spin', 'axis', 'direction', 'temperature', 'altitude', 'humidity',
  'wind-speed', 'wind-from', 'units', 'firmness', 'model', 'club', 'descent-floor',
]);
const CLUB_KINDS: readonly ClubKind[] = ['driver', 'wood', 'hybrid', 'iron', 'wedge'];
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

function airFrom(options: Options, speedFactor: number): Conditions {
  const air: Conditions = {};
  const firmness = options.firmness;
  if (firmness !== undefined) {
    if (!GROUND_FIRMNESSES.includes(firmness as GroundFirmness)) throw new UsageError(`--firmness must be soft, normal or firm, got "${String(firmness)}"`);
    air.firmness = firmness as GroundFirmness;
  }
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
  let model;
  if (typeof options.model === 'string') {
    try {
      model = coefficientModel(options.model);
    } catch (error) {
      throw new UsageError(`--model: ${(error as Error).message}`);
    }
  }
  const distance = (m: number) => (imperial ? `${fixed(m / M_PER_YARD, 1)} yd` : `${fixed(m, 1)} m`);
  const height = (m: number) => (imperial ? `${fixed(m / M_PER_FOOT, 0)} ft` : `${fixed(m, 1)} m`);
  const speed = (mps: number) => (imperial ? `${fixed(mps / MPS_PER_MPH, 1)} mph` : `${fixed(mps, 1)} m/s`);

  if (options.optimise) {
    for (const name of ['launch', 'spin', 'axis', 'direction']) {
      if (name in options) throw new UsageError(`--${name} does not go with --optimise`);
    }
    const club = options.club;
    if (club !== undefined && !CLUB_KINDS.includes(club as ClubKind)) throw new UsageError(`--club must be driver, wood, hybrid, iron or wedge, got "${String(club)}"`);
    const descentFloorDeg = numberOption(options, 'descent-floor');
    if (descentFloorDeg !== undefined && (club === undefined || club === 'wedge')) throw new UsageError('--descent-floor goes with --club driver, wood, hybrid or iron');
    const result: LaunchOptimum | null =
      club === undefined
        ? optimiseLaunch(ballSpeedMps, air, { model })
        : launchWindowForClub(club as ClubKind, ballSpeedMps, air, { model, descentFloorDeg });
    if (!result) {
      if (options.json) return `${JSON.stringify({ ballSpeed: ballSpeedMps, club, window: null })}\n`;
      return `Ball speed      ${speed(ballSpeedMps)}\nA wedge has no launch window here: look at its spin and descent angle.\n`;
    }
    if (options.json) {
      return `${JSON.stringify({
        ballSpeed: ballSpeedMps,
        club: club ?? null,
        objective: result.objective,
        minDescentAngle: result.minDescentDeg,
        feasible: result.feasible,
        best: {
          launchAngle: result.best.launchAngleDeg,
          spinRate: result.best.spinRateRpm,
          carry: result.best.carryM,
          total: result.best.totalM,
          descentAngle: result.best.descentAngleDeg,
        },
        bestOnEdge: result.bestOnEdge,
        window: {
          withinPct: 1,
          threshold: result.window.thresholdM,
          launchAngle: result.window.launchRangeDeg,
          spinRate: result.window.spinRangeRpm,
          clipped: result.window.clipped,
          polygon: result.window.polygon.map((p) => [p.launchAngleDeg, p.spinRateRpm]),
        },
        airDensity: result.airDensityKgM3,
      })}\n`;
    }
    const { best, window } = result;
    const aim = result.objective === 'total' ? 'total' : 'carry';
    return [
      `Ball speed      ${speed(ballSpeedMps)}`,
      `Aim             most ${aim}${result.minDescentDeg !== null ? `, landing at least ${fixed(result.minDescentDeg, 0)}° steep` : ''}${result.feasible ? '' : ' (no searched launch lands that steep)'}`,
      `Best launch     ${fixed(best.launchAngleDeg, 1)}° with ${fixed(best.spinRateRpm, 0)} rpm: carry ${distance(best.carryM)}, total ${distance(best.totalM)}, descent ${fixed(best.descentAngleDeg, 1)}°${result.bestOnEdge ? ' (on the edge of the searched range)' : ''}`,
      `Within 1 %      launch ${fixed(window.launchRangeDeg[0], 1)}–${fixed(window.launchRangeDeg[1], 1)}°, spin ${fixed(window.spinRangeRpm[0], 0)}–${fixed(window.spinRangeRpm[1], 0)} rpm (${aim} ≥ ${distance(window.thresholdM)})`,
      ...window.rows.map((r) => `  at ${fixed(r.launchAngleDeg, 1).padStart(4)}°  ${fixed(r.spinMinRpm, 0).padStart(5)}–${fixed(r.spinMaxRpm, 0)} rpm`),
      `Air density     ${fixed(result.airDensityKgM3, 4)} kg/m³`,
      '',
    ].join('\n');
  }
  for (const name of ['club', 'descent-floor']) {
    if (name in options) throw new UsageError(`--${name} goes with --optimise`);
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
    { model },
  );
  if (options.json) {
    return `${JSON.stringify({
      carry: flight.carryM,
      offline: flight.offlineM,
      apexHeight: flight.apexHeightM,
      flightTime: flight.flightTimeS,
      descentAngle: flight.descentAngleDeg,
      landingSpeed: flight.landingSpeedMps,
      total: flight.totalM,
      roll: flight.rollM,
      airDensity: flight.airDensityKgM3,
    })}\n`;
  }
  return [
    `Carry           ${distance(flight.carryM)}`,
    `Roll            ${distance(flight.rollM)} (${air.firmness ?? 'normal'} ground; − spins back)`,
    `Total           ${distance(flight.totalM)}`,
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
