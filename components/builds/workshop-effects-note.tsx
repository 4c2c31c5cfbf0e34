import { View } from 'react-native';
import { AppText } from '../ui/app-text';
import { Notice } from '../ui/notice';
import { typedNumber, type BuildFormText } from './build-form-values';
import { workshopEffectLines, type EffectInput } from './workshop-effects';

type WorkshopEffectsNoteProps = { saved: EffectInput['saved']; text: BuildFormText };

/** What the change being typed does (swing weight, lie), by the workshop rules of thumb; nothing when there is no change. */
export function WorkshopEffectsNote({ saved, text }: WorkshopEffectsNoteProps) {
  const lines = workshopEffectLines({
    saved,
    typed: {
      addedMassG: typedNumber(text.addedMassG),
      addedMassWhere: text.addedMassWhere,
      lengthIn: typedNumber(text.lengthIn),
      totalWeightG: typedNumber(text.totalWeightG),
      balancePointIn: typedNumber(text.balancePointIn),
    },
  });
  if (lines.length === 0) return null;
  return (
    <View aria-live="polite">
      <Notice tone="info" title="What this change does">
        {lines.map((line) => (
          <AppText key={line}>{line}</AppText>
        ))}
        <AppText variant="caption" tone="muted">
          Rules of thumb of the trade: about 2 g at the head per swing-weight point, 3 points and 1° of lie per ½ in of length.
        </AppText>
      </Notice>
    </View>
  );
}
