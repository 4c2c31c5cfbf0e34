import type { Recipe } from '@/analysis/import';
import type { UnitSystem } from '@/analysis/units';
import { ApiError, errorMessage } from '../api-client';
import { AppText } from '../ui/app-text';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { clubsOfGroups } from './build-choice';
import { BuildChoiceSection } from './build-choice-section';
import { importErrorTitle } from './import-words';
import { ImportWarnings } from './import-warnings';
import { MappingStep } from './mapping-step';
import { PreviewShots } from './preview-shots';
import { effectiveColumn } from './recipe-edit';
import { RejectedRows } from './rejected-rows';
import type { MappingSession } from './use-mapping-session';

type MappingReviewProps = {
  session: MappingSession;
  units: UnitSystem;
  /** A file is there to preview (picked, or the stored text loaded). */
  hasFile: boolean;
  /** Off for a re-map of a stored file. */
  showDuplicate: boolean;
  /** The stored mapping the edits go on top of (a re-map). */
  base?: Recipe;
  /** A saved recipe was chosen (an import). */
  fromRecipe?: boolean;
};

/**
 * The mapping step of a file as the import and the re-map share it: the preview's error, its
 * warnings, one row per column, the builds, and the converted and rejected rows.
 */
export function MappingReview({ session, units, hasFile, showDuplicate, base, fromRecipe }: MappingReviewProps) {
  const { shown, preview } = session;
  const previewError = preview.isError ? preview.error : null;
  const hasBuildColumn =
    shown?.suggestions.some((s) => effectiveColumn(s.header, session.overrides, shown.recipe, s).field === 'build') ?? false;
  return (
    <>
      {previewError ? (
        <Notice tone="danger" title={importErrorTitle(previewError instanceof ApiError ? previewError.code : undefined)}>
          {errorMessage(previewError)}
        </Notice>
      ) : null}
      {hasFile && !shown && preview.isFetching ? <LoadingState label="Reading the file…" /> : null}
      {shown ? (
        <>
          <ImportWarnings preview={shown} showDuplicate={showDuplicate} />
          <MappingStep
            session={session}
            preview={shown}
            base={base}
            fromRecipe={fromRecipe}
            hasBuildColumn={hasBuildColumn}
            buildsFromColumn={session.builds.mode === 'column'}
          />
          <BuildChoiceSection
            value={session.builds}
            onChange={session.setBuilds}
            clubs={clubsOfGroups(shown.report.groups)}
            hasBuildColumn={hasBuildColumn}
          />
          <Section title="Preview">
            {session.previewBehind ? (
              <AppText variant="caption" tone="muted">
                Updating…
              </AppText>
            ) : null}
            <PreviewShots shots={shown.shots} total={shown.report.imported} units={units} />
            <RejectedRows report={shown.report} />
          </Section>
        </>
      ) : null}
    </>
  );
}
