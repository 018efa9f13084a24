/**
 * Pick one of several options: a labelled button showing the current choice that opens a Sheet listing the
 * options as radio items. Works the same on phone and wide screens.
 */
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { Sheet } from '@/components/ui/sheet';
import { colors, radius, space, type, TOUCH_TARGET } from '@/components/ui/theme';

export interface SelectOption<T extends string> {
  value: T;
  label: string;
  description?: string;
}

export function Select<T extends string>({
  label,
  value,
  options,
  onChange,
  disabled = false,
  hideLabel = false,
  testID,
}: {
  label: string;
  value: T | null;
  options: readonly SelectOption<T>[];
  onChange: (next: T) => void;
  disabled?: boolean;
  /** Keep the label for assistive tech only (compact toolbars). */
  hideLabel?: boolean;
  testID?: string;
}) {
  const [open, setOpen] = useState(false);
  const current = options.find((o) => o.value === value);
  return (
    <View style={styles.wrap}>
      {hideLabel ? null : <Text style={[type.label, { color: colors.text }]}>{label}</Text>}
      <Pressable
        role="button"
        accessibilityLabel={`${label}: ${current?.label ?? 'none chosen'}`}
        aria-expanded={open}
        aria-disabled={disabled}
        disabled={disabled}
        onPress={() => setOpen(true)}
        testID={testID}
        style={({ pressed }) => [styles.field, pressed && { backgroundColor: colors.surfaceMuted }, disabled && { opacity: 0.6 }]}
      >
        <Text numberOfLines={1} style={[type.body, styles.value]}>
          {current?.label ?? 'Choose…'}
        </Text>
        <Text style={[type.small, { color: colors.textMuted }]}>▾</Text>
      </Pressable>
      <Sheet open={open} title={label} onClose={() => setOpen(false)}>
        <View role="radiogroup" accessibilityLabel={label} style={styles.list}>
          {options.map((o) => {
            const selected = o.value === value;
            return (
              <Pressable
                key={o.value}
                role="radio"
                aria-checked={selected}
                accessibilityLabel={o.label}
                onPress={() => {
                  setOpen(false);
                  if (!selected) onChange(o.value);
                }}
                style={({ pressed }) => [styles.option, selected && styles.optionOn, pressed && { opacity: 0.8 }]}
              >
                <View style={[styles.dot, selected && styles.dotOn]} />
                <View style={styles.optionText}>
                  <Text style={[type.bodyStrong, { color: colors.text }]}>{o.label}</Text>
                  {o.description ? <Text style={[type.small, { color: colors.textMuted }]}>{o.description}</Text> : null}
                </View>
              </Pressable>
            );
          })}
        </View>
      </Sheet>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  field: {
    minHeight: TOUCH_TARGET,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    borderWidth: 1,
    borderColor: colors.borderStrong,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
  },
  value: { flex: 1, minWidth: 0, color: colors.text },
  list: { gap: space.sm },
  option: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    padding: space.md,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  optionOn: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  optionText: { flex: 1, gap: space.xxs },
  dot: { width: 18, height: 18, borderRadius: 9, borderWidth: 2, borderColor: colors.borderStrong },
  dotOn: { borderColor: colors.primary, backgroundColor: colors.primary },
});
