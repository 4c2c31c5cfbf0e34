import { colors, fonts } from '../theme';

/** Header look shared by the signed-in Stack and the tabs. */
export const headerOptions = {
  headerStyle: { backgroundColor: colors.ink },
  headerTintColor: colors.textOnInk,
  headerTitleStyle: { fontFamily: fonts.semibold, color: colors.textOnInk },
  headerShadowVisible: false,
  contentStyle: { backgroundColor: colors.paper },
} as const;
