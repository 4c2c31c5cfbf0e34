import { StyleSheet, View } from 'react-native';
import type { UnitSystem } from '@/analysis/units';
import { plural } from '../format';
import { space } from '../theme';
import { CommitPanel } from './commit-panel';
import { FilePickStep } from './file-pick-step';
import { ImportResult } from './import-result';
import { mappingBlocker } from './mapping-blocker';
import { MappingReview } from './mapping-review';
import { RecipeChoiceSection } from './recipe-choice-section';
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
  const { shown, committed } = session;
  if (committed) {
    return (
      <ImportResult
        bayFile={committed}
        title="Imported"
        onDone={onDone}
        another={{ title: 'Import another file', onPress: () => session.setFile(null) }}
      />
    );
  }
  const shotCount = shown?.report.imported ?? 0;
  const blocker = mappingBlocker({
    hasPreview: shown !== undefined,
    noPreview: 'Choose a file first.',
    duplicate: shown?.duplicateOf != null,
    buildsComplete: session.buildsComplete,
    openQuestions: session.signQuestions.length,
    previewFailed: session.preview.isError,
    previewBehind: session.previewBehind,
    shotCount,
  });

  return (
    <View style={styles.flow}>
      <FilePickStep file={session.file} onFile={session.setFile} disabled={session.commit.busy} />
      <MappingReview session={session} units={units} hasFile={session.file !== null} showDuplicate fromRecipe={session.recipeId !== null} />
      {shown && canUseRecipes ? (
        <RecipeChoiceSection
          recipeId={session.recipeId}
          onRecipeId={session.setRecipeId}
          saveAs={session.saveRecipeAs}
          onSaveAs={session.setSaveRecipeAs}
        />
      ) : null}
      {shown ? (
        <CommitPanel
          title={shotCount > 0 ? `Import ${plural(shotCount, 'shot')}` : 'Import'}
          accessibilityLabel="Import the bay file"
          phase={session.commit.phase}
          error={session.commit.error}
          busy={session.commit.busy}
          blocker={blocker}
          onCommit={session.commit.start}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ flow: { gap: space.xl } });
