/** Layout helpers shared by the coil forms: titled groups and side-by-side field pairs that stack on narrow panels. */
import { Children, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '@/components/ui/theme';

export function FieldGroup({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.group}>
      <Text role="heading" aria-level={3} style={[type.smallStrong, styles.groupTitle]}>
        {title}
      </Text>
      {children}
    </View>
  );
}

export function Pair({ children }: { children: ReactNode }) {
  return (
    <View style={styles.pair}>
      {Children.toArray(children).map((c, i) => (
        <View key={i} style={styles.cell}>
          {c}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.md },
  groupTitle: { color: colors.textMuted, textTransform: 'uppercase', letterSpacing: 0.6 },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexShrink: 1, flexBasis: 140, minWidth: 0 },
});
