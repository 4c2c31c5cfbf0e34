/**
 * npm run bench [-- --json] [-- --only import,store,analyse,flight,api,web]
 * Speed and memory figures, each printed with its goal (issue texts and DEVELOPERS.md); never
 * asserted in tests. `api` and `web` start a throwaway MariaDB and the bench server
 * (scripts/bench/bench-env.ts); `web` needs Debian's chromium.
 */
import { benchAnalyse } from './bench/analyse';
import { benchApi } from './bench/api';
import { startBenchEnv, type BenchEnv } from './bench/bench-env';
import { benchFlight } from './bench/flight';
import { benchImport } from './bench/import';
import { benchStore } from './bench/store';
import { benchWeb } from './bench/web';

const ALL = 'import,store,analyse,flight,api,web';

async function main() {
  const json = process.argv.includes('--json');
  const onlyArg = process.argv.find((a) => a.startsWith('--only='))?.slice(7) ?? (process.argv.includes('--only') ? process.argv[process.argv.indexOf('--only') + 1] : undefined);
  const only = new Set((onlyArg ?? ALL).split(','));
  const unknown = [...only].filter((o) => !ALL.split(',').includes(o));
  if (unknown.length) throw new Error(`unknown --only part: ${unknown.join(', ')} (parts: ${ALL})`);
  const out: Record<string, Record<string, number>> = {};
  const log = (line: string) => {
    if (!json) console.log(line);
  };
  const ms = (x: number) => `${x.toFixed(0)} ms`;
  const rssMb = () => process.memoryUsage().rss / 1048576;
  if (only.has('import')) {
    const r = benchImport();
    out.import = { mapMs: r.mapMs, papaparseMs: r.papaparseMs, ratio: r.ratio };
    log(`import   100,000 rows: parse+map+validate ${r.mapMs.toFixed(0)} ms, bare papaparse ${r.papaparseMs.toFixed(0)} ms, ratio ${r.ratio.toFixed(2)} (goal ≤ 1.2)`);
  }
  if (only.has('store')) {
    const r = await benchStore();
    out.store = { ms: r.ms, rawMs: r.rawMs, ratio: r.ratio };
    log(`store    100,000 shots: shot store ${r.ms.toFixed(0)} ms, raw multi-row INSERT ${r.rawMs.toFixed(0)} ms, ratio ${r.ratio.toFixed(2)} (goal ≤ 1.5)`);
  }
  if (only.has('analyse')) {
    const r = benchAnalyse();
    out.analyse = { ms: r.ms, loopMs: r.loopMs, ratio: r.ratio };
    log(`analyse  100,000 shots, 14 clubs × 3 builds: ${r.ms.toFixed(1)} ms (goal ≤ 60), bare mean/variance loop ${r.loopMs.toFixed(1)} ms, ratio ${r.ratio.toFixed(2)} (goal ≤ 4)`);
  }
  if (only.has('flight')) {
    const r = benchFlight();
    out.flight = { perSecond: r.perSecond, maxCarryErrorPct: r.maxCarryErrorPct, ...Object.fromEntries(Object.entries(r.windowMs).map(([k, ms]) => [`${k}WindowMs`, ms])) };
    log(`flight   ${Math.round(r.perSecond).toLocaleString('en')} trajectories/s on one core (target ≥ 50,000); max carry error vs fine step ${r.maxCarryErrorPct.toExponential(2)} % (target ≤ 0.5)`);
    log(`window   ${Object.entries(r.windowMs).map(([k, ms]) => `${k} ${ms.toFixed(0)} ms`).join(', ')} for one ball speed (target < 100 ms)`);
  }
  let env: BenchEnv | undefined;
  try {
    if (only.has('api') || only.has('web')) env = await startBenchEnv();
    if (only.has('api') && env) {
      const r = await benchApi({ env, log });
      out.api = {
        analysisP99Ms: r.analysisP99Ms,
        analysisRatio: r.analysisRatio,
        floorP99Ms: r.floorP99Ms,
        analysisRps: r.analysisRps,
        analysisRps2: r.analysisRps2,
        healthP99DuringImportMs: r.healthP99DuringImportMs,
        analysisBodyKb: r.analysisBodyKb,
        analysisWireKb: r.analysisWireKb,
      };
      log(`api      analysis, 2,000 shots, 50 connections: p99 ${ms(r.analysisP99Ms)} (goal ≤ 50 ms), p50 ${ms(r.analysisP50Ms)}, ${r.analysisRps.toFixed(0)} requests/s`);
      log(`api      the same load on a prepared body of the same bytes: p99 ${ms(r.floorP99Ms)}, ${r.floorRps.toFixed(0)} requests/s; ratio ${r.analysisRatio.toFixed(2)} (goal ≤ 2)`);
      log(`api      analysis with 2 server processes: ${r.analysisRps2.toFixed(0)} requests/s (1 process: ${r.analysisRps.toFixed(0)}), p99 ${ms(r.analysisP99Ms2)}`);
      log(`api      /api/health while a 200,000-row file is committed (${(r.import200kMs / 1000).toFixed(1)} s): p99 ${ms(r.healthP99DuringImportMs)} (goal ≤ 50 ms), max ${ms(r.healthMaxDuringImportMs)}`);
    }
    if (only.has('web') && env) {
      const r = await benchWeb(env, log);
      if (r) {
        out.web = { signInKb: r.signInKb, signInButtonMs: r.signInButtonMs };
        const kinds = Object.entries(r.byKindKb).map(([k, kb]) => `${k} ${kb.toFixed(0)}`).join(', ');
        log(`web      sign-in page on the wire: ${r.signInKb.toFixed(0)} KB (goal ≤ 350) in ${r.requests} requests (KB: ${kinds}; "other" not counted)`);
        log(`web      sign-in button, 4× slower CPU, 10 Mbit/s: ${ms(r.signInButtonMs)} (goal ≤ 3,000; informational; runs ${r.signInButtonRunsMs.map((x) => x.toFixed(0)).join(', ')} ms)`);
      }
    }
  } finally {
    await env?.stop();
  }
  out.process = { rssMb: rssMb() };
  log(`process  resident memory ${rssMb().toFixed(0)} MB`);
  if (json) console.log(JSON.stringify(out));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
