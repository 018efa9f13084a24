/**
 * The one button: primary (teal), accent (copper), secondary (outlined), danger and ghost variants.
 * While `loading` it shows a spinner, is disabled and says so to assistive tech (aria-busy).
 */
import type { ReactNode } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View, type StyleProp, type ViewStyle } from 'react-native';
import { colors, radius, space, type, TOUCH_TARGET } from '@/components/ui/theme';

export type ButtonVariant = 'primary' | 'accent' | 'secondary' | 'danger' | 'ghost';

export interface ButtonProps {
  label: string;
  onPress?: () => void;
  variant?: ButtonVariant;
  size?: 'md' | 'sm';
  loading?: boolean;
  disabled?: boolean;
  /** Defaults to `label`; give a fuller one when the label alone is ambiguous ("Delete" → "Delete project Foo"). */
  accessibilityLabel?: string;
  testID?: string;
  fullWidth?: boolean;
  icon?: ReactNode;
  style?: StyleProp<ViewStyle>;
}

const look: Record<ButtonVariant, { bg: string; bgPressed: string; fg: string; border: string }> = {
  primary: { bg: colors.primary, bgPressed: colors.primaryPressed, fg: colors.textOnDark, border: colors.primary },
  accent: { bg: colors.accent, bgPressed: colors.accentStrong, fg: '#FFFFFF', border: colors.accent },
  secondary: { bg: colors.surface, bgPressed: colors.surfaceMuted, fg: colors.text, border: colors.borderStrong },
  danger: { bg: colors.danger, bgPressed: '#7F1F17', fg: '#FFFFFF', border: colors.danger },
  ghost: { bg: 'transparent', bgPressed: colors.surfaceMuted, fg: colors.primary, border: 'transparent' },
};

export function Button({
  label,
  onPress,
  variant = 'primary',
  size = 'md',
  loading = false,
  disabled = false,
  accessibilityLabel,
  testID,
  fullWidth = false,
  icon,
  style,
}: ButtonProps) {
  const v = look[variant];
  const inactive = disabled || loading;
  return (
    <Pressable
      role="button"
      accessibilityLabel={accessibilityLabel ?? label}
      aria-disabled={inactive}
      aria-busy={loading}
      disabled={inactive}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [
        styles.base,
        size === 'sm' ? styles.sm : styles.md,
        { backgroundColor: pressed ? v.bgPressed : v.bg, borderColor: v.border },
        fullWidth && styles.fullWidth,
        inactive && styles.inactive,
        style,
      ]}
    >
      <View style={styles.row}>
        {loading ? <ActivityIndicator size="small" color={v.fg} accessibilityLabel="Working" /> : icon}
        <Text style={[size === 'sm' ? type.smallStrong : type.bodyStrong, styles.label, { color: v.fg }]} numberOfLines={1}>
          {label}
        </Text>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    borderRadius: radius.sm,
    borderWidth: 1,
    alignItems: 'center',
    justifyContent: 'center',
    flexShrink: 1,
  },
  md: { minHeight: TOUCH_TARGET, paddingHorizontal: space.lg },
  sm: { minHeight: 36, paddingHorizontal: space.md },
  fullWidth: { alignSelf: 'stretch' },
  inactive: { opacity: 0.6 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { textAlign: 'center', flexShrink: 1 },
});
