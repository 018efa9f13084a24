/**
 * Labelled text input with its hint and error message right under the field (the field's own message, never a
 * distant toast). The label doubles as the accessible name; the error is announced politely.
 */
import { forwardRef, useId, type ReactNode } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, fonts, radius, space, type, TOUCH_TARGET } from '@/components/ui/theme';

export interface TextFieldProps
  extends Pick<
    TextInputProps,
    | 'value'
    | 'onChangeText'
    | 'onSubmitEditing'
    | 'onBlur'
    | 'placeholder'
    | 'secureTextEntry'
    | 'autoComplete'
    | 'autoCapitalize'
    | 'keyboardType'
    | 'inputMode'
    | 'editable'
    | 'returnKeyType'
    | 'autoFocus'
    | 'maxLength'
  > {
  label: string;
  error?: string | null;
  hint?: string;
  multiline?: boolean;
  /** Numbers in the mono face (tabular figures). */
  numeric?: boolean;
  /** Trailing adornment, e.g. a unit such as "m/s". */
  trailing?: ReactNode;
  testID?: string;
}

export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField(
  { label, error, hint, multiline = false, numeric = false, trailing, testID, ...input },
  ref,
) {
  const id = useId();
  const hasError = Boolean(error);
  return (
    <View style={styles.wrap}>
      <Text style={[type.label, styles.label]} nativeID={`${id}-label`}>
        {label}
      </Text>
      <View style={[styles.box, hasError && styles.boxError, input.editable === false && styles.boxDisabled]}>
        <TextInput
          ref={ref}
          {...input}
          accessibilityLabel={label}
          aria-describedby={hasError ? `${id}-error` : hint ? `${id}-hint` : undefined}
          testID={testID}
          multiline={multiline}
          placeholderTextColor={colors.textMuted}
          style={[
            styles.input,
            numeric && styles.numeric,
            multiline && styles.multiline,
          ]}
        />
        {trailing ? <View style={styles.trailing}>{trailing}</View> : null}
      </View>
      {hint && !hasError ? (
        <Text style={[type.caption, styles.hint]} nativeID={`${id}-hint`}>
          {hint}
        </Text>
      ) : null}
      {hasError ? (
        <Text
          style={[type.small, styles.error]}
          nativeID={`${id}-error`}
          accessibilityLiveRegion="polite"
          aria-live="polite"
          testID={testID ? `${testID}-error` : undefined}
        >
          {error}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.xs, alignSelf: 'stretch' },
  label: { color: colors.text },
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    borderWidth: 1,
    borderColor: colors.borderStrong,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
    minHeight: TOUCH_TARGET,
  },
  boxError: { borderColor: colors.danger, borderWidth: 2 },
  boxDisabled: { backgroundColor: colors.surfaceMuted },
  input: {
    flex: 1,
    minWidth: 0,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    fontFamily: fonts.sans,
    fontSize: 16,
    lineHeight: 22,
    color: colors.text,
  },
  numeric: { fontFamily: fonts.mono, fontVariant: ['tabular-nums'] },
  multiline: { minHeight: 96, textAlignVertical: 'top' },
  trailing: { paddingRight: space.md },
  hint: { color: colors.textMuted },
  error: { color: colors.danger },
});
