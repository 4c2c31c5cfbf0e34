import { z } from 'zod';
import { recipeSchema } from '../../analysis/import/recipe';
import { buildSpecSchema } from './build-spec';

/** How builds are given to the shots of a file. */
export const buildAssignmentSchema = z.discriminatedUnion('mode', [
  /** From the file's build column (shots without a value get `fallback`). */
  z.object({ mode: z.literal('column'), fallback: z.string().trim().max(80).nullish() }),
  /** One build for the whole file. */
  z.object({ mode: z.literal('file'), build: z.string().trim().min(1, 'Name the build.').max(80) }),
  /** A build per club code. */
  z.object({ mode: z.literal('club'), byClub: z.record(z.string().max(40), z.string().trim().min(1).max(80)) }),
]);
export type BuildAssignment = z.infer<typeof buildAssignmentSchema>;

/** The JSON `options` part of an upload (preview or commit). */
export const importOptionsSchema = z.object({
  recipe: recipeSchema.optional(),
  /** A saved recipe of the shop, applied on top of the automatic suggestion. */
  recipeId: z.uuid().optional(),
  builds: buildAssignmentSchema.default({ mode: 'column' }),
  /** Save the recipe used under this name (commit only). */
  saveRecipeAs: z.string().trim().min(1).max(120).optional(),
});
export type ImportOptions = z.input<typeof importOptionsSchema>;

export const rejectedRowSchema = z.object({ row: z.number(), column: z.string().optional(), reason: z.string() });
export const importWarningSchema = z.object({ code: z.string(), message: z.string(), column: z.string().optional() });

export const importReportSchema = z.object({
  rows: z.number(),
  imported: z.number(),
  rejected: z.array(rejectedRowSchema),
  skipped: z.array(z.object({ line: z.number(), reason: z.string() })),
  warnings: z.array(importWarningSchema),
  unknownClubs: z.array(z.string()),
  groups: z.array(z.object({ club: z.string(), build: z.string().nullable(), n: z.number() })),
});
export type ImportReport = z.infer<typeof importReportSchema>;

export const bayFileSchema = z.object({
  id: z.string(),
  fittingId: z.string(),
  fileName: z.string(),
  contentHash: z.string(),
  rowCount: z.number(),
  shotCount: z.number(),
  uploadedBy: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  recipe: recipeSchema,
  report: importReportSchema,
});
export type BayFile = z.infer<typeof bayFileSchema>;

export const savedRecipeBodySchema = z.object({ name: z.string().trim().min(1, 'Name the recipe.').max(120), recipe: recipeSchema });
/** PATCH /api/recipes/:id: a new name. */
export const recipeRenameBodySchema = z.object({ name: z.string().trim().min(1, 'Name the recipe.').max(120, 'At most 120 characters.') });
export const savedRecipeSchema = z.object({ id: z.string(), name: z.string(), recipe: recipeSchema, createdAt: z.string() });
export type SavedRecipe = z.infer<typeof savedRecipeSchema>;

export const remapBodySchema = z.object({
  recipe: recipeSchema,
  builds: buildAssignmentSchema.default({ mode: 'column' }),
});

export const shotDecisionBodySchema = z.object({ decision: z.enum(['keep', 'drop']).nullable() });

/** A change to a build's specs (PATCH /api/builds/:id): only the keys sent change; null clears one. */
export const buildSpecBodySchema = buildSpecSchema;
export const buildSchema = buildSpecBodySchema.extend({ id: z.string(), fittingId: z.string(), club: z.string(), label: z.string() });
export type Build = z.infer<typeof buildSchema>;
