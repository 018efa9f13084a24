/**
 * Frame of the public account pages. It says what Tubeloom is before asking for anything: on wide screens a dark
 * panel beside the form, on phones a short introduction above it.
 */
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { Brand } from '@/components/shell/brand';
import { colors, FORM_MAX_WIDTH, palette, radius, space, type } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';

const POINTS: readonly { title: string; text: string }[] = [
  { title: 'Draw the circuits', text: 'Join tubes with hairpins and return bends right on the tube sheet, feed by feed.' },
  {
    title: 'See the water side as you draw',
    text: 'Velocity, Reynolds number, pressure drop and capacity update with every bend.',
  },
  { title: 'Keep versions', text: 'Every saved design stays, so you can compare and go back.' },
  { title: 'Share for review', text: 'Send a link; reviewers comment without changing your drawing.' },
];

function Pitch({ wide }: { wide: boolean }) {
  const fg = colors.textOnDark;
  const muted = colors.textOnDarkMuted;
  return (
    <View style={wide ? styles.pitchWide : styles.pitchPhone} testID="product-pitch">
      <Brand size={wide ? 'lg' : 'md'} />
      <Text role="heading" aria-level={2} style={[wide ? type.display : type.heading, { color: fg }]}>
        Circuit finned-tube coils on the tube sheet.
      </Text>
      <Text style={[wide ? type.body : type.small, { color: muted }]}>
        Tubeloom is for the people who lay out the water circuits of heating and cooling coils.
      </Text>
      {wide ? (
        <View style={styles.points}>
          {POINTS.map((p) => (
            <View key={p.title} style={styles.point}>
              <View style={styles.bullet} />
              <View style={styles.pointText}>
                <Text style={[type.bodyStrong, { color: fg }]}>{p.title}</Text>
                <Text style={[type.small, { color: muted }]}>{p.text}</Text>
              </View>
            </View>
          ))}
        </View>
      ) : (
        <Text style={[type.small, { color: fg }]}>
          Draw circuits · get velocity, Reynolds number, pressure drop and capacity as you draw · keep versions · share for
          review.
        </Text>
      )}
    </View>
  );
}

export function AuthLayout({ title, subtitle, children }: { title: string; subtitle?: string; children: ReactNode }) {
  const { isWide } = useBreakpoint();
  const form = (
    <View style={[styles.formCol, isWide && styles.formColWide]}>
      <View style={styles.form}>
        <View style={styles.titles}>
          <Text role="heading" aria-level={1} style={[type.title, { color: colors.text }]}>
            {title}
          </Text>
          {subtitle ? <Text style={[type.body, { color: colors.textMuted }]}>{subtitle}</Text> : null}
        </View>
        {children}
      </View>
    </View>
  );
  if (isWide) {
    return (
      <View style={styles.wideRoot}>
        <ScrollView style={styles.pitchCol} contentContainerStyle={styles.pitchColContent}>
          <Pitch wide />
        </ScrollView>
        <ScrollView style={styles.fill} contentContainerStyle={styles.centerContent} keyboardShouldPersistTaps="handled">
          {form}
        </ScrollView>
      </View>
    );
  }
  return (
    <ScrollView style={styles.fill} contentContainerStyle={styles.phoneContent} keyboardShouldPersistTaps="handled">
      <Pitch wide={false} />
      {form}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.background },
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.background },
  pitchCol: { flexBasis: '44%', flexGrow: 0, flexShrink: 0, backgroundColor: colors.chrome },
  pitchColContent: { flexGrow: 1, justifyContent: 'center', padding: space.xxxl },
  pitchWide: { gap: space.xl, maxWidth: 520 },
  pitchPhone: {
    gap: space.sm,
    backgroundColor: colors.chrome,
    paddingHorizontal: space.lg,
    paddingTop: space.xl,
    paddingBottom: space.xl,
    borderBottomWidth: 4,
    borderBottomColor: palette.copper500,
  },
  points: { gap: space.lg },
  point: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  bullet: { width: 10, height: 10, marginTop: 7, borderRadius: radius.pill, backgroundColor: palette.copper500 },
  pointText: { flex: 1, gap: space.xxs },
  centerContent: { flexGrow: 1, justifyContent: 'center' },
  phoneContent: { flexGrow: 1 },
  formCol: { padding: space.lg, alignItems: 'center' },
  formColWide: { padding: space.xxxl },
  form: { width: '100%', maxWidth: FORM_MAX_WIDTH, gap: space.lg },
  titles: { gap: space.xs },
});
