import { View } from 'react-native';
import type { BagCheck } from '@/analysis/conformance';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Notice } from '../ui/notice';

type BagChecksListProps = { checks: readonly BagCheck[]; empty?: string };

/** The bag's notes on the rules and its carries; reminders only, never blocking. */
export function BagChecksList({ checks, empty }: BagChecksListProps) {
  if (checks.length === 0) return empty ? <AppText tone="muted">{empty}</AppText> : null;
  return (
    <View style={{ gap: space.sm }}>
      {checks.map((c) => (
        <Notice key={`${c.code}-${c.clubIds.join('-')}`} tone={c.severity === 'advice' ? 'info' : 'caution'} title={c.title}>
          <AppText>{c.text}</AppText>
        </Notice>
      ))}
    </View>
  );
}
