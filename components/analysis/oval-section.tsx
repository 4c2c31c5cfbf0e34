import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import { describeOvalSpread, ovalSpread } from '@/analysis/ovals';
import type { GroupAnalysis } from '@/analysis/session';
import type { UnitSystem } from '@/analysis/units';
import { OvalPlot } from '../charts';
import type { PlotShot as ChartShot } from '../charts';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { SwitchField } from '../ui/switch-field';
import { formatField, formatSide } from '../format-field';
import type { AnalysisShot } from './plot-shots';
import { StrayList } from './stray-list';
import { useWidth } from './use-width';
import type { Hand } from '@/analysis/plain-words/handed-words';
import { flightWords } from './flight-words';

type OvalSectionProps = {
  club: string;
  groups: readonly GroupAnalysis[];
  shots: readonly AnalysisShot[];
  units: UnitSystem;
  canDecide: boolean;
  onDecide: (shotId: number, decision: 'keep' | 'drop' | null) => void;
  deciding: boolean;
  /** The stray list with its reasons (the player's view keeps it behind "how we worked this out"). */
  showStrays?: boolean;
  /** The player's hand: each build's curve and miss in the words that hand uses (draw, fade…). */
  hand?: Hand;
};

/** One club's dispersion: the plot, the spread in words per build, the strays with keep/drop. */
export function OvalSection({ club, groups, shots, units, canDecide, onDecide, deciding, showStrays = true, hand }: OvalSectionProps) {
  const [width, onLayout] = useWidth();
  const [showPrediction, setShowPrediction] = useState(false);
  const [selected, setSelected] = useState<string | null>(null);
  const clubGroups = groups.filter((g) => g.club === club);
  const clubShots = useMemo(() => shots.filter((s) => s.club === club), [shots, club]);
  const plotted: ChartShot[] = useMemo(
    () =>
      clubShots
        .filter((s) => s.carry !== null && s.offline !== null)
        .map((s) => ({ id: String(s.id), row: s.row, club: s.club, build: s.build, decision: s.decision, stray: s.stray, carry: s.carry!, offline: s.offline! })),
    [clubShots],
  );
  const distance = (m: number) => formatField(m, 'carry', units);
  const selectedShot = clubShots.find((s) => String(s.id) === selected) ?? null;

  // On a wide screen the plot keeps a phone-like width and the words go beside it.
  const wide = width >= WIDE_FROM_PX;
  const plotWidth = wide ? Math.min(PLOT_MAX_WIDE_PX, Math.floor(width * 0.55)) : width;
  return (
    <Card>
      <View onLayout={onLayout} style={[styles.layout, wide && styles.wide]}>
        <View style={[styles.plot, wide && { width: plotWidth }]}>
          {width > 0 && plotted.length > 0 ? (
            <OvalPlot
              club={club}
              shots={plotted}
              groups={clubGroups}
              units={units}
              widthPx={plotWidth}
              showPrediction={showPrediction}
              selectedShotId={selected}
              onSelectShot={(id) => setSelected((old) => (old === id ? null : id))}
            />
          ) : (
            <AppText tone="muted">{plotted.length === 0 ? 'These shots have no carry and offline to plot.' : ' '}</AppText>
          )}
        </View>
        <View style={styles.side}>
          {selectedShot ? <AppText variant="caption">{describeShot(selectedShot, units)}</AppText> : null}
          <SwitchField
            label="Next-shot ovals"
            hint="Dashed: where the next shot will land with the same chance, honest for few shots."
            value={showPrediction}
            onChange={setShowPrediction}
          />
          {clubGroups.map((g) => (
            <AppText key={g.build ?? ''} variant="caption" tone="muted">
              <AppText variant="caption" style={styles.strong}>{`${g.build ?? clubInfo(club)?.label ?? club}: `}</AppText>
              {g.oval ? `${describeOvalSpread(ovalSpread(g.oval), distance)}.` : 'too few shots for an oval (3 or more with carry and offline).'}
              {hand ? flightWords(g, hand) : ''}
            </AppText>
          ))}
          {showStrays ? <StrayList groups={clubGroups} shots={clubShots} canDecide={canDecide} onDecide={onDecide} deciding={deciding} /> : null}
        </View>
      </View>
    </Card>
  );
}

function describeShot(s: AnalysisShot, units: UnitSystem): string {
  return `Shot ${s.row} (${s.build ?? 'no build'}): carry ${formatField(s.carry, 'carry', units)}, ${formatSide(s.offline, 'offline', units)}.`;
}

const WIDE_FROM_PX = 700;
const PLOT_MAX_WIDE_PX = 520;

const styles = StyleSheet.create({
  layout: { gap: space.md },
  wide: { flexDirection: 'row', alignItems: 'flex-start' },
  plot: { minHeight: 120 },
  side: { flex: 1, gap: space.sm, minWidth: 0 },
  strong: { fontFamily: 'Inter_600SemiBold' },
});
