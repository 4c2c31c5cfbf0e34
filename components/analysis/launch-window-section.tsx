import { useMemo } from 'react';
import { View } from 'react-native';
import { optimiseLaunch, type AirConditions } from '@/analysis/flight';
import type { UnitSystem } from '@/analysis/units';
import type { AnalysisShot } from './plot-shots';
import { LaunchWindowPlot } from '../charts';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { formatField } from '../format-field';
import { useWidth } from './use-width';

type LaunchWindowSectionProps = { shots: readonly AnalysisShot[]; ballSpeedMps: number | null; air: AirConditions; units: UnitSystem };

/**
 * For the club's average ball speed, the launch angle and spin that carry farthest in the
 * fitting's air, the window within 1% of that carry, and the player's shots on the same plane.
 */
export function LaunchWindowSection({ shots, ballSpeedMps, air, units }: LaunchWindowSectionProps) {
  const [width, onLayout] = useWidth();
  const optimum = useMemo(() => (ballSpeedMps && ballSpeedMps > 15 ? optimiseLaunch(ballSpeedMps, air) : null), [ballSpeedMps, air]);
  const points = useMemo(
    () => shots.filter((s) => s.launchAngle !== null && s.spinRate !== null && s.decision !== 'drop').map((s) => ({ id: String(s.id), launchAngleDeg: s.launchAngle!, spinRateRpm: s.spinRate! })),
    [shots],
  );
  if (!optimum) return <AppText tone="muted">No ball speed in these shots: no launch window.</AppText>;
  return (
    <Card>
      <View onLayout={onLayout}>{width > 0 ? <LaunchWindowPlot optimum={optimum} points={points} units={units} widthPx={width} /> : null}</View>
      <AppText variant="caption" tone="muted">
        {`At ${formatField(ballSpeedMps, 'ballSpeed', units)} ball speed the model carries farthest at ${optimum.best.launchAngleDeg.toFixed(1)}° launch and ${Math.round(optimum.best.spinRateRpm).toLocaleString('en')} rpm (${formatField(optimum.best.carryM, 'carry', units)} carry). `}
        {optimum.bestOnEdge ? 'The best lies on the edge of the searched range. ' : ''}
        Carry only: roll, stopping power and the club’s loft are for the fitter to weigh.
      </AppText>
    </Card>
  );
}
