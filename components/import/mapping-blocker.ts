/**
 * Why the import (or the re-map of a stored file) cannot be sent now, in the order a fitter
 * would fix things; null when it can. Shared by the import's and the re-map's button.
 */
export type MappingReadiness = {
  /** A preview is on screen. */
  hasPreview: boolean;
  /** What to say while there is none (no file chosen, or the stored file still loading). */
  noPreview: string;
  /** The preview found the same file in the fitting (an import only; a re-map is that file). */
  duplicate: boolean;
  buildsComplete: boolean;
  /** Left/right columns whose sign the fitter has not answered yet. */
  openQuestions?: number;
  /** The last preview request failed (the last good preview may still be on screen). */
  previewFailed: boolean;
  /** The preview on screen is for older choices than those on screen. */
  previewBehind: boolean;
  /** Shots the preview on screen converts. */
  shotCount: number;
};

/**
 * The first reason in this order: no preview, a duplicate file, a build without a name, an open
 * question about left and right, a failed preview, a preview still updating, no shot converted.
 * @example mappingBlocker({ hasPreview: true, noPreview: '', duplicate: false, buildsComplete: true, previewFailed: false, previewBehind: false, shotCount: 12 }) // => null
 */
export function mappingBlocker(s: MappingReadiness): string | null {
  if (!s.hasPreview) return s.noPreview;
  if (s.duplicate) return 'This file is already in the fitting.';
  if (!s.buildsComplete) return 'Name the build first.';
  if (s.openQuestions) return s.openQuestions === 1 ? 'Answer the question about left and right first.' : 'Answer the questions about left and right first.';
  if (s.previewFailed) return 'Fix the problem above first.';
  if (s.previewBehind) return 'Updating the preview…';
  if (s.shotCount === 0) return 'No row converts to a shot with this mapping.';
  return null;
}
