import { fireEvent, render, screen } from '@testing-library/react-native';
import { groundOval } from '@/analysis/ovals';
import type { PlotShot } from '@/components/charts/chart-types';
import { OvalPlot } from '@/components/charts/oval-plot';
import { byWebTestId, pageText } from '../../support/render-helpers';

// Invented shots of one 7 iron session: two builds of ten shots each.
const OFF = [-6, 2, 9, -1, 4, -8, 3, 0, 5, -3];
const CARRY = [142, 150, 158, 147, 151, 139, 154, 149, 153, 145];
const SHOTS: PlotShot[] = [...OFF, ...OFF.map((o) => o + 4)].map((offline, i) => ({
  id: `shot-${i}`,
  bayFileId: 'f1',
  row: i + 1,
  club: '7I',
  build: i < 10 ? 'Steel 105' : 'Graphite 80',
  carry: CARRY[i % 10] + (i < 10 ? 0 : 3),
  offline,
  decision: i === 3 ? 'drop' : null,
  stray: false,
}));
const GROUPS = ['Steel 105', 'Graphite 80'].map((build, b) => {
  const mine = SHOTS.slice(b * 10, b * 10 + 10);
  const off = mine.map((s) => s.offline);
  const carry = mine.map((s) => s.carry);
  return { build, n: 10, oval: groundOval(off, carry), predictionOval: groundOval(off, carry, { kind: 'prediction' }) };
});

/**
 * Host elements with a test id. On the web preset react-native-svg writes testID as the DOM
 * attribute data-testid and onPress as onClick, which the testID queries do not see.
 */


describe('OvalPlot', () => {
  it('OvalPlot of 20 shots in two builds says so and draws 20 dots', () => {
    render(<OvalPlot club="7I" shots={SHOTS} groups={GROUPS} units="imperial" widthPx={390} />);
    expect(screen.getByLabelText('7 iron: 20 shots, two builds, 1 dropped')).toBeTruthy();
    expect(byWebTestId('shot-dot')).toHaveLength(20);
    expect(pageText()).toContain('Steel 105 (n 10)');
    expect(pageText()).toContain('Next-shot oval');
    expect(pageText()).toContain('Carry (yd)');
  });

  it('OvalPlot pressing a dot calls onSelectShot with its id', () => {
    const onSelectShot = jest.fn();
    render(<OvalPlot club="7I" shots={SHOTS} groups={GROUPS} units="metric" widthPx={390} onSelectShot={onSelectShot} />);
    const dot = byWebTestId('shot-dot')[4];
    fireEvent(dot, 'click');
    expect(onSelectShot).toHaveBeenCalledWith('shot-4');
  });

  it('OvalPlot without prediction ovals leaves them out of the legend', () => {
    render(<OvalPlot club="7I" shots={SHOTS} groups={GROUPS} units="metric" widthPx={900} showPrediction={false} />);
    expect(pageText()).not.toContain('Next-shot oval');
    expect(pageText()).toContain('Carry (m)');
  });
});
