import { render, screen } from '@testing-library/react-native';
import { DifferenceBars } from '@/components/charts/difference-bars';
import { byWebTestId } from '../../support/render-helpers';

/** Host elements with a test id (react-native-svg on the web preset writes testID as data-testid). */

// The first interval is the NAG Library g07ca example's Welch interval (difference 4.0,
// 95% CI [0.4410, 7.5590], published); the second is invented and spans zero.
const HEAD_TO_HEAD = {
  fields: {
    launchAngle: { meanA: 25, meanB: 21, diff: 4, ci95: [0.441, 7.559] as [number, number], t: 2.5922, df: 7.9925, p: 0.032, margin: 0.5, verdict: 'clear' as const, shotsNeeded: null },
    spinRate: { meanA: 6400, meanB: 6500, diff: -100, ci95: [-400, 200] as [number, number], t: -0.7, df: 30, p: 0.5, margin: 150, verdict: 'unclear' as const, shotsNeeded: 40 },
  },
};

describe('DifferenceBars', () => {
  it('DifferenceBars of two fields, one clear of zero, says so and draws two rows', () => {
    render(<DifferenceBars headToHead={HEAD_TO_HEAD} fields={['launchAngle', 'spinRate', 'carry']} labelA="Steel 105" labelB="Graphite 80" units="imperial" widthPx={390} />);
    expect(screen.getByLabelText('Steel 105 minus Graphite 80: two rows, 1 clear, 0 equivalent, 1 not yet clear')).toBeTruthy();
    expect(byWebTestId('difference-row')).toHaveLength(2);
  });
});
