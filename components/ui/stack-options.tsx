import type { ReactNode } from 'react';
import { colors } from '../theme';
import { AppHeader } from './app-header';

/** What a navigator hands its `header` option (the parts Ovalyard reads). */
type HeaderInput = {
  options: { title?: string };
  route: { name: string };
  navigation: { goBack: () => void };
  /** Set by a stack when there is a page to go back to. */
  back?: unknown;
};

/**
 * The signed-in Stack's header: back to the previous page, or — for a page opened by its
 * address, with no history — to the start page of the signed-in user.
 */
export function stackHeader(goHome: () => void) {
  return function StackHeader({ options, route, navigation, back }: HeaderInput): ReactNode {
    return (
      <AppHeader
        title={options.title ?? route.name}
        back={back ? { label: 'Back', onPress: () => navigation.goBack() } : { label: 'Back to the start page', onPress: goHome }}
      />
    );
  };
}

/** The tabs' header: a title and no way back (the tab bar is the way around). */
export function tabHeader({ options, route }: HeaderInput): ReactNode {
  return <AppHeader title={options.title ?? route.name} back={null} />;
}

/** Page colours shared by the signed-in Stack and the tabs. */
export const screenColors = { contentStyle: { backgroundColor: colors.paper } } as const;
