import { useState } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { colors, layout, radius, space, type as typeScale } from '../theme';
import { AppText } from './app-text';

type TextFieldProps = Omit<TextInputProps, 'style' | 'onChangeText' | 'value'> & {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  error?: string;
  hint?: string;
  /** Shown after the input, e.g. a unit ("cm"). */
  suffix?: string;
};

/** A labelled input; its accessibility label is the visible label. Errors show under it. */
export function TextField({ label, value, onChangeText, error, hint, suffix, multiline, ...rest }: TextFieldProps) {
  const [focused, setFocused] = useState(false);
  return (
    <View style={styles.field}>
      <AppText variant="label">{label}</AppText>
      <View
        style={[
          styles.box,
          multiline && styles.multiline,
          focused && styles.focused,
          error ? styles.invalid : null,
        ]}
      >
        <TextInput
          {...rest}
          accessibilityLabel={rest.accessibilityLabel ?? label}
          aria-invalid={error ? true : undefined}
          value={value}
          onChangeText={onChangeText}
          multiline={multiline}
          placeholderTextColor={colors.textMuted}
          onFocus={(e) => {
            setFocused(true);
            rest.onFocus?.(e);
          }}
          onBlur={(e) => {
            setFocused(false);
            rest.onBlur?.(e);
          }}
          style={[styles.input, multiline && styles.inputMultiline]}
        />
        {suffix ? (
          <AppText tone="muted" style={styles.suffix}>
            {suffix}
          </AppText>
        ) : null}
      </View>
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

const styles = StyleSheet.create({
  field: { gap: space.xs },
  box: {
    minHeight: layout.minTouchPx,
    flexDirection: 'row',
    alignItems: 'center',
    backgroundColor: colors.surface,
    borderColor: colors.border,
    borderWidth: 1,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
  },
  multiline: { alignItems: 'flex-start', paddingVertical: space.sm },
  focused: { borderColor: colors.accent },
  invalid: { borderColor: colors.danger },
  input: {
    ...typeScale.body,
    color: colors.text,
    // flexBasis 0 + minWidth 0: a web <input> otherwise keeps its default width and pushes the suffix out
    flexGrow: 1,
    flexBasis: 0,
    minWidth: 0,
    minHeight: layout.minTouchPx - 2,
    // react-native-web draws its own focus ring; the border above shows focus instead.
    outlineStyle: 'none',
  } as object,
  inputMultiline: { minHeight: 96, textAlignVertical: 'top' },
  suffix: { marginLeft: space.sm },
});
