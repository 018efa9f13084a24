/** The headline results of a solved version, every number with its unit, and the solver's warnings and errors. */
import { StyleSheet, Text, View } from 'react-native';
import type { SolveResult } from '@/lib/engine/types';
import { formatQuantity, type QuantityKind, type UnitSystem } from '@/lib/units';
import { Banner } from '@/components/ui/banner';
import { Card } from '@/components/ui/card';
import { colors, radius, space, type } from '@/components/ui/theme';

interface Figure {
  label: string;
  kind: QuantityKind | null;
  value: number | undefined;
}

function figures(result: SolveResult): Figure[] {
  const t = result.totals;
  const list: Figure[] = [
    { label: t.mode === 'heating' ? 'Heating capacity' : 'Total capacity', kind: 'power', value: t.capacity_W },
    { label: 'Sensible', kind: 'power', value: t.mode === 'heating' ? undefined : t.sensibleCapacity_W },
    { label: 'Latent', kind: 'power', value: t.mode === 'heating' ? undefined : t.latentCapacity_W },
    { label: 'Water pressure drop', kind: 'waterPressureDrop', value: t.waterPressureDrop_Pa },
    { label: 'Air pressure drop', kind: 'airPressureDrop', value: t.airPressureDrop_Pa },
    { label: 'Leaving air dry bulb', kind: 'temperature', value: t.leavingAirDryBulb_C },
    { label: 'Leaving water', kind: 'temperature', value: t.leavingWaterTemperature_C },
    { label: 'Circuits', kind: null, value: t.circuitCount },
  ];
  return list.filter((f) => f.value !== undefined && Number.isFinite(f.value));
}

const SEVERITY_WORD = { info: 'Note', warning: 'Warning', critical: 'Critical' } as const;

export function ResultsSummary({ result, system, testID = 'results-summary' }: { result: SolveResult; system: UnitSystem; testID?: string }) {
  return (
    <Card title="Results" testID={testID}>
      {!result.valid ? (
        <Banner tone="error" title="The circuiting of this version is not complete">
          <View style={styles.list}>
            {result.errors.map((e, i) => (
              <Text key={`${e.code}-${i}`} style={[type.small, { color: colors.danger }]}>
                {e.message}
              </Text>
            ))}
          </View>
        </Banner>
      ) : null}
      <View style={styles.grid}>
        {figures(result).map((f) => (
          <View key={f.label} style={styles.figure}>
            <Text style={[type.caption, { color: colors.textMuted }]}>{f.label}</Text>
            <Text style={[type.numberLarge, { color: colors.text }]} testID={`figure-${f.label}`}>
              {f.kind === null ? String(f.value) : formatQuantity(f.kind, f.value!, system).label}
            </Text>
          </View>
        ))}
      </View>
      {result.warnings.length > 0 ? (
        <View style={styles.list} testID={`${testID}-warnings`}>
          <Text style={[type.smallStrong, { color: colors.text }]}>{`${result.warnings.length} ${result.warnings.length === 1 ? 'warning' : 'warnings'}`}</Text>
          {result.warnings.map((w, i) => (
            <View key={`${w.code}-${i}`} style={[styles.warning, w.severity === 'critical' ? styles.critical : w.severity === 'info' ? styles.info : null]}>
              <Text style={[type.caption, styles.severity]}>{SEVERITY_WORD[w.severity]}</Text>
              <Text style={[type.small, { color: colors.text, flexShrink: 1 }]}>{w.message}</Text>
            </View>
          ))}
        </View>
      ) : result.valid ? (
        <Text style={[type.small, { color: colors.textMuted }]}>No warnings.</Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  figure: {
    flexGrow: 1,
    flexBasis: 150,
    minWidth: 140,
    padding: space.md,
    borderRadius: radius.sm,
    backgroundColor: colors.surfaceStripe,
    borderWidth: 1,
    borderColor: colors.border,
    gap: space.xxs,
  },
  list: { gap: space.xs },
  warning: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-start', padding: space.sm, borderRadius: radius.sm, backgroundColor: colors.warningSoft },
  critical: { backgroundColor: colors.dangerSoft },
  info: { backgroundColor: colors.primarySoft },
  severity: { fontFamily: type.smallStrong.fontFamily, color: colors.text, minWidth: 56 },
});
