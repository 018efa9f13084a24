/** A raised surface grouping related content; optional title row. */
import type { ReactNode } from 'react';
import { StyleSheet, Text, View, type StyleProp, type ViewStyle } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';

export function Card({
  children,
  title,
  actions,
  style,
  testID,
  accessibilityLabel,
}: {
  children: ReactNode;
  title?: string;
  actions?: ReactNode;
  style?: StyleProp<ViewStyle>;
  testID?: string;
  accessibilityLabel?: string;
}) {
  return (
    <View style={[styles.card, style]} testID={testID} accessibilityLabel={accessibilityLabel}>
      {title || actions ? (
        <View style={styles.head}>
          {title ? (
            <Text role="heading" aria-level={2} style={[type.heading, styles.title]}>
              {title}
            </Text>
          ) : null}
          {actions}
        </View>
      ) : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderColor: colors.border,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.lg,
    gap: space.md,
  },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  title: { color: colors.text, flexShrink: 1 },
});
