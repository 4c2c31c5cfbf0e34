/**
 * npm run bench [-- --json] [-- --only import,store,analyse,flight]
 * Speed and memory figures, printed as figures and ratios against a bare baseline (targets in
 * the issue texts and DEVELOPERS.md); never asserted in tests.
 */
import { benchAnalyse } from './bench/analyse';
import { benchFlight } from './bench/flight';
import { benchImport } from './bench/import';
import { benchStore } from './bench/store';

async function main() {
  const json = process.argv.includes('--json');
  const onlyArg = process.argv.find((a) => a.startsWith('--only='))?.slice(7) ?? (process.argv.includes('--only') ? process.argv[process.argv.indexOf('--only') + 1] : undefined);
  const only = new Set((onlyArg ?? 'import,store,analyse,flight').split(','));
  const out: Record<string, Record<string, number>> = {};
  const log = (line: string) => {
    if (!json) console.log(line);
  };
  const rssMb = () => process.memoryUsage().rss / 1048576;
  if (only.has('import')) {
    const r = benchImport();
    out.import = { mapMs: r.mapMs, papaparseMs: r.papaparseMs, ratio: r.ratio };
    log(`import   100,000 rows: parse+map+validate ${r.mapMs.toFixed(0)} ms, bare papaparse ${r.papaparseMs.toFixed(0)} ms, ratio ${r.ratio.toFixed(2)} (target ≤ 1.5)`);
  }
  if (only.has('store')) {
    const r = await benchStore();
    out.store = { ms: r.ms, rawMs: r.rawMs, ratio: r.ratio };
    log(`store    100,000 shots: shot store ${r.ms.toFixed(0)} ms, raw multi-row INSERT ${r.rawMs.toFixed(0)} ms, ratio ${r.ratio.toFixed(2)} (target ≤ 1.5)`);
  }
  if (only.has('analyse')) {
    const r = benchAnalyse();
    out.analyse = { ms: r.ms, loopMs: r.loopMs, ratio: r.ratio };
    log(`analyse  100,000 shots, 14 clubs × 3 builds: ${r.ms.toFixed(1)} ms, bare mean/variance loop ${r.loopMs.toFixed(1)} ms, ratio ${r.ratio.toFixed(2)} (target ≤ 4, < 150 ms)`);
  }
  if (only.has('flight')) {
    const r = benchFlight();
    out.flight = { perSecond: r.perSecond, maxCarryErrorPct: r.maxCarryErrorPct, ...Object.fromEntries(Object.entries(r.windowMs).map(([k, ms]) => [`${k}WindowMs`, ms])) };
    log(`flight   ${Math.round(r.perSecond).toLocaleString('en')} trajectories/s on one core (target ≥ 50,000); max carry error vs fine step ${r.maxCarryErrorPct.toExponential(2)} % (target ≤ 0.5)`);
    log(`window   ${Object.entries(r.windowMs).map(([k, ms]) => `${k} ${ms.toFixed(0)} ms`).join(', ')} for one ball speed (target < 100 ms)`);
  }
  out.process = { rssMb: rssMb() };
  log(`process  resident memory ${rssMb().toFixed(0)} MB`);
  if (json) console.log(JSON.stringify(out));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
