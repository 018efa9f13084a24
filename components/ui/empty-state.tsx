/** What an empty list says: what will live here and the one action that starts it. */
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';

export function EmptyState({
  title,
  message,
  action,
  illustration,
  testID,
}: {
  title: string;
  message: string;
  action?: ReactNode;
  illustration?: ReactNode;
  testID?: string;
}) {
  return (
    <View style={styles.box} testID={testID}>
      {illustration}
      <Text role="heading" aria-level={2} style={[type.heading, styles.title]}>
        {title}
      </Text>
      <Text style={[type.body, styles.message]}>{message}</Text>
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.xxl,
    paddingHorizontal: space.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.borderStrong,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
  },
  title: { color: colors.text, textAlign: 'center' },
  message: { color: colors.textMuted, textAlign: 'center', maxWidth: 460 },
});
