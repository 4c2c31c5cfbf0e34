/**
 * npm run -s analyse -- FILE.csv [--recipe RECIPE.json] [--json] [--all] [--level 0.95]
 *                       [--compare CLUB:BUILD CLUB:BUILD] [--units imperial|metric]
 *
 * The session analysis on the command line, over the same analysis/ code as the app.
 * Exit status: 0 done; 1 the file could not be read; 2 bad arguments, or a column the analysis
 * needs is ambiguous without a recipe (the message says which column and why).
 */
import fs from 'node:fs';
import type { ShotField, ShotValues } from '@/analysis/fields';
import { fillFlightFields } from '@/analysis/flight';
import { ImportError, importBayFile, parseClubName, recipeSchema, suggestMapping, type Recipe } from '@/analysis/import';
import { analyseSession, type GroupRef, type SessionAnalysis } from '@/analysis/session';
import { displayUnits, fromCanonical, type UnitSystem } from '@/analysis/units';

const HELP = `Usage: npm run -s analyse -- FILE.csv [options]

Options:
  --recipe FILE.json     apply a saved column mapping (recipe) on top of the automatic one
  --json                 print one JSON document (canonical units: m/s, m, deg, rpm, s)
  --all                  keep strays in the statistics (default: strays are left out)
  --level P              oval level, 0 < P < 1 (default 0.95)
  --compare A B          head-to-head of two groups, each CLUB:BUILD (e.g. 7I:Steel, "7 iron:Graphite 65")
  --units imperial|metric  units of the readable table (default imperial)
  --help                 this text

Without --recipe the automatic mapping is used; when a column the analysis needs (club, speeds,
carry, offline) has a doubtful or unknown unit, or two columns claim it, the command stops with
status 2 and names the column. A sign convention that is only assumed is reported on stderr.`;

class UsageError extends Error {}

interface Args {
  file: string;
  recipe?: Recipe;
  json: boolean;
  all: boolean;
  level: number;
  compare?: [GroupRef, GroupRef];
  units: UnitSystem;
}

function parseGroupRef(text: string): GroupRef {
  const i = text.indexOf(':');
  const clubText = (i === -1 ? text : text.slice(0, i)).trim();
  const build = i === -1 ? '' : text.slice(i + 1).trim();
  if (!clubText) throw new UsageError(`--compare: "${text}" names no club (write CLUB:BUILD)`);
  return { club: parseClubName(clubText).code, build: build === '' ? null : build };
}

export function parseArgs(argv: readonly string[]): Args | 'help' {
  const out: Partial<Args> = { json: false, all: false, level: 0.95, units: 'imperial' };
  const rest = [...argv];
  while (rest.length) {
    const a = rest.shift()!;
    const value = (name: string) => {
      const v = rest.shift();
      if (v === undefined || v.startsWith('--')) throw new UsageError(`${name} needs a value`);
      return v;
    };
    if (a === '--help' || a === '-h') return 'help';
    else if (a === '--json') out.json = true;
    else if (a === '--all') out.all = true;
    else if (a === '--level') {
      const level = Number(value('--level'));
      if (!(level > 0 && level < 1)) throw new UsageError('--level must be a number between 0 and 1, e.g. 0.95');
      out.level = level;
    } else if (a === '--recipe') {
      const path = value('--recipe');
      let raw: unknown;
      try {
        raw = JSON.parse(fs.readFileSync(path, 'utf8'));
      } catch (err) {
        throw new UsageError(`--recipe ${path}: ${(err as Error).message}`);
      }
      const parsed = recipeSchema.safeParse(raw);
      if (!parsed.success) throw new UsageError(`--recipe ${path}: ${parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
      out.recipe = parsed.data;
    } else if (a === '--compare') {
      out.compare = [parseGroupRef(value('--compare')), parseGroupRef(value('--compare'))];
    } else if (a === '--units') {
      const u = value('--units');
      if (u !== 'imperial' && u !== 'metric') throw new UsageError('--units is imperial or metric');
      out.units = u;
    } else if (a.startsWith('--')) throw new UsageError(`unknown option ${a}`);
    else if (out.file) throw new UsageError(`one file at a time (got ${out.file} and ${a})`);
    else out.file = a;
  }
  if (!out.file) throw new UsageError('name a bay file (CSV)');
  return out as Args;
}

const NEEDED = new Set<string>(['club', 'ballSpeed', 'clubSpeed', 'carry', 'offline']);

/** Columns the analysis needs whose mapping is a guess the command will not make silently. */
export function blockingDoubts(text: string): { column: string; reason: string }[] {
  return suggestMapping(text).ambiguous.filter((a) => a.kind !== 'sign' && NEEDED.has(a.field));
}

export interface AnalyseOutput extends SessionAnalysis {
  rows: number;
  imported: number;
  rejected: { row: number; reason: string }[];
}

export function analyseText(text: string, args: Pick<Args, 'recipe' | 'all' | 'level' | 'compare'> & { units?: UnitSystem }): AnalyseOutput {
  const result = importBayFile(text, { recipe: args.recipe, fillFlight: (v: ShotValues) => fillFlightFields(v) });
  const analysis = analyseSession(result.shots, { level: args.level, includeStrays: args.all, compare: args.compare, units: args.units });
  return {
    rows: result.rows,
    imported: result.shots.length,
    rejected: result.rejected.map((r) => ({ row: r.row, reason: r.column ? `${r.column}: ${r.reason}` : r.reason })),
    ...analysis,
  };
}

function table(out: AnalyseOutput, units: UnitSystem): string {
  const u = displayUnits(units);
  const show = (field: ShotField, v: number | undefined | null, digits = 1) => (v == null ? '—' : fromCanonical(v, u[field], field).toFixed(digits));
  const cols: [string, (g: AnalyseOutput['groups'][number]) => string][] = [
    ['club', (g) => g.club],
    ['build', (g) => g.build ?? '—'],
    ['n', (g) => String(g.n)],
    ['kept', (g) => String(g.kept)],
    [`ball ${u.ballSpeed}`, (g) => show('ballSpeed', g.fields.ballSpeed?.mean)],
    ['smash', (g) => (g.smashFactor ? g.smashFactor.mean.toFixed(2) : '—')],
    ['launch°', (g) => show('launchAngle', g.fields.launchAngle?.mean)],
    ['spin rpm', (g) => show('spinRate', g.fields.spinRate?.mean, 0)],
    ['axis°', (g) => show('spinAxis', g.fields.spinAxis?.mean)],
    [`carry ${u.carry}`, (g) => `${show('carry', g.fields.carry?.mean)} ±${show('carry', g.fields.carry?.sd)}`],
    [`offline ${u.offline}`, (g) => `${show('offline', g.fields.offline?.mean)} ±${show('offline', g.fields.offline?.sd)}`],
    [`oval ${u.carry}`, (g) => (g.oval ? `${show('carry', g.oval.semiMajor)}×${show('carry', g.oval.semiMinor)} @${g.oval.angleDeg.toFixed(0)}°` : '—')],
    ['strays', (g) => String(g.strays.length)],
    ['fairway', (g) => (g.odds.fairway.p == null ? '—' : `${Math.round(100 * g.odds.fairway.p)}%`)],
    ['green', (g) => (g.odds.green.p == null ? '—' : `${Math.round(100 * g.odds.green.p)}%`)],
  ];
  const rows = [cols.map((c) => c[0]), ...out.groups.map((g) => cols.map((c) => c[1](g)))];
  const widths = cols.map((_, i) => Math.max(...rows.map((r) => r[i].length)));
  const lines = rows.map((r) => r.map((cell, i) => (i < 2 ? cell.padEnd(widths[i]) : cell.padStart(widths[i]))).join('  '));
  lines.splice(1, 0, widths.map((w) => '─'.repeat(w)).join('  '));
  const head = `${out.imported} of ${out.rows} rows imported${out.rejected.length ? `, ${out.rejected.length} rejected` : ''}; ovals at ${(out.groups.find((g) => g.oval)?.oval?.level ?? 0.95) * 100}%`;
  const extra: string[] = [];
  for (const r of out.rejected.slice(0, 10)) extra.push(`  row ${r.row}: ${r.reason}`);
  if (out.headToHead) {
    const h = out.headToHead;
    extra.push('', `Head-to-head: A = ${h.a.club} ${h.a.build ?? '—'}, B = ${h.b.club} ${h.b.build ?? '—'} (A − B, 95% CI, margin, verdict)`);
    const f = (field: ShotField, v: number) => (field === 'smashFactor' ? v.toFixed(3) : fromCanonical(v, u[field], field).toFixed(1));
    const words = (verdict: string, more: number | null) => (verdict === 'unclear' ? `not yet clear${more === null ? '' : ` (about ${more} more shots each)`}` : verdict);
    for (const [field, d] of Object.entries(h.fields) as [ShotField, NonNullable<(typeof h.fields)[ShotField]>][]) {
      const unit = field === 'smashFactor' ? '' : ` ${u[field]}`;
      extra.push(`  ${field.padEnd(16)} ${f(field, d.diff).padStart(8)}${unit}  [${f(field, d.ci95[0])}, ${f(field, d.ci95[1])}]  ±${f(field, d.margin)}  ${words(d.verdict, d.shotsNeeded)}`);
    }
    for (const [field, s] of Object.entries(h.spread.fields) as [ShotField, NonNullable<(typeof h.spread.fields)[ShotField]>][]) {
      if (field !== 'offline' && field !== 'carry') continue;
      extra.push(`  ${`${field} spread`.padEnd(16)} sd ${f(field, s.sdA)} vs ${f(field, s.sdB)} ${u[field]}, ratio ${s.ratio.toFixed(2)}, Brown–Forsythe p ${s.p.toFixed(3)}  ${words(s.verdict, s.shotsNeeded)}`);
    }
    extra.push(`  oval area ratio A/B ${h.ovalAreaRatio == null ? '—' : h.ovalAreaRatio.toFixed(2)}`, `  ${h.summary}`);
  }
  if (out.ladder.length) {
    extra.push('', 'Ladder (median carry, gap to the next club):');
    for (const r of out.ladder) {
      const gap = r.gapToNextM == null ? '' : `  gap ${fromCanonical(r.gapToNextM, u.carry, 'carry').toFixed(1)} ${u.carry}`;
      const flags = [r.gapFlag && `gap ${r.gapFlag}`, r.loftStepFlag && `loft step ${r.loftStepFlag}`].filter(Boolean).join(', ');
      extra.push(`  ${r.club.padEnd(4)} ${fromCanonical(r.carryMedianM, u.carry, 'carry').toFixed(1).padStart(6)} ${u.carry}${gap}${flags ? `  (${flags})` : ''}`);
    }
  }
  return [head, ...lines, ...extra].join('\n');
}

function main(argv: string[]): number {
  let args: Args | 'help';
  try {
    args = parseArgs(argv);
  } catch (err) {
    if (err instanceof UsageError) {
      process.stderr.write(`analyse: ${err.message}\n\n${HELP}\n`);
      return 2;
    }
    throw err;
  }
  if (args === 'help') {
    process.stdout.write(`${HELP}\n`);
    return 0;
  }
  let text: string;
  try {
    text = fs.readFileSync(args.file, 'utf8');
  } catch (err) {
    process.stderr.write(`analyse: cannot read ${args.file}: ${(err as NodeJS.ErrnoException).code ?? (err as Error).message}\n`);
    return 1;
  }
  try {
    if (!args.recipe) {
      const doubts = blockingDoubts(text);
      if (doubts.length) {
        for (const d of doubts) process.stderr.write(`analyse: column "${d.column}" is ambiguous: ${d.reason}\n`);
        process.stderr.write('analyse: give a recipe (--recipe FILE.json) that settles it.\n');
        return 2;
      }
      for (const a of suggestMapping(text).ambiguous.filter((x) => x.kind === 'sign')) process.stderr.write(`analyse: note: "${a.column}": ${a.reason}\n`);
    }
    const out = analyseText(text, { ...args, units: args.units });
    process.stdout.write(args.json ? `${JSON.stringify(out)}\n` : `${table(out, args.units)}\n`);
    return 0;
  } catch (err) {
    if (err instanceof ImportError) {
      process.stderr.write(`analyse: ${args.file}: ${err.message}\n`);
      return 1;
    }
    if (err instanceof RangeError) {
      process.stderr.write(`analyse: ${err.message.replace(/^analyseSession: /, '')}\n`);
      return 2;
    }
    throw err;
  }
}

if (require.main === module) process.exitCode = main(process.argv.slice(2));
