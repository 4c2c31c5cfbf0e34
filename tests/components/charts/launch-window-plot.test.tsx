import { render, screen } from '@testing-library/react-native';
import { optimiseLaunch } from '@/analysis/flight';
import { LaunchWindowPlot } from '@/components/charts/launch-window-plot';
import { byWebTestId } from '../../support/render-helpers';

/** Host elements with a test id (react-native-svg on the web preset writes testID as data-testid). */

// A coarse optimiser run (analysis/flight) and invented shots of one club.
const OPTIMUM = optimiseLaunch(52, {}, { launchRangeDeg: [6, 30], launchStepDeg: 2, spinRangeRpm: [1000, 9000], spinStepRpm: 500 });
const POINTS = [16.5, 18.2, 15.1].map((launchAngleDeg, i) => ({ id: `p${i}`, launchAngleDeg, spinRateRpm: 6000 + 400 * i }));

describe('LaunchWindowPlot', () => {
  it('LaunchWindowPlot of three shots names the best launch and draws three dots', () => {
    render(<LaunchWindowPlot optimum={OPTIMUM} points={POINTS} units="metric" widthPx={390} />);
    const label = `Launch window: Best ${OPTIMUM.best.launchAngleDeg.toFixed(1)}°`;
    expect(screen.getByLabelText(new RegExp(`^${label}.*3 shots plotted$`))).toBeTruthy();
    expect(byWebTestId('launch-dot')).toHaveLength(3);
  });
});
