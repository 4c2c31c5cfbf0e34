import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space, type as typeScale } from '../theme';
import { AppText } from './app-text';
import { TextField } from './text-field';

type DateFieldProps = {
  label: string;
  /** The date as YYYY-MM-DD, or '' for none. */
  value: string;
  onChange: (isoDate: string) => void;
  error?: string;
  hint?: string;
  /** Earliest and latest dates the picker offers (YYYY-MM-DD). */
  min?: string;
  max?: string;
};

/**
 * A calendar date. On the web a native <input type="date">: a calendar to pick from, and the
 * date can still be typed (day, month and year in the browser's own order); its value is always
 * YYYY-MM-DD. A browser without a date input shows a text box, where YYYY-MM-DD is typed.
 * Elsewhere a text field for YYYY-MM-DD.
 */
export function DateField({ label, value, onChange, error, hint, min, max }: DateFieldProps) {
  const [focused, setFocused] = useState(false);
  if (Platform.OS !== 'web') {
    return <TextField label={label} value={value} onChangeText={onChange} error={error} hint={hint ?? 'As YYYY-MM-DD'} placeholder="YYYY-MM-DD" />;
  }
  return (
    <View style={styles.field}>
      <AppText variant="label">{label}</AppText>
      <input
        type="date"
        aria-label={label}
        aria-invalid={error ? true : undefined}
        value={value}
        min={min}
        max={max}
        placeholder="YYYY-MM-DD"
        onChange={(e) => onChange(e.target.value)}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={{
          ...inputStyle,
          borderColor: error ? colors.danger : focused ? colors.accent : colors.border,
        }}
      />
      {error ? (
        <AppText variant="caption" tone="danger" accessibilityRole="alert">
          {error}
        </AppText>
      ) : hint ? (
        <AppText variant="caption" tone="muted">
          {hint}
        </AppText>
      ) : null}
    </View>
  );
}

const inputStyle = {
  boxSizing: 'border-box',
  minHeight: layout.minTouchPx,
  width: '100%',
  minWidth: 0,
  borderWidth: 1,
  borderStyle: 'solid',
  borderRadius: radius.md,
  paddingLeft: space.md,
  paddingRight: space.sm,
  backgroundColor: colors.surface,
  fontFamily: typeScale.body.fontFamily,
  fontSize: typeScale.body.fontSize,
  color: colors.text,
  outline: 'none',
} as const;

const styles = StyleSheet.create({ field: { gap: space.xs, minWidth: 0 } });
