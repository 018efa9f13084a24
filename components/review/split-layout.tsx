/**
 * Two columns on wide screens (the sheet and results beside the discussion), one stacked column on phones. `top`
 * (the version's message) heads the page on phones and the side column on wide screens.
 */
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

export function SplitLayout({ top, main, aside }: { top?: ReactNode; main: ReactNode; aside: ReactNode }) {
  const { isWide } = useBreakpoint();
  if (!isWide) {
    return (
      <View style={styles.stack}>
        {top}
        {main}
        {aside}
      </View>
    );
  }
  return (
    <View style={styles.row}>
      <View style={styles.main}>{main}</View>
      <View style={styles.aside}>
        {top}
        {aside}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.xl },
  row: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  main: { flex: 3, minWidth: 0, gap: space.xl },
  aside: { flex: 2, minWidth: 0, gap: space.xl },
});
