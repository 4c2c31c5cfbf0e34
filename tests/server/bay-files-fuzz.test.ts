/**
 * Fuzzing preview and commit (fast-check, seeded): files built from the pieces real exports and
 * hostile ones are made of — delimiters, quotes, decimal commas, units, side letters, formulas,
 * long and wide cells, odd bytes — and option bodies with and without recipes. Whatever comes,
 * the API never answers 5xx, never takes longer than a generous bound, and never leaves shots
 * without their file. FUZZ_RUNS=2000 npm test -- tests/server/bay-files-fuzz runs more.
 */
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { buildFitting, buildShopWorld } from '@/fixtures/builders';
import { Session } from '@/server/models';
import { signSessionToken } from '@/server/services/tokens';
import { createTestContext, type TestContext } from '../support/test-db';

const RUNS = Number(process.env.FUZZ_RUNS ?? 200);
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);
/** Generous: a request over this is a stall, not a slow machine (a real file of this size takes milliseconds). */
const BOUND_MS = 15_000;

let ctx: TestContext;
let token: string;
let fittingId: string;
beforeAll(async () => {
  ctx = await createTestContext({ UPLOAD_MAX_BYTES: String(512 * 1024), UPLOAD_MAX_ROWS: '2000' });
  const world = await buildShopWorld();
  fittingId = (await buildFitting(world.shop, world.player, world.fitter, { remote: true })).id;
  const session = await Session.create({ userId: world.fitter.id, expiresAt: new Date(Date.now() + 3_600_000), endedAt: null });
  token = signSessionToken(ctx.config, { sub: world.fitter.id, ver: 0, sid: session.id });
});
afterAll(async () => {
  await ctx.close();
});

const HEADERS = ['Club', 'Shaft', 'Ball Speed (mph)', 'Club Speed [km/h]', 'Carry (yds)', 'Carry (m)', 'Side (L/R)', 'Offline (m, L-/R+)', 'Spin (rpm)', 'Launch (deg)', 'Smash', 'Total yds', 'Notes', '', 'Carry', 'Spin Axis', 'Apex (ft)'];
const CELLS = [
  '7 Iron', 'Driver', 'Dr', '56°', 'W56', 'Steel 105', 'stéel', '150', '150.2', '150,2', '-3.5', '+2', '12.3 L', 'R 4.5', '4.2 left', '-', '', 'n/a', '1.234,5', '6 512', '98 mph',
  '=HYPERLINK("x")', '@SUM(A1)', '"quoted, cell"', '"unterminated', '1e308', '-1e308', 'NaN', 'Infinity', '0x1F', '١٢٣', '\u2212 4', '\u00a0150\u00a0', 'Average', 'Total', '∞',
];
const hostile = fc.oneof(
  { arbitrary: fc.integer({ min: 500, max: 2800 }).map((n) => (n / 10).toFixed(1)), weight: 12 },
  fc.constantFrom(...CELLS),
  fc.string({ maxLength: 20 }),
  fc.integer({ min: 1, max: 3000 }).map((n) => ' '.repeat(n) + '!'),
  fc.integer({ min: 1, max: 2000 }).map((n) => '1,'.repeat(n)),
  fc.integer({ min: 1, max: 2000 }).map((n) => `(${'a'.repeat(n)}`),
  fc.double({ noNaN: false }).map(String),
);

/** A bay file: maybe a preamble, a header, maybe a units row, rows of cells, maybe odd endings. */
const bayFile = fc
  .record({
    delimiter: fc.constantFrom(',', ';', '\t'),
    newline: fc.constantFrom('\n', '\r\n', '\r'),
    preamble: fc.oneof({ arbitrary: fc.constant([]), weight: 3 }, fc.array(fc.string({ maxLength: 30 }), { maxLength: 3 })),
    header: fc.array(fc.constantFrom(...HEADERS), { minLength: 1, maxLength: 8 }).map((h) => ['Club', 'Carry (yds)', ...h]),
    units: fc.boolean(),
    rows: fc.array(fc.array(hostile, { maxLength: 10 }), { maxLength: 30 }),
    ragged: fc.boolean(),
    tail: fc.constantFrom('', '\n', '', '\n', '\n\n', '\u0000', '\ufeff', 'Average,150,,'),
    bom: fc.boolean(),
  })
  .map((f) => {
    const lines = [...f.preamble, f.header.join(f.delimiter)];
    if (f.units) lines.push(f.header.map(() => 'mph').join(f.delimiter));
    // most rows as wide as the header, with the club first; some ragged
    for (const r of f.rows) lines.push((f.ragged ? r : ['7 Iron', ...r].slice(0, f.header.length).concat(Array(Math.max(0, f.header.length - r.length - 1)).fill('150'))).join(f.delimiter));
    return (f.bom ? '\ufeff' : '') + lines.join(f.newline) + f.tail;
  });

const recipe = fc.option(
  fc.record({
    delimiter: fc.option(fc.constantFrom(',', ';', '\t', '|'), { nil: undefined }),
    decimal: fc.option(fc.constantFrom('.', ','), { nil: undefined }),
    headerRow: fc.option(fc.integer({ min: -1, max: 5 }), { nil: undefined }),
    columns: fc.dictionary(fc.constantFrom(...HEADERS, 'Nope'), fc.record({ field: fc.constantFrom('carry', 'offline', 'club', 'build', 'ignore', 'spinRate', 'bogus'), unit: fc.option(fc.constantFrom('yd', 'm', 'mph', 'furlong', 'rpm'), { nil: undefined }), side: fc.option(fc.constantFrom('suffix-LR', 'prefix-LR', 'signed-right-positive', 'nope'), { nil: undefined }) }), { maxKeys: 4 }),
  }),
  { nil: undefined },
);
const options = fc.oneof(
  { arbitrary: fc.constant('{}'), weight: 4 },
  fc.record({ recipe, builds: fc.option(fc.oneof(fc.constant({ mode: 'column' }), fc.record({ mode: fc.constant('file'), build: fc.string({ maxLength: 100 }) }), fc.constant({ mode: 'weird' })), { nil: undefined }) }).map((o) => JSON.stringify(o)),
  fc.constantFrom('', '{', 'null', '[]', '{"recipeId":"not-a-uuid"}', '{"saveRecipeAs":""}'),
);

async function send(path: string, text: string, opts: string) {
  const started = Date.now();
  const res = await request(ctx.app).post(path).set('Authorization', `Bearer ${token}`).field('options', opts).attach('file', Buffer.from(text, 'utf8'), 'fuzz.csv');
  return { status: res.status, ms: Date.now() - started, body: res.body as { shotCount?: number; error?: { code: string } } };
}

describe(`fuzzed preview and commit (${RUNS} cases, seed ${SEED})`, () => {
  it('never answer 5xx, never take longer than the bound, never leave shots without their file', async () => {
    const failures: string[] = [];
    const seen = new Map<number, number>();
    let cases = 0;
    await fc.assert(
      fc.asyncProperty(bayFile, options, async (text, opts) => {
        cases++;
        const preview = await send(`/api/fittings/${fittingId}/bay-files/preview`, text, opts);
        const commit = await send(`/api/fittings/${fittingId}/bay-files`, text, opts);
        for (const r of [preview, commit]) seen.set(r.status, (seen.get(r.status) ?? 0) + 1);
        for (const [what, r] of [['preview', preview], ['commit', commit]] as const) {
          if (r.status >= 500 || r.ms > BOUND_MS) failures.push(`${what} ${r.status} in ${r.ms} ms: ${JSON.stringify(text.slice(0, 200))} ${opts}`);
        }
        return preview.status < 500 && commit.status < 500 && preview.ms <= BOUND_MS && commit.ms <= BOUND_MS;
      }),
      { numRuns: RUNS, seed: SEED, endOnFailure: true },
    );
    expect(failures).toEqual([]);
    expect(cases).toBe(RUNS);
    if (process.env.FUZZ_LOG) console.log(`fuzz statuses: ${JSON.stringify(Object.fromEntries(seen))}`);
    // the generator reaches the storing path, not only the refusals
    expect(seen.get(201) ?? 0).toBeGreaterThan(RUNS / 20);
    const [orphans] = await ctx.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM shots s LEFT JOIN bay_files b ON b.id = s.bay_file_id WHERE b.id IS NULL', { type: QueryTypes.SELECT });
    expect(Number(orphans.n)).toBe(0);
    const files = await ctx.sequelize.query<{ id: string; shot_count: number; n: number }>(
      'SELECT b.id, b.shot_count, (SELECT COUNT(*) FROM shots s WHERE s.bay_file_id = b.id) AS n FROM bay_files b WHERE b.fitting_id = ?',
      { replacements: [fittingId], type: QueryTypes.SELECT },
    );
    expect(files.filter((f) => Number(f.n) !== Number(f.shot_count))).toEqual([]);
  }, 600_000);
});
