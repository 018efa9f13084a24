/** A small set of mutually exclusive choices shown side by side (a radio group to assistive tech). */
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';

export interface Choice<T extends string> {
  value: T;
  label: string;
  /** Longer accessible name, e.g. "SI units (metre, pascal, watt)". */
  accessibilityLabel?: string;
}

export function SegmentedControl<T extends string>({
  label,
  value,
  options,
  onChange,
  disabled = false,
  testID,
}: {
  /** Accessible name of the group. */
  label: string;
  value: T;
  options: readonly Choice<T>[];
  onChange: (next: T) => void;
  disabled?: boolean;
  testID?: string;
}) {
  return (
    <View role="radiogroup" accessibilityLabel={label} style={styles.group} testID={testID}>
      {options.map((o) => {
        const selected = o.value === value;
        return (
          <Pressable
            key={o.value}
            role="radio"
            aria-checked={selected}
            aria-disabled={disabled}
            accessibilityLabel={o.accessibilityLabel ?? o.label}
            disabled={disabled}
            onPress={() => !selected && onChange(o.value)}
            style={[styles.item, selected && styles.itemOn, disabled && styles.disabled]}
          >
            <Text numberOfLines={1} style={[type.smallStrong, { color: selected ? colors.textOnDark : colors.text }]}>
              {o.label}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  group: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignSelf: 'flex-start',
    maxWidth: '100%',
    borderWidth: 1,
    borderColor: colors.borderStrong,
    borderRadius: radius.sm,
    backgroundColor: colors.surface,
    padding: space.xxs,
    gap: space.xxs,
  },
  item: { minHeight: 36, paddingHorizontal: space.md, justifyContent: 'center', borderRadius: radius.sm - 2, flexShrink: 1 },
  itemOn: { backgroundColor: colors.primary },
  disabled: { opacity: 0.6 },
});
