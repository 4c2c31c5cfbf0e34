/**
 * Bay files: preview (mapping suggestion and converted rows, nothing stored), commit (raw text,
 * recipe, report and shots in one transaction), re-map, delete; saved recipes; builds.
 */
import { createHash } from 'node:crypto';
import type { Sequelize, Transaction } from 'sequelize';
import type { Shot, ShotValues } from '../../analysis/fields';
import { fillFlightFields, type Conditions } from '../../analysis/flight';
import { ImportError, importBayFile, recipeSchema, type ImportResult, type Recipe } from '../../analysis/import';
import { HttpError, notFound } from '../errors';
import { BayFile, Build, Fitting, Recipe as RecipeModel } from '../models';
import { specOf } from '../models/spec-attributes';
import type { BayFile as BayFileDto, BuildAssignment, ImportReport, SavedRecipe, buildSpecBodySchema, importOptionsSchema } from '../schemas';
import type { z } from 'zod';
import { type Actor, isStaff, requireOwner, requireStaff } from './actor';
import { findVisibleFitting } from './fittings';
import { bumpFittingRevision } from './fitting-revision';
import { decisionsOf, insertShots } from './shot-store';

export type ParsedImportOptions = z.output<typeof importOptionsSchema>;

export interface UploadedFile {
  name: string;
  buffer: Buffer;
}

export interface BayFileLimits {
  maxRows: number;
}

/** A fitting the actor may add bay files to: staff of its shop, or its player when it is remote. */
export async function findWritableFitting(actor: Actor, fittingId: string): Promise<Fitting> {
  const fitting = await findVisibleFitting(actor, fittingId);
  if (!isStaff(actor) && !(fitting.remote && fitting.playerId === actor.playerId)) {
    throw new HttpError(403, 'FORBIDDEN', 'Only a remote fitting takes files from its player. Ask your fitter to make it remote.');
  }
  return fitting;
}

/**
 * Decodes an upload as text: UTF-16 with a byte-order mark, UTF-8 (BOM dropped), or
 * Windows-1252 when it is not valid UTF-8. Any other file with NUL bytes is not text.
 */
export function decodeUpload(buffer: Buffer): string {
  // Some spreadsheet programs save "Unicode text" as UTF-16 with a byte-order mark.
  if (buffer.length >= 2 && buffer[0] === 0xff && buffer[1] === 0xfe) return new TextDecoder('utf-16le').decode(buffer.subarray(2));
  if (buffer.length >= 2 && buffer[0] === 0xfe && buffer[1] === 0xff) return new TextDecoder('utf-16be').decode(buffer.subarray(2));
  if (buffer.includes(0)) throw new HttpError(400, 'NOT_TEXT', 'This file is not a text (CSV) file. Export the session as CSV and try again.');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    text = new TextDecoder('windows-1252').decode(buffer);
  }
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

function countLines(text: string): number {
  let n = 1;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n += 1;
  return n;
}

/**
 * A saved recipe with the fitter's edits on top. A field an edited column takes is given up by
 * the saved column that held it (one column per field), as the mapping step shows it.
 */
export function overlayRecipe(base: Recipe, edits: Recipe): Recipe {
  const taken = new Set<string>(Object.values(edits.columns).map((c) => c.field).filter((f) => f !== 'build' && f !== 'ignore'));
  const columns: Recipe['columns'] = {};
  for (const [header, column] of Object.entries(base.columns)) {
    columns[header] = !(header in edits.columns) && taken.has(column.field) ? { field: 'ignore' } : column;
  }
  return { ...base, ...edits, columns: { ...columns, ...edits.columns } };
}

async function recipeOf(actor: Actor, options: ParsedImportOptions): Promise<Recipe | undefined> {
  if (!options.recipeId) return options.recipe;
  const saved = await RecipeModel.findOne({ where: { id: options.recipeId, shopId: actor.shopId } });
  if (!saved) throw notFound('That recipe');
  const base = recipeSchema.parse(JSON.parse(saved.recipe));
  if (!options.recipe) return base;
  return overlayRecipe(base, options.recipe);
}

function buildOptions(builds: BuildAssignment): { defaultBuild: string | null; buildByClub?: Record<string, string>; forceBuild?: string } {
  if (builds.mode === 'file') return { defaultBuild: null, forceBuild: builds.build };
  if (builds.mode === 'club') return { defaultBuild: null, buildByClub: builds.byClub };
  return { defaultBuild: builds.fallback ?? null };
}

/** The air and ground of a fitting, for the ball-flight model (unset values: the standard atmosphere, normal ground). */
export function airOf(fitting: Pick<Fitting, 'temperatureC' | 'altitudeM' | 'humidityPct' | 'groundFirmness'>): Conditions {
  return {
    ...(fitting.groundFirmness != null ? { firmness: fitting.groundFirmness } : {}),
    ...(fitting.temperatureC != null ? { temperatureC: fitting.temperatureC } : {}),
    ...(fitting.altitudeM != null ? { altitudeM: fitting.altitudeM } : {}),
    ...(fitting.humidityPct != null ? { humidityPct: fitting.humidityPct } : {}),
  };
}

/**
 * Runs the import library, mapping its errors to 400s a fitter can read. Shots with launch
 * conditions but no carry, total, offline, apex, descent or flight time get them from the
 * ball-flight model in the fitting's air and on its ground, marked as derived.
 */
export function runImport(text: string, recipe: Recipe | undefined, builds: BuildAssignment, limits: BayFileLimits, air: Conditions = {}): ImportResult {
  if (countLines(text) > limits.maxRows + 50) {
    throw new HttpError(400, 'TOO_MANY_ROWS', `This file has more than ${limits.maxRows.toLocaleString('en')} rows, the most one import takes. Split it and import the parts.`);
  }
  const b = buildOptions(builds);
  try {
    const fillFlight = (values: ShotValues) => fillFlightFields(values, air);
    const result = importBayFile(text, { recipe, defaultBuild: b.defaultBuild, buildByClub: b.buildByClub, fillFlight });
    if (b.forceBuild) for (const s of result.shots) s.build = b.forceBuild;
    if (result.rows > limits.maxRows) {
      throw new HttpError(400, 'TOO_MANY_ROWS', `This file has ${result.rows.toLocaleString('en')} rows; one import takes at most ${limits.maxRows.toLocaleString('en')}.`);
    }
    return result;
  } catch (err) {
    if (err instanceof ImportError) throw new HttpError(400, err.code, err.message);
    throw err;
  }
}

function groupsOf(shots: readonly Shot[]): ImportReport['groups'] {
  const counts = new Map<string, { club: string; build: string | null; n: number }>();
  for (const s of shots) {
    const key = `${s.club}\u0000${s.build ?? ''}`;
    const g = counts.get(key) ?? { club: s.club, build: s.build, n: 0 };
    g.n += 1;
    counts.set(key, g);
  }
  return [...counts.values()];
}

function reportOf(result: ImportResult): ImportReport {
  return {
    rows: result.rows,
    imported: result.shots.length,
    rejected: result.rejected.slice(0, 1000),
    skipped: result.skipped.slice(0, 1000),
    warnings: result.warnings,
    unknownClubs: result.unknownClubs,
    groups: groupsOf(result.shots),
  };
}

export const contentHash = (text: string) => createHash('sha256').update(text).digest('hex');

/** What an import would do: the mapping, warnings, the first converted rows, the rejected rows. Stores nothing. */
export async function previewBayFile(actor: Actor, fittingId: string, file: UploadedFile, options: ParsedImportOptions, limits: BayFileLimits) {
  const fitting = await findWritableFitting(actor, fittingId);
  const text = decodeUpload(file.buffer);
  const result = runImport(text, await recipeOf(actor, options), options.builds, limits, airOf(fitting));
  const hash = contentHash(text);
  const duplicate = await BayFile.findOne({ where: { fittingId, contentHash: hash }, attributes: ['id', 'fileName'] });
  return {
    fileName: file.name,
    contentHash: hash,
    duplicateOf: duplicate ? { id: duplicate.id, fileName: duplicate.fileName } : null,
    sniff: result.sniff,
    recipe: result.recipe,
    suggestions: result.suggestions,
    /** Guesses the fitter should confirm (a sign convention assumed, a unit inferred…). */
    ambiguous: result.ambiguous,
    report: reportOf(result),
    shots: result.shots.slice(0, 25),
  };
}

function toDto(b: BayFile): BayFileDto {
  return {
    id: b.id,
    fittingId: b.fittingId,
    fileName: b.fileName,
    contentHash: b.contentHash,
    rowCount: b.rowCount,
    shotCount: b.shotCount,
    uploadedBy: b.uploadedBy,
    createdAt: b.createdAt.toISOString(),
    updatedAt: b.updatedAt.toISOString(),
    recipe: JSON.parse(b.recipe) as Recipe,
    report: JSON.parse(b.report) as ImportReport,
  };
}

/**
 * Creates a build record for every (club, label) the shots name that the fitting lacks; shots
 * with no build name get one with the empty label, so every group can carry its specs (loft…).
 */
async function ensureBuilds(fittingId: string, shots: readonly Shot[], transaction: Transaction): Promise<void> {
  const wanted = new Map<string, { club: string; label: string }>();
  for (const s of shots) {
    const label = (s.build ?? '').slice(0, 80);
    wanted.set(`${s.club}\u0000${label}`, { club: s.club.slice(0, 40), label });
  }
  if (wanted.size === 0) return;
  const existing = await Build.findAll({ where: { fittingId }, attributes: ['club', 'label'], transaction });
  for (const e of existing) wanted.delete(`${e.club}\u0000${e.label}`);
  if (wanted.size) await Build.bulkCreate([...wanted.values()].map((w) => ({ fittingId, ...w })), { transaction });
}

export interface CommitHooks {
  /** Called after each stored chunk of shots; tests inject a failure here. */
  afterChunk?: (chunkIndex: number) => void | Promise<void>;
}

/** Stores a bay file, its recipe, its report and its shots: all or nothing. */
export async function commitBayFile(
  sequelize: Sequelize,
  actor: Actor,
  fittingId: string,
  file: UploadedFile,
  options: ParsedImportOptions,
  limits: BayFileLimits,
  hooks: CommitHooks = {},
): Promise<BayFileDto> {
  const fitting = await findWritableFitting(actor, fittingId);
  const text = decodeUpload(file.buffer);
  const result = runImport(text, await recipeOf(actor, options), options.builds, limits, airOf(fitting));
  if (result.shots.length === 0) {
    throw new HttpError(400, 'NO_SHOTS', 'No row of this file could be imported; nothing was stored. See the rejected rows in the preview.');
  }
  const hash = contentHash(text);
  if (await BayFile.findOne({ where: { fittingId, contentHash: hash }, attributes: ['id'] })) {
    throw new HttpError(409, 'DUPLICATE_FILE', 'This exact file is already imported into this fitting.');
  }
  const bayFile = await sequelize.transaction(async (transaction) => {
    const created = await BayFile.create(
      {
        fittingId,
        uploadedBy: actor.id,
        fileName: file.name.slice(0, 255) || 'bay-file.csv',
        contentHash: hash,
        rawText: text,
        recipe: JSON.stringify(result.recipe),
        report: JSON.stringify(reportOf(result)),
        rowCount: result.rows,
        shotCount: result.shots.length,
      },
      { transaction },
    );
    await insertShots(transaction, created.id, fittingId, result.shots, new Map(), hooks.afterChunk);
    await ensureBuilds(fittingId, result.shots, transaction);
    await bumpFittingRevision(fittingId, transaction);
    if (options.saveRecipeAs && isStaff(actor)) {
      await RecipeModel.upsert({ shopId: actor.shopId, name: options.saveRecipeAs, recipe: JSON.stringify(result.recipe), createdBy: actor.id }, { transaction });
    }
    return created;
  });
  return toDto(bayFile);
}

async function findVisibleBayFile(actor: Actor, id: string): Promise<BayFile> {
  const bayFile = await BayFile.findByPk(id);
  if (!bayFile) throw notFound('That bay file');
  await findVisibleFitting(actor, bayFile.fittingId).catch(() => {
    throw notFound('That bay file');
  });
  return bayFile;
}

export async function listBayFiles(actor: Actor, fittingId: string): Promise<BayFileDto[]> {
  await findVisibleFitting(actor, fittingId);
  const files = await BayFile.findAll({ where: { fittingId }, order: [['createdAt', 'ASC']], attributes: { exclude: ['rawText'] } });
  return files.map(toDto);
}

export async function getBayFile(actor: Actor, id: string): Promise<BayFileDto> {
  return toDto(await findVisibleBayFile(actor, id));
}

/** The raw text as uploaded. */
export async function getBayFileText(actor: Actor, id: string): Promise<{ fileName: string; text: string }> {
  const b = await findVisibleBayFile(actor, id);
  return { fileName: b.fileName, text: b.rawText };
}

/** Applies a new recipe to a stored file: its shots are replaced in one transaction; decisions by row stay. */
export async function remapBayFile(sequelize: Sequelize, actor: Actor, id: string, recipe: Recipe, builds: BuildAssignment, limits: BayFileLimits): Promise<BayFileDto> {
  const bayFile = await findVisibleBayFile(actor, id);
  const fitting = await findWritableFitting(actor, bayFile.fittingId);
  const result = runImport(bayFile.rawText, recipe, builds, limits, airOf(fitting));
  if (result.shots.length === 0) throw new HttpError(400, 'NO_SHOTS', 'With this recipe no row could be imported; the file was left as it was.');
  await sequelize.transaction(async (transaction) => {
    const decisions = await decisionsOf(sequelize, bayFile.id, transaction);
    await sequelize.query('DELETE FROM shots WHERE bay_file_id = ?', { replacements: [bayFile.id], transaction });
    await insertShots(transaction, bayFile.id, bayFile.fittingId, result.shots, decisions);
    await ensureBuilds(bayFile.fittingId, result.shots, transaction);
    await bumpFittingRevision(bayFile.fittingId, transaction);
    await bayFile.update(
      { recipe: JSON.stringify(result.recipe), report: JSON.stringify(reportOf(result)), rowCount: result.rows, shotCount: result.shots.length },
      { transaction },
    );
  });
  return getBayFile(actor, id);
}

export async function deleteBayFile(actor: Actor, id: string): Promise<void> {
  requireStaff(actor);
  const bayFile = await findVisibleBayFile(actor, id);
  await BayFile.sequelize!.transaction(async (transaction) => {
    await bayFile.destroy({ transaction }); // shots go with it (ON DELETE CASCADE)
    await bumpFittingRevision(bayFile.fittingId, transaction);
  });
}

// ---- saved recipes of a shop -------------------------------------------------------------

const toSaved = (r: RecipeModel): SavedRecipe => ({ id: r.id, name: r.name, recipe: JSON.parse(r.recipe) as Recipe, createdAt: r.createdAt.toISOString() });

export async function listRecipes(actor: Actor): Promise<SavedRecipe[]> {
  requireStaff(actor);
  return (await RecipeModel.findAll({ where: { shopId: actor.shopId }, order: [['name', 'ASC']] })).map(toSaved);
}

export async function saveRecipe(actor: Actor, name: string, recipe: Recipe): Promise<SavedRecipe> {
  requireStaff(actor);
  if (await RecipeModel.findOne({ where: { shopId: actor.shopId, name } })) {
    throw new HttpError(409, 'RECIPE_NAME_TAKEN', 'Your shop already has a recipe with that name.');
  }
  return toSaved(await RecipeModel.create({ shopId: actor.shopId, name, recipe: JSON.stringify(recipe), createdBy: actor.id }));
}

/** One saved recipe of the actor's shop (staff), or 404. */
export async function getRecipe(actor: Actor, id: string): Promise<SavedRecipe> {
  requireStaff(actor);
  const recipe = await RecipeModel.findOne({ where: { id, shopId: actor.shopId } });
  if (!recipe) throw notFound('That recipe');
  return toSaved(recipe);
}

/** Renames a saved recipe (the owner manages the shop's recipes); a name the shop uses already answers 409. */
export async function renameRecipe(actor: Actor, id: string, name: string): Promise<SavedRecipe> {
  requireOwner(actor);
  const recipe = await RecipeModel.findOne({ where: { id, shopId: actor.shopId } });
  if (!recipe) throw notFound('That recipe');
  if (recipe.name === name) return toSaved(recipe);
  if (await RecipeModel.findOne({ where: { shopId: actor.shopId, name } })) {
    throw new HttpError(409, 'RECIPE_NAME_TAKEN', 'Your shop already has a recipe with that name.');
  }
  recipe.name = name;
  await recipe.save();
  return toSaved(recipe);
}

export async function deleteRecipe(actor: Actor, id: string): Promise<void> {
  requireStaff(actor);
  const n = await RecipeModel.destroy({ where: { id, shopId: actor.shopId } });
  if (!n) throw notFound('That recipe');
}

// ---- builds --------------------------------------------------------------------------------

const toBuild = (b: Build) => ({ id: b.id, fittingId: b.fittingId, club: b.club, label: b.label, ...specOf(b) });

export async function listBuilds(actor: Actor, fittingId: string) {
  await findVisibleFitting(actor, fittingId);
  return (await Build.findAll({ where: { fittingId }, order: [['club', 'ASC'], ['label', 'ASC']] })).map(toBuild);
}

/** A build of a fitting the actor may see, or 404 (another shop's or player's answers the same). */
async function findVisibleBuild(actor: Actor, id: string): Promise<Build> {
  const build = await Build.findByPk(id);
  if (!build) throw notFound('That build');
  await findVisibleFitting(actor, build.fittingId).catch(() => {
    throw notFound('That build');
  });
  return build;
}

/** One build by its id (its edit page opened by address needs no fitting id). */
export async function getBuild(actor: Actor, id: string) {
  return toBuild(await findVisibleBuild(actor, id));
}

export async function updateBuild(actor: Actor, id: string, body: z.output<typeof buildSpecBodySchema>) {
  requireStaff(actor);
  const build = await findVisibleBuild(actor, id);
  for (const [key, value] of Object.entries(body)) if (value !== undefined) build.set(key as keyof typeof body, value as never);
  await Build.sequelize!.transaction(async (transaction) => {
    await build.save({ transaction });
    await bumpFittingRevision(build.fittingId, transaction);
  });
  return toBuild(build);
}
