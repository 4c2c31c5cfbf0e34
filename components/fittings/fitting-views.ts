/** The views of a fitting's page: what the fitter decides from first, the rest one tap away. */
export const FITTING_VIEWS = [
  { value: 'decide', label: 'Decide' },
  { value: 'shots', label: 'Shots' },
  { value: 'ladder', label: 'Ladder' },
  { value: 'builds', label: 'Builds' },
  { value: 'session', label: 'Session' },
] as const;

export type FittingView = (typeof FITTING_VIEWS)[number]['value'];

/**
 * The view named in the page's address (`?view=`), or the first. O(1).
 * @example fittingView('shots') // => 'shots'
 * @example fittingView(undefined) // => 'decide'
 */
export function fittingView(param: string | string[] | undefined): FittingView {
  const value = Array.isArray(param) ? param[0] : param;
  return FITTING_VIEWS.find((v) => v.value === value)?.value ?? 'decide';
}
