import { useMemo, useState } from 'react';
import { View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import { clubWindowAim, launchWindowForClub, optimiseLaunch, simulateFlight, type Conditions } from '@/analysis/flight';
import type { UnitSystem } from '@/analysis/units';
import type { AnalysisShot } from './plot-shots';
import { LaunchWindowPlot } from '../charts';
import { parseOptionalNumber } from '../forms';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { TextField } from '../ui/text-field';
import { formatField } from '../format-field';
import { useWidth } from './use-width';

type LaunchWindowSectionProps = {
  shots: readonly AnalysisShot[];
  ballSpeedMps: number | null;
  /** The conditions to aim for: the player's course when given, else the fitting's. */
  air: Conditions;
  units: UnitSystem;
  /** The club's code (e.g. "7I"): its kind sets what the window aims at. */
  club?: string;
};

function median(values: number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/**
 * For the club's average ball speed, the launch and spin the model likes best for the club's kind
 * (total for driver and woods, carry landing steep enough for irons and hybrids), the window
 * within 1% of that, and the player's shots on the same plane. Wedges get their spin and descent.
 */
export function LaunchWindowSection({ shots, ballSpeedMps, air, units, club }: LaunchWindowSectionProps) {
  const [width, onLayout] = useWidth();
  const kind = club ? clubInfo(club)?.kind : undefined;
  const aim = useMemo(() => (kind ? clubWindowAim(kind) : { objective: 'carry' as const, minDescentDeg: null }), [kind]);
  const [floorText, setFloorText] = useState('');
  const floorParsed = parseOptionalNumber(floorText);
  const floorDeg = floorParsed !== null && floorParsed > 0 && floorParsed < 90 ? floorParsed : undefined;
  const points = useMemo(
    () => shots.filter((s) => s.launchAngle !== null && s.spinRate !== null && s.decision !== 'drop').map((s) => ({ id: String(s.id), launchAngleDeg: s.launchAngle!, spinRateRpm: s.spinRate! })),
    [shots],
  );
  const optimum = useMemo(() => {
    if (!ballSpeedMps || ballSpeedMps <= 15 || !aim) return null;
    return kind ? launchWindowForClub(kind, ballSpeedMps, air, { descentFloorDeg: floorDeg }) : optimiseLaunch(ballSpeedMps, air);
  }, [ballSpeedMps, air, kind, floorDeg, aim]);
  const wedge = useMemo(() => {
    if (aim !== null || !ballSpeedMps) return null;
    const launch = median(points.map((p) => p.launchAngleDeg));
    const spin = median(points.map((p) => p.spinRateRpm));
    if (launch === null || spin === null || launch <= 0) return null;
    return { spin, descent: simulateFlight({ ballSpeedMps, launchAngleDeg: launch, spinRateRpm: spin }, air).descentAngleDeg };
  }, [aim, ballSpeedMps, points, air]);
  if (!ballSpeedMps || ballSpeedMps <= 15) return <AppText tone="muted">No ball speed in these shots: no launch window.</AppText>;
  const plot = <View onLayout={onLayout}>{width > 0 ? <LaunchWindowPlot optimum={optimum} points={points} units={units} widthPx={width} /> : null}</View>;
  if (!aim) {
    return (
      <Card>
        {plot}
        <AppText variant="caption" tone="muted">
          {wedge
            ? `Wedges get no window: typical spin ${Math.round(wedge.spin).toLocaleString('en')} rpm, descent about ${wedge.descent.toFixed(0)}° (from the ball-flight model). `
            : 'Wedges get no window: their spin and descent are what count. '}
          Slow, high wedge flights are the least certain part of the model (the drag crisis: balls differ most there).
        </AppText>
      </Card>
    );
  }
  if (!optimum) return <AppText tone="muted">No launch window for these shots.</AppText>;
  const floorShown = optimum.minDescentDeg;
  return (
    <Card>
      {plot}
      <AppText variant="caption" tone="muted">
        {optimum.feasible
          ? `At ${formatField(ballSpeedMps, 'ballSpeed', units)} ball speed the model gets the most ${optimum.objective} at ${optimum.best.launchAngleDeg.toFixed(1)}° launch and ${Math.round(optimum.best.spinRateRpm).toLocaleString('en')} rpm (${formatField(optimum.best.carryM, 'carry', units)} carry, ${formatField(optimum.best.totalM, 'total', units)} total, landing at ${optimum.best.descentAngleDeg.toFixed(0)}°). `
          : `No launch at this ball speed lands ${floorShown ?? ''}° steep. `}
        {optimum.bestOnEdge ? 'The best lies on the edge of the searched range. ' : ''}
        {optimum.objective === 'total'
          ? `Total on ${air.firmness ?? 'normal'} ground, landing at least ${floorShown}° steep (flatter landings are beyond what the roll model can say; the roll model’s firmness settings are our assumption).`
          : `Carry, landing at least ${floorShown}° steep to hold a green (common practice; change it below).`}
      </AppText>
      <TextField
        label="Land at least"
        suffix="°"
        value={floorText}
        onChangeText={setFloorText}
        inputMode="decimal"
        placeholder={String(clubWindowAim(kind ?? 'iron')?.minDescentDeg ?? '')}
        hint="The descent angle the window keeps to."
      />
    </Card>
  );
}
