import { FITTING_VIEWS, fittingView } from '@/components/fittings/fitting-views';

describe('fittingView', () => {
  it('fittingView reads a known view from the address and falls back to deciding', () => {
    expect(fittingView('shots')).toBe('shots');
    expect(fittingView(['ladder'])).toBe('ladder');
    expect(fittingView('nope')).toBe('decide');
    expect(fittingView(undefined)).toBe('decide');
  });
  it('FITTING_VIEWS puts deciding first', () => {
    expect(FITTING_VIEWS[0].value).toBe('decide');
  });
});
