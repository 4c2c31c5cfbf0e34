import { render, screen } from '@testing-library/react-native';
import { buildLadder } from '@/analysis/ladder';
import { LadderChart } from '@/components/charts/ladder-chart';
import { byWebTestId } from '../../support/render-helpers';

/** Host elements with a test id (react-native-svg on the web preset writes testID as data-testid). */

// Invented carries, metres: 8I → 9I is 4 m (tight under 7 yd, analysis/ladder GAP_RULES, common practice, no source).
const RUNGS = buildLadder([
  { club: '7I', build: null, carryM: [140, 142, 141] },
  { club: '8I', build: null, carryM: [131, 132, 130] },
  { club: '9I', build: null, carryM: [127, 128, 126] },
]);

describe('LadderChart', () => {
  it('LadderChart of three clubs with one tight gap says so and draws three rows and two gaps', () => {
    render(<LadderChart rungs={RUNGS} units="metric" widthPx={390} />);
    expect(screen.getByLabelText('Ladder: three clubs, one flagged gap')).toBeTruthy();
    expect(byWebTestId('ladder-row')).toHaveLength(3);
    expect(byWebTestId('ladder-gap')).toHaveLength(2);
  });
});
