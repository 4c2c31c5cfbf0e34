import { StyleSheet, View, type ViewProps } from 'react-native';
import { figureLines, specRows } from '@/analysis/bag';
import type { UnitSystem } from '@/analysis/units';
import type { SpecSheet } from '@/server/schemas';
import { useWidth } from '../analysis/use-width';
import { formatDate, formatVenue } from '../format';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { DetailList } from '../ui/detail-list';
import { Notice } from '../ui/notice';
import { BagChecksList } from './bag-checks-list';
import { BagLadderChart } from './bag-ladder-chart';
import { BagLadderTable } from './bag-ladder-table';

type SpecSheetDocumentProps = { sheet: SpecSheet; units: UnitSystem };

const keep = { dataSet: { print: 'keep' } } as unknown as ViewProps;
const STATE_WORDS = { draft: 'Draft', sent: 'Sent to the player', accepted: 'Accepted by the player' } as const;

/** The spec sheet itself, the same on screen and on paper: chosen builds, their figures, the ladder after the change, notes, caution. */
export function SpecSheetDocument({ sheet, units }: SpecSheetDocumentProps) {
  const [width, onLayout] = useWidth();
  const stamp = sheet.state === 'accepted' && sheet.acceptedAt ? ` on ${formatDate(sheet.acceptedAt.slice(0, 10))}` : sheet.state === 'sent' && sheet.sentAt ? ` on ${formatDate(sheet.sentAt.slice(0, 10))}` : '';
  return (
    <View style={styles.doc}>
      <View style={styles.head}>
        <AppText variant="title" accessibilityRole="header">Spec sheet</AppText>
        <AppText tone="muted">{sheet.shopName}</AppText>
      </View>
      <AppText variant="bodyStrong">{[sheet.playerName, sheet.fitterName ? `fitted by ${sheet.fitterName}` : null, formatDate(sheet.fittingDate), formatVenue(sheet.venue)].filter(Boolean).join(' · ')}</AppText>
      <View style={[styles.state, sheet.state === 'accepted' && styles.accepted]}>
        <AppText variant="label">{`${STATE_WORDS[sheet.state]}${stamp}`}</AppText>
      </View>

      <AppText variant="heading" accessibilityRole="header">Chosen builds</AppText>
      {sheet.choices.length === 0 ? <AppText tone="muted">No build chosen yet.</AppText> : null}
      {sheet.choices.map((c) => {
        const figures = c.figures ? figureLines(c.figures, units) : [];
        return (
          <View key={`${c.club}-${c.buildLabel}`} style={styles.choice} {...keep}>
            <AppText variant="bodyStrong">{`${c.clubLabel} — ${c.buildLabel}`}</AppText>
            {c.change ? <AppText variant="caption" tone="muted">{c.change.kind === 'replace' ? `Replaces the ${c.change.replacedClubLabel.toLowerCase()}` : 'New in the bag'}</AppText> : null}
            <DetailList items={specRows(c.spec)} />
            {figures.length ? (
              <View style={styles.figures}>
                <AppText variant="label">Why this build</AppText>
                {figures.map((f) => (
                  <AppText key={f} variant="caption">{`• ${f}`}</AppText>
                ))}
              </View>
            ) : null}
          </View>
        );
      })}
      {sheet.takenOut.length ? <AppText>{`Out of the bag: ${sheet.takenOut.join(', ')}.`}</AppText> : null}

      <AppText variant="heading" accessibilityRole="header">The bag’s ladder after the change</AppText>
      <View onLayout={onLayout} {...keep}>
        {width > 0 && sheet.ladder.some((r) => r.carryM !== null) ? <BagLadderChart ladder={sheet.ladder} units={units} widthPx={width} /> : null}
      </View>
      <BagLadderTable ladder={sheet.ladder} units={units} labels={sheet.ladderLabels} />

      <AppText variant="heading" accessibilityRole="header">Notes on the rules</AppText>
      <BagChecksList checks={sheet.checks} empty="No notes: nothing here raises the length, loft or 14-club rules." />
      <View {...keep}>
        <Notice tone="caution" title="Workshop work">
          <AppText>{sheet.caution}</AppText>
        </Notice>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  doc: { gap: space.md },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', flexWrap: 'wrap', gap: space.sm },
  state: { alignSelf: 'flex-start', backgroundColor: colors.surfaceSunk, borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 2 },
  accepted: { backgroundColor: colors.successSoft },
  choice: { gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  figures: { gap: 2, marginTop: space.xs },
});
