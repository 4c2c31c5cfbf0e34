import { useRouter } from 'expo-router';
import type { ReactNode } from 'react';
import { colors } from '../theme';
import { AppHeader } from './app-header';
import { routeTitle } from './route-titles';

/** What a navigator hands its `header` option (the parts Ovalyard reads). */
type HeaderInput = {
  options: { title?: string };
  route: { name: string };
  navigation: { goBack: () => void };
  /** Set by a stack when there is a page to go back to. */
  back?: unknown;
};

/**
 * A stack page's header: back to the previous page, or — for a page opened by its address, with
 * no history — to the start page of the signed-in user. Same chevron either way.
 */
function StackHeader({ options, route, navigation, back }: HeaderInput): ReactNode {
  const router = useRouter();
  return (
    <AppHeader
      title={options.title ?? routeTitle(route.name)}
      back={back ? { label: 'Back', onPress: () => navigation.goBack() } : { label: 'Back to the start page', onPress: () => router.replace('/') }}
    />
  );
}

/** The tabs' header: a title and no way back (the tab bar is the way around). */
function TabHeader({ options, route }: HeaderInput): ReactNode {
  return <AppHeader title={options.title ?? routeTitle(route.name)} back={null} />;
}

/** Header and page colour of every signed-in Stack (a nested one too: spread these into its screenOptions). */
export const headerOptions = {
  header: (props: HeaderInput) => <StackHeader {...props} />,
  contentStyle: { backgroundColor: colors.paper },
} as const;

/** Header of the tabs. */
export const tabHeaderOptions = {
  header: (props: HeaderInput) => <TabHeader {...props} />,
} as const;
