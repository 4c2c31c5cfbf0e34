import { Platform, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space, type as typeScale } from '../theme';
import { AppText } from './app-text';
import { ChoiceField } from './choice-field';

type SelectFieldProps<T extends string> = {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  disabled?: boolean;
  /** Draws the box in the caution colour (e.g. a low-confidence guess). */
  attention?: boolean;
  /** Hide the visible label (the accessibility label stays). */
  hideLabel?: boolean;
};

/**
 * One of many options. On the web a native <select>: phones open their own picker, and it is
 * keyboard and screen-reader friendly with no extra code. Elsewhere it falls back to a radio group.
 */
export function SelectField<T extends string>({ label, value, options, onChange, disabled = false, attention = false, hideLabel = false }: SelectFieldProps<T>) {
  if (Platform.OS !== 'web') return <ChoiceField label={label} value={value} options={options} onChange={onChange} disabled={disabled} />;
  return (
    <View style={styles.field}>
      {hideLabel ? null : <AppText variant="label">{label}</AppText>}
      <select
        aria-label={label}
        value={value}
        disabled={disabled}
        onChange={(e) => onChange(e.target.value as T)}
        style={{
          ...selectStyle,
          borderColor: attention ? colors.caution : colors.border,
          backgroundColor: attention ? colors.cautionSoft : colors.surface,
          opacity: disabled ? 0.55 : 1,
        }}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </View>
  );
}

const selectStyle = {
  minHeight: layout.minTouchPx,
  width: '100%',
  borderWidth: 1,
  borderStyle: 'solid',
  borderRadius: radius.md,
  paddingLeft: space.md,
  paddingRight: space.md,
  fontFamily: typeScale.body.fontFamily,
  fontSize: typeScale.body.fontSize,
  color: colors.text,
} as const;

const styles = StyleSheet.create({ field: { gap: space.xs, minWidth: 0 } });
