import { View } from 'react-native';
import type { ShotField } from '@/analysis/fields';
import type { HeadToHead } from '@/analysis/head-to-head';
import type { UnitSystem } from '@/analysis/units';
import { DifferenceBars } from '../charts';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { ChipRow } from './chip-row';
import { useWidth } from './use-width';
import { VerdictList } from './verdict-list';
import { verdictRows } from './verdict-rows';

const FIELDS: ShotField[] = ['carry', 'total', 'offline', 'ballSpeed', 'smashFactor', 'launchAngle', 'spinRate', 'spinAxis'];
const SPREAD_FIELDS: ShotField[] = ['offline', 'carry'];

type HeadToHeadSectionProps = {
  builds: readonly string[];
  a: string;
  b: string;
  onChange: (a: string, b: string) => void;
  headToHead: HeadToHead | undefined;
  loading: boolean;
  units: UnitSystem;
};

/**
 * Two builds of one club side by side: the summary and overall verdict in words, the plot of
 * differences with their margins, and the same verdicts in a list — means and spread alike.
 */
export function HeadToHeadSection({ builds, a, b, onChange, headToHead, loading, units }: HeadToHeadSectionProps) {
  const [width, onLayout] = useWidth();
  const options = builds.map((x) => ({ value: x, label: x }));
  return (
    <Card>
      <AppText variant="label">Build A</AppText>
      <ChipRow label="Build A" value={a} options={options} onChange={(v) => onChange(v, v === b ? a : b)} />
      <AppText variant="label">Build B</AppText>
      <ChipRow label="Build B" value={b} options={options} onChange={(v) => onChange(v === a ? b : a, v)} />
      {!headToHead ? (
        <AppText tone="muted">{loading ? 'Comparing…' : 'Choose two builds.'}</AppText>
      ) : (
        <>
          <Notice tone={headToHead.overall.verdict === 'a' || headToHead.overall.verdict === 'b' ? 'success' : 'info'} title={headToHead.overall.text}>
            <AppText accessibilityRole="summary">{headToHead.summary.slice(0, headToHead.summary.length - headToHead.overall.text.length).trim()}</AppText>
          </Notice>
          <View onLayout={onLayout}>
            {width > 0 ? <DifferenceBars headToHead={headToHead} fields={FIELDS} spreadFields={SPREAD_FIELDS} labelA={a} labelB={b} units={units} widthPx={width} /> : null}
          </View>
          <VerdictList rows={verdictRows(headToHead, FIELDS, SPREAD_FIELDS, units)} />
          <AppText variant="caption" tone="muted">
            {headToHead.ovalAreaRatio == null
              ? 'Oval areas: not enough shots for both ovals. '
              : `Oval area of A is ${headToHead.ovalAreaRatio.toFixed(2)}× that of B (${headToHead.ovalAreaRatio < 1 ? 'A is tighter' : 'B is tighter'}). `}
            Equivalent: the 95% interval lies inside the margin (shaded); clear: it leaves out 0; otherwise not yet clear. Means by Welch’s t; spread by the Brown–Forsythe test on each shot’s distance from its build’s median.
          </AppText>
        </>
      )}
    </Card>
  );
}
