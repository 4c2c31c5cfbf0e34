import { Text, type TextProps } from 'react-native';
import { colors, type as typeScale } from '../theme';

type AppTextProps = TextProps & {
  variant?: keyof typeof typeScale;
  tone?: 'default' | 'muted' | 'danger' | 'onInk' | 'accent';
};

const toneColor = {
  default: colors.text,
  muted: colors.textMuted,
  danger: colors.danger,
  onInk: colors.textOnInk,
  accent: colors.accent,
} as const;

/** Text in Inter with one of the theme's sizes. */
export function AppText({ variant = 'body', tone = 'default', style, ...rest }: AppTextProps) {
  return <Text {...rest} style={[typeScale[variant], { color: toneColor[tone] }, style]} />;
}
