/**
 * Writes the demo bay files in fixtures/demo/ (invented sessions for the invented demo
 * scenario). Launch conditions are drawn around typical values for each club (common
 * practice, no source; demo only), then flown through Ovalyard's own ball-flight model so carry
 * and offline agree with the launch. Deterministic: a seeded generator.
 *   node --import tsx scripts/make-demo-files.ts
 */
import fs from 'node:fs';
import path from 'node:path';
import { simulateFlight } from '@/analysis/flight';
import { FOOT_M as FT, MPH_MPS as MPH, YARD_M as YD } from '@/analysis/units';
import { normalFrom, seededRandom } from '@/fixtures/seeded-random';

const OUT = path.resolve(__dirname, '../fixtures/demo');

interface ClubPlan {
  club: string;
  label: string;
  build: string;
  shots: number;
  clubMph: number;
  smash: number;
  launchDeg: number;
  spinRpm: number;
  /** Mean spin axis (+ curves right) and start direction. */
  axisDeg: number;
  directionDeg: number;
  /** Spread multipliers. */
  spread?: number;
}

interface Row {
  club: string;
  build: string;
  clubMph: number;
  ballMph: number;
  launchDeg: number;
  directionDeg: number;
  spinRpm: number;
  axisDeg: number;
  carryYd: number;
  offlineYd: number;
  apexFt: number;
  descentDeg: number;
}

function session(plans: ClubPlan[], seed: number, air = { temperatureC: 18, altitudeM: 40, humidityPct: 55 }): Row[] {
  const r = seededRandom(seed);
  const rows: Row[] = [];
  for (const p of plans) {
    const s = p.spread ?? 1;
    for (let i = 0; i < p.shots; i += 1) {
      const mishit = r() < 0.07; // an occasional thin or toe strike: a stray for the demo
      const clubMph = p.clubMph * (1 + 0.015 * s * normalFrom(r));
      const smash = (mishit ? p.smash * 0.86 : p.smash) * (1 + 0.008 * normalFrom(r));
      const ballMph = clubMph * smash;
      const launchDeg = p.launchDeg + 1.1 * s * normalFrom(r) - (mishit ? 2.5 : 0);
      const spinRpm = Math.max(800, p.spinRpm * (1 + 0.09 * s * normalFrom(r)));
      const axisDeg = p.axisDeg + 4.5 * s * normalFrom(r);
      const directionDeg = p.directionDeg + 1.8 * s * normalFrom(r);
      const f = simulateFlight({ ballSpeedMps: ballMph * MPH, launchAngleDeg: launchDeg, spinRateRpm: spinRpm, spinAxisDeg: axisDeg, launchDirectionDeg: directionDeg }, air);
      rows.push({
        club: p.label,
        build: p.build,
        clubMph,
        ballMph,
        launchDeg,
        directionDeg,
        spinRpm,
        axisDeg,
        carryYd: f.carryM / YD,
        offlineYd: f.offlineM / YD,
        apexFt: f.apexHeightM / FT,
        descentDeg: f.descentAngleDeg,
      });
    }
  }
  return rows;
}

const lr = (v: number, d = 1) => (Math.abs(v) < 0.05 ? (0).toFixed(d) : `${Math.abs(v).toFixed(d)} ${v < 0 ? 'L' : 'R'}`);

// Nell: driver, two builds (stock loft vs loft up one step with heel mass), and 7 iron, two shafts.
const nell = session(
  [
    { club: 'DR', label: 'Driver', build: 'Stock 10.5', shots: 12, clubMph: 92, smash: 1.44, launchDeg: 11.5, spinRpm: 2700, axisDeg: 9, directionDeg: 2.5, spread: 1.2 },
    { club: 'DR', label: 'Driver', build: 'Loft up + heel 6 g', shots: 12, clubMph: 91.5, smash: 1.45, launchDeg: 13.2, spinRpm: 2850, axisDeg: 2, directionDeg: 1, spread: 1 },
    { club: '7I', label: '7 Iron', build: 'Steel 105 S', shots: 10, clubMph: 76, smash: 1.31, launchDeg: 17, spinRpm: 6400, axisDeg: 2, directionDeg: 0.8 },
    { club: '7I', label: '7 Iron', build: 'Graphite 75 R', shots: 10, clubMph: 77, smash: 1.31, launchDeg: 18.2, spinRpm: 6100, axisDeg: 1, directionDeg: 0.4, spread: 0.8 },
  ],
  20261128,
);
const nellCsv = [
  'Session export,Larchmere bay 1',
  'Player,Nell Tarrant',
  '',
  'Shot,Club,Build,Club Speed (mph),Ball Speed (mph),Launch Angle (deg),Launch Direction,Spin Rate (rpm),Spin Axis,Carry (yds),Offline (yds),Apex (ft),Descent (deg)',
  ...nell.map((x, i) =>
    [i + 1, x.club, x.build, x.clubMph.toFixed(1), x.ballMph.toFixed(1), x.launchDeg.toFixed(1), lr(x.directionDeg), Math.round(x.spinRpm), lr(x.axisDeg), x.carryYd.toFixed(1), lr(x.offlineYd), x.apexFt.toFixed(0), x.descentDeg.toFixed(1)].join(','),
  ),
].join('\n');

// Amos: wedge gapping and irons on the range, metric, semicolon + decimal comma.
const amosPlans: ClubPlan[] = [
  ['6I', '6i', 84, 1.36, 14.5, 5600],
  ['7I', '7i', 82, 1.34, 16.5, 6300],
  ['8I', '8i', 80, 1.31, 18.5, 7100],
  ['9I', '9i', 78, 1.27, 21, 7900],
  ['PW', 'PW', 76, 1.22, 24, 8600],
  ['W50', '50°', 74, 1.18, 26.5, 9000],
  ['W54', '54°', 72, 1.13, 29.5, 9400],
  ['W58', '58°', 70, 1.08, 32.5, 9800],
].map(([club, label, mph, smash, launch, spin]) => ({ club: club as string, label: label as string, build: '', shots: 8, clubMph: mph as number, smash: smash as number, launchDeg: launch as number, spinRpm: spin as number, axisDeg: -1.5, directionDeg: -0.5, spread: 0.8 }));
const amos = session(amosPlans, 20261121, { temperatureC: 22, altitudeM: 120, humidityPct: 60 });
const dec = (v: number, d = 1) => v.toFixed(d).replace('.', ',');
const amosCsv = [
  'Club;Ball speed [km/h];Club speed [km/h];Launch [°];Side angle [°];Total spin [rpm];Spin tilt [°];Carry [m];Side [m]',
  ...amos.map((x) =>
    [x.club, dec(x.ballMph * 1.609344), dec(x.clubMph * 1.609344), dec(x.launchDeg), dec(x.directionDeg), Math.round(x.spinRpm), dec(x.axisDeg), dec(x.carryYd * YD), dec(x.offlineYd * YD)].join(';'),
  ),
].join('\n');

// Bea: hybrids against long irons, remote fitting from her own monitor: no carry column (flight model fills it).
const bea = session(
  [
    { club: '4I', label: '4 Iron', build: 'Current set', shots: 8, clubMph: 72, smash: 1.33, launchDeg: 10.5, spinRpm: 4300, axisDeg: 6, directionDeg: 1.5, spread: 1.5 },
    { club: '4H', label: '4 Hybrid', build: '22° hybrid', shots: 8, clubMph: 74, smash: 1.4, launchDeg: 14, spinRpm: 4500, axisDeg: 2, directionDeg: 0.5, spread: 1.1 },
    { club: '5H', label: '5 Hybrid', build: '26° hybrid', shots: 8, clubMph: 73, smash: 1.39, launchDeg: 15.5, spinRpm: 4900, axisDeg: 1, directionDeg: 0.5, spread: 1.1 },
    { club: '7W', label: '7 Wood', build: '21° seven wood', shots: 8, clubMph: 76, smash: 1.42, launchDeg: 14.5, spinRpm: 4300, axisDeg: 3, directionDeg: 1, spread: 1.2 },
  ],
  20261130,
  { temperatureC: 19, altitudeM: 40, humidityPct: 50 },
);
const beaCsv = [
  'Club\tHead\tBall Speed\tLaunch Angle\tLaunch Direction\tSpin Rate\tSpin Axis',
  '\t\tmph\tdeg\tdeg\trpm\tdeg',
  ...bea.map((x) => [x.club, x.build, x.ballMph.toFixed(1), x.launchDeg.toFixed(1), x.directionDeg.toFixed(1), Math.round(x.spinRpm), x.axisDeg.toFixed(1)].join('\t')),
  '',
  `Average\t\t${(bea.reduce((s, x) => s + x.ballMph, 0) / bea.length).toFixed(1)}\t\t\t\t`,
].join('\n');

fs.mkdirSync(OUT, { recursive: true });
fs.writeFileSync(path.join(OUT, 'nell-driver-and-7-iron.csv'), nellCsv + '\n');
fs.writeFileSync(path.join(OUT, 'amos-wedge-gapping.csv'), amosCsv + '\n');
fs.writeFileSync(path.join(OUT, 'bea-hybrids-remote.tsv'), beaCsv + '\n');
console.log(`Wrote ${nell.length + amos.length + bea.length} invented shots to ${OUT}`);
