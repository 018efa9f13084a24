/**
 * Layout primitives: Screen (scrolling page with the background and a readable max width), PageHeader (title,
 * optional subtitle and actions that wrap on phones), Stack and Row (gaps from the spacing scale).
 */
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View, type StyleProp, type ViewStyle } from 'react-native';
import { colors, CONTENT_MAX_WIDTH, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

export function Screen({
  children,
  maxWidth = CONTENT_MAX_WIDTH,
  testID,
  scroll = true,
}: {
  children: ReactNode;
  maxWidth?: number;
  testID?: string;
  scroll?: boolean;
}) {
  const { isWide } = useBreakpoint();
  const inner = (
    <View style={[styles.inner, { maxWidth, padding: isWide ? space.xxl : space.lg }]} testID={testID}>
      {children}
    </View>
  );
  if (!scroll) return <View style={styles.fill}>{inner}</View>;
  return (
    <ScrollView style={styles.fill} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      {inner}
    </ScrollView>
  );
}

export function PageHeader({ title, subtitle, actions }: { title: string; subtitle?: string; actions?: ReactNode }) {
  return (
    <View style={styles.header}>
      <View style={styles.headerText}>
        <Text role="heading" aria-level={1} style={[type.title, { color: colors.text }]}>
          {title}
        </Text>
        {subtitle ? <Text style={[type.small, { color: colors.textMuted }]}>{subtitle}</Text> : null}
      </View>
      {actions ? <View style={styles.actions}>{actions}</View> : null}
    </View>
  );
}

type Gap = keyof typeof space;

export function Stack({ children, gap = 'lg', style }: { children: ReactNode; gap?: Gap; style?: StyleProp<ViewStyle> }) {
  return <View style={[{ gap: space[gap] }, style]}>{children}</View>;
}

export function Row({
  children,
  gap = 'md',
  wrap = true,
  align = 'center',
  style,
}: {
  children: ReactNode;
  gap?: Gap;
  wrap?: boolean;
  align?: ViewStyle['alignItems'];
  style?: StyleProp<ViewStyle>;
}) {
  return (
    <View style={[{ flexDirection: 'row', gap: space[gap], flexWrap: wrap ? 'wrap' : 'nowrap', alignItems: align }, style]}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.background },
  content: { flexGrow: 1 },
  inner: { width: '100%', alignSelf: 'center', gap: space.xl },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  headerText: { flexGrow: 1, flexShrink: 1, flexBasis: 220, gap: space.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
