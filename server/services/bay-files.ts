/**
 * Bay files: preview (mapping suggestion and converted rows, nothing stored), commit (raw text,
 * recipe, report and shots in one transaction), re-map, delete; saved recipes; builds. Parsing,
 * mapping and validating run in the import worker pool (import-pool.ts), off the event loop.
 */
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { Conditions } from '../../analysis/flight';
import { recipeSchema, type Recipe } from '../../analysis/import';
import { HttpError, notFound } from '../errors';
import type { Hand } from '../../analysis/plain-words/handed-words';
import { BayFile, Build, Fitting, Recipe as RecipeModel } from '../models';
import { specOf } from '../models/spec-attributes';
import type { BayFile as BayFileDto, ImportReport, SavedRecipe, buildSpecBodySchema, importOptionsSchema } from '../schemas';
import type { z } from 'zod';
import { type Actor, isStaff, requireOwner, requireStaff } from './actor';
import type { BayFileLimits, ImportTaskResult } from './bay-file-import';
import { findVisibleFitting } from './fittings';
import { bumpFittingRevision } from './fitting-revision';
import type { ImportPool } from './import-pool';
import { renameNotFound } from './not-found';
import { withDeadlockRetry } from './retry';
import { decisionsOf, insertShots } from './shot-store';

export type { BayFileLimits } from './bay-file-import';
export type ParsedImportOptions = z.output<typeof importOptionsSchema>;

export interface UploadedFile {
  name: string;
  buffer: Buffer;
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

/** The air and ground of a fitting, for the ball-flight model (unset values: the standard atmosphere, normal ground). */
export function airOf(fitting: Pick<Fitting, 'temperatureC' | 'altitudeM' | 'humidityPct' | 'groundFirmness'>): Conditions {
  return {
    ...(fitting.groundFirmness != null ? { firmness: fitting.groundFirmness } : {}),
    ...(fitting.temperatureC != null ? { temperatureC: fitting.temperatureC } : {}),
    ...(fitting.altitudeM != null ? { altitudeM: fitting.altitudeM } : {}),
    ...(fitting.humidityPct != null ? { humidityPct: fitting.humidityPct } : {}),
  };
}

const recipeNameTaken = () => new HttpError(409, 'RECIPE_NAME_TAKEN', 'Your shop already has a recipe with that name.');
/** The hand of the fitting's player, loaded with the fitting (columns a file writes for the player's hand turn round for a left-hander). */
const handOf = (fitting: Fitting): Hand => fitting.player?.handedness ?? 'right';

const duplicateFile = () => new HttpError(409, 'DUPLICATE_FILE', 'This exact file is already imported into this fitting.');

/** What an import would do: the mapping, warnings, the first converted rows, the rejected rows. Stores nothing. */
export async function previewBayFile(pool: ImportPool, actor: Actor, fittingId: string, file: UploadedFile, options: ParsedImportOptions, limits: BayFileLimits) {
  const fitting = await findWritableFitting(actor, fittingId);
  const hand = handOf(fitting);
  const result = await pool.run({ bytes: file.buffer, recipe: await recipeOf(actor, options), builds: options.builds, limits, air: airOf(fitting), hand, store: false });
  const duplicate = await BayFile.findOne({ where: { fittingId, contentHash: result.contentHash }, attributes: ['id', 'fileName'] });
  // the rule commit applies: a taken recipe name is refused, so the preview says so first
  const nameTaken = options.saveRecipeAs && isStaff(actor) ? !!(await RecipeModel.findOne({ where: { shopId: actor.shopId, name: options.saveRecipeAs }, attributes: ['id'] })) : false;
  return {
    fileName: file.name,
    contentHash: result.contentHash,
    duplicateOf: duplicate ? { id: duplicate.id, fileName: duplicate.fileName } : null,
    recipeNameTaken: nameTaken,
    sniff: result.sniff,
    recipe: result.recipe,
    suggestions: result.suggestions,
    /** Guesses the fitter should confirm (a sign convention assumed, a unit inferred…). */
    ambiguous: result.ambiguous,
    report: result.report,
    shots: result.firstShots,
    /** The player's hand: a left-hander's signed columns may be written for it (recipe `handed`). */
    hand,
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
 * Names compare exactly, in this map and in the database (migration 0006); a build another
 * import is creating at the same moment is left to it (INSERT IGNORE).
 */
async function ensureBuilds(fittingId: string, groups: ImportReport['groups'], transaction: Transaction): Promise<void> {
  const wanted = new Map<string, { club: string; label: string }>();
  for (const g of groups) {
    const label = g.build ?? '';
    wanted.set(`${g.club}\u0000${label}`, { club: g.club, label });
  }
  if (wanted.size === 0) return;
  const existing = await Build.findAll({ where: { fittingId }, attributes: ['club', 'label'], transaction });
  for (const e of existing) wanted.delete(`${e.club}\u0000${e.label}`);
  const rows = [...wanted.values()].sort((a, b) => (a.club + a.label < b.club + b.label ? -1 : 1)); // one lock order for every import
  if (rows.length) await Build.bulkCreate(rows.map((w) => ({ fittingId, ...w })), { transaction, ignoreDuplicates: true });
}

export interface CommitHooks {
  /** Called after each stored chunk of shots; tests inject a failure here. */
  afterChunk?: (chunkIndex: number) => void | Promise<void>;
}

/**
 * Stores a bay file, its recipe, its report and its shots: all or nothing. A deadlock with
 * another import into the same fitting is retried; the same file sent twice at once stores
 * once (the other answers 409 DUPLICATE_FILE); a taken recipe name answers 409
 * RECIPE_NAME_TAKEN, as saving a recipe does, and stores nothing.
 */
export async function commitBayFile(
  sequelize: Sequelize,
  pool: ImportPool,
  actor: Actor,
  fittingId: string,
  file: UploadedFile,
  options: ParsedImportOptions,
  limits: BayFileLimits,
  hooks: CommitHooks = {},
): Promise<BayFileDto> {
  const fitting = await findWritableFitting(actor, fittingId);
  const result: ImportTaskResult = await pool.run({ bytes: file.buffer, recipe: await recipeOf(actor, options), builds: options.builds, limits, air: airOf(fitting), hand: handOf(fitting), store: true });
  const table = result.table!;
  if (table.count === 0) {
    throw new HttpError(400, 'NO_SHOTS', 'No row of this file could be imported; nothing was stored. See the rejected rows in the preview.');
  }
  if (await BayFile.findOne({ where: { fittingId, contentHash: result.contentHash }, attributes: ['id'] })) throw duplicateFile();
  const saveAs = options.saveRecipeAs && isStaff(actor) ? options.saveRecipeAs : null;
  if (saveAs && (await RecipeModel.findOne({ where: { shopId: actor.shopId, name: saveAs }, attributes: ['id'] }))) throw recipeNameTaken();
  const bayFile = await withDeadlockRetry(() =>
    sequelize.transaction(async (transaction) => {
      // The fitting's row first, locked for the whole transaction: a second import into the same
      // fitting waits here instead of deadlocking later (both would hold the row's shared lock from
      // the foreign-key checks and ask to upgrade it).
      await bumpFittingRevision(fittingId, transaction);
      let created: BayFile;
      try {
        created = await BayFile.create(
          {
            fittingId,
            uploadedBy: actor.id,
            fileName: file.name.slice(0, 255) || 'bay-file.csv',
            contentHash: result.contentHash,
            rawText: result.text,
            recipe: JSON.stringify(result.recipe),
            report: JSON.stringify(result.report),
            rowCount: result.report.rows,
            shotCount: table.count,
          },
          { transaction },
        );
      } catch (err) {
        if (err instanceof UniqueConstraintError) throw duplicateFile(); // the same file, committed a moment ago
        throw err;
      }
      await ensureBuilds(fittingId, result.report.groups, transaction);
      await insertShots(transaction, created.id, fittingId, table, new Map(), hooks.afterChunk);
      if (saveAs) {
        try {
          await RecipeModel.create({ shopId: actor.shopId, name: saveAs, recipe: JSON.stringify(result.recipe), createdBy: actor.id }, { transaction });
        } catch (err) {
          if (err instanceof UniqueConstraintError) throw recipeNameTaken();
          throw err;
        }
      }
      return created;
    }),
  );
  return toDto(bayFile);
}

async function findVisibleBayFile(actor: Actor, id: string): Promise<BayFile> {
  const bayFile = await BayFile.findByPk(id);
  if (!bayFile) throw notFound('That bay file');
  await renameNotFound(findVisibleFitting(actor, bayFile.fittingId), 'That bay file');
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

/**
 * The file as uploaded, for download: its rows and cells as they were, except that a cell a
 * spreadsheet would run as a formula is neutralised (OWASP, "CSV Injection").
 */
export async function getBayFileText(pool: ImportPool, actor: Actor, id: string): Promise<{ fileName: string; text: string }> {
  const b = await findVisibleBayFile(actor, id);
  const delimiter = (JSON.parse(b.recipe) as Recipe).delimiter ?? ',';
  return { fileName: b.fileName, text: await pool.neutralise(b.rawText, delimiter) };
}

/**
 * Applies a new recipe to a stored file: its shots are replaced in one transaction; decisions by
 * row stay. Staff may re-map any file of their shop; a player only a file they uploaded.
 */
export async function remapBayFile(sequelize: Sequelize, pool: ImportPool, actor: Actor, id: string, recipe: Recipe, builds: ParsedImportOptions['builds'], limits: BayFileLimits): Promise<BayFileDto> {
  const bayFile = await findVisibleBayFile(actor, id);
  const fitting = await findWritableFitting(actor, bayFile.fittingId);
  if (!isStaff(actor) && bayFile.uploadedBy !== actor.id) {
    throw new HttpError(403, 'FORBIDDEN', 'Only the fitter, or whoever uploaded this file, may change its mapping.');
  }
  const result = await pool.run({ text: bayFile.rawText, recipe, builds, limits, air: airOf(fitting), hand: handOf(fitting), store: true });
  const table = result.table!;
  if (table.count === 0) throw new HttpError(400, 'NO_SHOTS', 'With this recipe no row could be imported; the file was left as it was.');
  await withDeadlockRetry(() =>
    sequelize.transaction(async (transaction) => {
      await bumpFittingRevision(bayFile.fittingId, transaction); // the fitting's row first (see commitBayFile)
      const decisions = await decisionsOf(sequelize, bayFile.id, transaction);
      await sequelize.query('DELETE FROM shots WHERE bay_file_id = ?', { replacements: [bayFile.id], transaction });
      await ensureBuilds(bayFile.fittingId, result.report.groups, transaction);
      await insertShots(transaction, bayFile.id, bayFile.fittingId, table, decisions);
      await bayFile.update(
        { recipe: JSON.stringify(result.recipe), report: JSON.stringify(result.report), rowCount: result.report.rows, shotCount: table.count },
        { transaction },
      );
    }),
  );
  return getBayFile(actor, id);
}

export async function deleteBayFile(actor: Actor, id: string): Promise<void> {
  requireStaff(actor);
  const bayFile = await findVisibleBayFile(actor, id);
  await BayFile.sequelize!.transaction(async (transaction) => {
    await bumpFittingRevision(bayFile.fittingId, transaction); // the fitting's row first (see commitBayFile)
    await bayFile.destroy({ transaction }); // shots go with it (ON DELETE CASCADE)
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
  if (await RecipeModel.findOne({ where: { shopId: actor.shopId, name } })) throw recipeNameTaken();
  try {
    return toSaved(await RecipeModel.create({ shopId: actor.shopId, name, recipe: JSON.stringify(recipe), createdBy: actor.id }));
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw recipeNameTaken(); // saved by someone else a moment ago
    throw err;
  }
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
  if (await RecipeModel.findOne({ where: { shopId: actor.shopId, name } })) throw recipeNameTaken();
  recipe.name = name;
  try {
    await recipe.save();
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw recipeNameTaken(); // taken by someone else a moment ago
    throw err;
  }
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
  await renameNotFound(findVisibleFitting(actor, build.fittingId), 'That build');
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
    await bumpFittingRevision(build.fittingId, transaction); // the fitting's row first (see commitBayFile)
    await build.save({ transaction });
  });
  return toBuild(build);
}
