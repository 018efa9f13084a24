/**
 * Two versions side by side (stacked on phones): each sheet marks what changed (bends and header stubs removed
 * from the earlier one, added to the later one, changed on both), then the key results with their differences and
 * the settings that differ, all in the user's units.
 */
import { useQuery } from '@tanstack/react-query';
import { Link } from 'expo-router';
import { useMemo } from 'react';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';
import { compareVersions, getVersion, versionKeys } from '@/lib/api/versions';
import type { CompareReply, VersionDetail } from '@/lib/schema/api-versions';
import type { UnitSystem } from '@/lib/units';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { messageOf } from '@/components/ui/form-errors';
import { PageHeader, Screen } from '@/components/ui/screen';
import { colors, fonts, space, type, TOUCH_TARGET } from '@/components/ui/theme';
import { useBreakpoint } from '@/components/ui/use-breakpoint';
import { useUnitSystem } from '@/components/ui/use-unit-system';
import { changeCount, compareHighlights } from '@/components/review/sheet-marks';
import { StaticSheet } from '@/components/review/static-sheet';
import { formatResultDifference, formatResultValue, resultFigureLabel } from '@/components/versions/format';
import { settingLabel, settingValue } from '@/components/versions/setting-format';
import { versionHref } from '@/components/versions/versions-screen';

export function CompareScreen({ a, b }: { a: string; b: string }) {
  const diff = useQuery({ queryKey: versionKeys.compare(a, b), queryFn: () => compareVersions(a, b) });
  const va = useQuery({ queryKey: versionKeys.one(a), queryFn: () => getVersion(a) });
  const vb = useQuery({ queryKey: versionKeys.one(b), queryFn: () => getVersion(b) });
  const error = diff.error ?? va.error ?? vb.error;
  if (error) {
    return (
      <Screen>
        <Banner tone="error" title="These versions could not be compared">
          {messageOf(error)}
        </Banner>
      </Screen>
    );
  }
  if (!diff.data || !va.data || !vb.data) {
    return (
      <Screen>
        <ActivityIndicator color={colors.primary} accessibilityLabel="Comparing the versions" />
      </Screen>
    );
  }
  return <CompareBody diff={diff.data} a={va.data} b={vb.data} />;
}

function CompareBody({ diff, a, b }: { diff: CompareReply; a: VersionDetail; b: VersionDetail }) {
  const { unitSystem } = useUnitSystem();
  const { isWide } = useBreakpoint();
  const counts = changeCount(diff);
  const highlightsA = useMemo(() => compareHighlights(diff, 'a'), [diff]);
  const highlightsB = useMemo(() => compareHighlights(diff, 'b'), [diff]);
  const nothing = counts.added + counts.removed + counts.changed === 0;
  return (
    <Screen maxWidth={1400}>
      <PageHeader title={`Version ${a.number} and version ${b.number}`} subtitle="What changed between the two designs" />
      <Text style={[type.body, { color: colors.text }]} testID="compare-counts">
        {nothing
          ? 'The circuiting is the same in both versions.'
          : `Circuiting: ${counts.added} added, ${counts.removed} removed, ${counts.changed} changed (bends and header connections).`}
      </Text>
      <View style={[styles.sheets, isWide ? styles.sheetsWide : null]}>
        <SheetCard version={a} highlights={highlightsA} side="a" />
        <SheetCard version={b} highlights={highlightsB} side="b" />
      </View>
      <ResultsTable diff={diff} a={a} b={b} system={unitSystem} />
      {diff.settings.length > 0 ? (
        <Card title="Settings that differ" testID="compare-settings">
          {diff.settings.map((s) => (
            <View key={s.path} style={styles.tableRow}>
              <Text style={[type.small, styles.labelCell]}>{settingLabel(s.path)}</Text>
              <View style={styles.valueCells}>
                <Text style={[type.number, styles.valueCell]}>{settingValue(s.path, s.a, unitSystem)}</Text>
                <Text style={[type.number, styles.valueCell]}>{settingValue(s.path, s.b, unitSystem)}</Text>
              </View>
            </View>
          ))}
        </Card>
      ) : null}
    </Screen>
  );
}

function SheetCard({ version, highlights, side }: { version: VersionDetail; highlights: ReturnType<typeof compareHighlights>; side: 'a' | 'b' }) {
  return (
    <Card title={`Version ${version.number}`} style={styles.sheetCard} testID={`compare-sheet-${side}`}>
      <Link href={versionHref(version.id)} style={styles.link}>
        <Text style={[type.small, { color: colors.primary }]} numberOfLines={2}>
          {version.message}
        </Text>
      </Link>
      <StaticSheet document={version.document} highlights={highlights} testID={`compare-${side}`} />
    </Card>
  );
}

function ResultsTable({ diff, a, b, system }: { diff: CompareReply; a: VersionDetail; b: VersionDetail; system: UnitSystem }) {
  return (
    <Card title="Key results" testID="compare-results">
      <View style={[styles.tableRow, styles.headRow]}>
        <Text style={[type.caption, styles.labelCell, styles.head]}>Figure</Text>
        <View style={styles.valueCells}>
          <Text style={[type.caption, styles.valueCell, styles.head]}>{`v${a.number}`}</Text>
          <Text style={[type.caption, styles.valueCell, styles.head]}>{`v${b.number}`}</Text>
          <Text style={[type.caption, styles.valueCell, styles.head]}>Difference</Text>
        </View>
      </View>
      {diff.results.map((r) => {
        const changed = r.difference !== null && formatResultDifference(r, system) !== 'no change';
        return (
          <View key={r.key} style={styles.tableRow} testID={`compare-result-${r.key}`}>
            <Text style={[type.small, styles.labelCell]}>{resultFigureLabel(r.key)}</Text>
            <View style={styles.valueCells}>
              <Text style={[type.number, styles.valueCell]}>{formatResultValue(r.key, r.a, system)}</Text>
              <Text style={[type.number, styles.valueCell]}>{formatResultValue(r.key, r.b, system)}</Text>
              <Text style={[type.number, styles.valueCell, changed ? styles.changed : styles.same]}>{formatResultDifference(r, system)}</Text>
            </View>
          </View>
        );
      })}
    </Card>
  );
}

const styles = StyleSheet.create({
  sheets: { gap: space.xl },
  sheetsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  sheetCard: { flex: 1, minWidth: 0 },
  link: { minHeight: TOUCH_TARGET, display: 'flex', alignItems: 'center' },
  tableRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.border },
  headRow: { borderTopWidth: 0 },
  head: { color: colors.textMuted, fontFamily: fonts.sansMedium },
  labelCell: { flexGrow: 1, flexBasis: 180, color: colors.text },
  valueCells: { flexDirection: 'row', flexGrow: 3, flexBasis: 300, gap: space.sm },
  valueCell: { flex: 1, color: colors.text, textAlign: 'right' },
  changed: { color: colors.accentStrong, fontFamily: fonts.monoMedium },
  same: { color: colors.textMuted },
});
