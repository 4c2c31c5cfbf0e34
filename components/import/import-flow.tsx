import { StyleSheet, View } from 'react-native';
import type { UnitSystem } from '@/analysis/units';
import { ApiError, errorMessage } from '../api-client';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { LoadingState } from '../ui/loading-state';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { BuildChoiceSection } from './build-choice-section';
import { clubsOfGroups } from './build-choice';
import { CommitPanel } from './commit-panel';
import { FilePickStep } from './file-pick-step';
import { importErrorTitle } from './import-words';
import { ImportResult } from './import-result';
import { ImportWarnings } from './import-warnings';
import { MappingStep } from './mapping-step';
import { PreviewShots } from './preview-shots';
import { RecipeChoiceSection } from './recipe-choice-section';
import { RejectedRows } from './rejected-rows';
import { effectiveColumn } from './recipe-edit';
import { useImportSession } from './use-import-session';

type ImportFlowProps = {
  fittingId: string;
  units: UnitSystem;
  /** Staff see saved recipes and may save one; players uploading to a remote fitting do not. */
  canUseRecipes: boolean;
  onDone: () => void;
};

/** Pick a bay file, check and correct its mapping against a live preview, then import it. */
export function ImportFlow({ fittingId, units, canUseRecipes, onDone }: ImportFlowProps) {
  const session = useImportSession(fittingId);
  const { shown, preview, committed } = session;
  if (committed) return <ImportResult bayFile={committed} onDone={onDone} onAnother={() => session.setFile(null)} />;

  const previewError = preview.isError ? preview.error : null;
  const blocker = !shown
    ? 'Choose a file first.'
    : shown.duplicateOf
      ? 'This file is already in the fitting.'
      : !session.buildsComplete
        ? 'Name the build first.'
        : previewError
          ? 'Fix the problem above first.'
          : session.previewBehind
            ? 'Updating the preview…'
            : shown.report.imported === 0
              ? 'No row converts to a shot with this mapping.'
              : null;
  const hasBuildColumn =
    shown?.suggestions.some((s) => effectiveColumn(s.header, session.overrides, shown.recipe, s).field === 'build') ?? false;

  return (
    <View style={styles.flow}>
      <FilePickStep file={session.file} onFile={session.setFile} disabled={session.commit.busy} />
      {previewError ? (
        <Notice tone="danger" title={importErrorTitle(previewError instanceof ApiError ? previewError.code : undefined)}>
          {errorMessage(previewError)}
        </Notice>
      ) : null}
      {session.file && !shown && preview.isFetching ? <LoadingState label="Reading the file…" /> : null}
      {shown ? (
        <>
          <ImportWarnings preview={shown} />
          <MappingStep session={session} preview={shown} />
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
          {canUseRecipes ? (
            <RecipeChoiceSection
              recipeId={session.recipeId}
              onRecipeId={session.setRecipeId}
              saveAs={session.saveRecipeAs}
              onSaveAs={session.setSaveRecipeAs}
            />
          ) : null}
          <CommitPanel
            phase={session.commit.phase}
            error={session.commit.error}
            busy={session.commit.busy}
            shotCount={shown.report.imported}
            blocker={blocker}
            onCommit={session.commit.start}
          />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ flow: { gap: space.xl } });
