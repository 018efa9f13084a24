/** An inline message: a request failure, a success note, a warning. Errors are announced (role alert). */
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';

export type BannerTone = 'error' | 'success' | 'info' | 'warning';

const tones: Record<BannerTone, { bg: string; fg: string; bar: string }> = {
  error: { bg: colors.dangerSoft, fg: colors.danger, bar: colors.danger },
  success: { bg: colors.successSoft, fg: colors.success, bar: colors.success },
  info: { bg: colors.primarySoft, fg: colors.primaryPressed, bar: colors.primary },
  warning: { bg: colors.warningSoft, fg: colors.warning, bar: colors.warning },
};

export function Banner({
  tone = 'info',
  title,
  children,
  testID,
}: {
  tone?: BannerTone;
  title?: string;
  children?: ReactNode;
  testID?: string;
}) {
  const t = tones[tone];
  return (
    <View
      role={tone === 'error' ? 'alert' : 'status'}
      aria-live={tone === 'error' ? 'assertive' : 'polite'}
      style={[styles.box, { backgroundColor: t.bg, borderLeftColor: t.bar }]}
      testID={testID}
    >
      {title ? <Text style={[type.bodyStrong, { color: t.fg }]}>{title}</Text> : null}
      {typeof children === 'string' ? <Text style={[type.small, { color: t.fg }]}>{children}</Text> : children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radius.sm, borderLeftWidth: 4, paddingVertical: space.md, paddingHorizontal: space.lg, gap: space.xs },
});
