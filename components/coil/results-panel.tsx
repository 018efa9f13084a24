/**
 * Results beside (wide) or under a tab (phone): status (solving, stale, invalid), totals, the per-circuit table,
 * warnings (tap one to highlight its tubes and circuits on the sheet) and the turndown chart. Numbers are
 * right-aligned in the mono face and carry units in the user's system.
 */
import { memo, type ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { Banner } from '@/components/ui/banner';
import { useBreakpoint } from '@/components/ui/use-breakpoint';
import { colors, radius, space, type } from '@/components/ui/theme';
import { formatNumber, formatQuantity, unitLabel, type QuantityKind, type UnitSystem } from '@/lib/units';
import type { CircuitResult, ResultWarning, SolveResult, TopologyError, TubeRef } from '@/lib/engine/types';
import { BillOfMaterialsTable } from './bill-of-materials-table';
import { TurndownChart } from './turndown-chart';
import type { LiveSolve } from './use-live-solve';

const q = (kind: QuantityKind, v: number | undefined, system: UnitSystem) => (v === undefined ? '—' : formatQuantity(kind, v, system).label);

function Figure({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.figure}>
      <Text style={[type.caption, { color: colors.textMuted }]}>{label}</Text>
      <Text style={[type.number, styles.figureValue]} testID={testID}>
        {value}
      </Text>
    </View>
  );
}

export const Totals = memo(function Totals({ result, system }: { result: SolveResult; system: UnitSystem }) {
  const t = result.totals;
  return (
    <View style={styles.figures} testID="results-totals">
      <Figure label={t.mode === 'heating' ? 'Heating capacity' : 'Total capacity'} value={q('power', t.capacity_W, system)} testID="total-capacity" />
      {t.mode === 'cooling' ? <Figure label="Sensible" value={q('power', t.sensibleCapacity_W, system)} /> : null}
      {t.mode === 'cooling' ? <Figure label="Latent" value={q('power', t.latentCapacity_W, system)} /> : null}
      <Figure label="Leaving air dry bulb" value={q('temperature', t.leavingAirDryBulb_C, system)} />
      {t.leavingAirWetBulb_C !== undefined ? <Figure label="Leaving air wet bulb" value={q('temperature', t.leavingAirWetBulb_C, system)} /> : null}
      <Figure label="Leaving water" value={q('temperature', t.leavingWaterTemperature_C, system)} />
      <Figure label="Water pressure drop" value={q('waterPressureDrop', t.waterPressureDrop_Pa, system)} testID="total-water-dp" />
      <Figure label={t.airPressureDropIsWetEstimate ? 'Air pressure drop (wet, estimate)' : 'Air pressure drop'} value={q('airPressureDrop', t.airPressureDrop_Pa, system)} />
      {t.condensate_kg_s ? <Figure label="Condensate" value={q('massFlow', t.condensate_kg_s, system)} /> : null}
      <Figure label="Circuits" value={String(t.circuitCount)} />
    </View>
  );
});

const COLS: { key: string; title: string; kind?: QuantityKind; width: number }[] = [
  { key: 'index', title: '#', width: 28 },
  { key: 'passes', title: 'Passes', width: 50 },
  { key: 'arrangement', title: 'Arrangement', width: 100 },
  { key: 'flow', title: 'Flow', kind: 'massFlow', width: 58 },
  { key: 'velocity', title: 'Velocity', kind: 'velocity', width: 60 },
  { key: 're', title: 'Re', width: 54 },
  { key: 'regime', title: 'Regime', width: 92 },
  { key: 'dp', title: 'Δp', kind: 'waterPressureDrop', width: 64 },
  { key: 'leaving', title: 'Leaving', kind: 'temperature', width: 58 },
];

const arrangementWords: Record<CircuitResult['arrangement'], string> = {
  counterflow: 'counterflow',
  parallel: 'parallel flow',
  mixed: 'mixed',
  'single-row': 'single row',
};

function cell(c: CircuitResult, key: string, system: UnitSystem): string {
  const n = (kind: QuantityKind, v: number | undefined) => (v === undefined ? '—' : formatQuantity(kind, v, system).text);
  switch (key) {
    case 'index':
      return String(c.index);
    case 'passes':
      return String(c.passes);
    case 'arrangement':
      return arrangementWords[c.arrangement];
    case 'flow':
      return n('massFlow', c.massFlow_kg_s);
    case 'velocity':
      return n('velocity', c.velocity_m_s);
    case 're':
      return c.reynolds === undefined ? '—' : formatNumber(c.reynolds, 0);
    case 'regime':
      return c.regime ?? '—';
    case 'dp':
      return n('waterPressureDrop', c.pressureDrop_Pa);
    case 'leaving':
      return n('temperature', c.leavingTemperature_C);
    default:
      return '';
  }
}

/** Phones: one card per circuit, so no column scrolls out of sight. */
function CircuitCards({ circuits, system, onSelect }: { circuits: CircuitResult[]; system: UnitSystem; onSelect: (index: number) => void }) {
  const figures = COLS.filter((c) => !['index', 'passes', 'arrangement'].includes(c.key));
  return (
    <View style={styles.cards} testID="circuit-table">
      {circuits.map((c) => (
        <Pressable
          key={c.index}
          role="button"
          accessibilityLabel={`Show circuit ${c.index} on the sheet`}
          onPress={() => onSelect(c.index)}
          style={({ pressed }) => [styles.card, pressed && { backgroundColor: colors.surfaceMuted }]}
          testID={`circuit-row-${c.index}`}
        >
          <Text style={[type.smallStrong, { color: colors.text }]}>
            {`Circuit ${c.index} · ${c.passes} passes · ${arrangementWords[c.arrangement]}`}
          </Text>
          <View style={styles.cardFigures}>
            {figures.map((col) => (
              <View key={col.key} style={styles.cardFigure}>
                <Text style={[type.caption, { color: colors.textMuted }]} numberOfLines={1}>
                  {col.kind ? `${col.title} (${unitLabel(col.kind, system)})` : col.title}
                </Text>
                <Text style={[col.key === 'regime' ? type.small : type.number, { color: colors.text }]} numberOfLines={1}>
                  {cell(c, col.key, system)}
                </Text>
              </View>
            ))}
          </View>
        </Pressable>
      ))}
    </View>
  );
}

export const CircuitTable = memo(function CircuitTable({ circuits, system, onSelect }: { circuits: CircuitResult[]; system: UnitSystem; onSelect: (index: number) => void }) {
  const { isWide } = useBreakpoint();
  if (!isWide) return <CircuitCards circuits={circuits} system={system} onSelect={onSelect} />;
  const textCols = new Set(['arrangement', 'regime']);
  const [first, ...rest] = COLS;
  const header = (cols: typeof COLS) => (
    <View style={[styles.tr, styles.th]}>
      {cols.map((col) => (
        <View key={col.key} style={[{ width: col.width }, textCols.has(col.key) && styles.textCol]}>
          <Text style={[type.caption, styles.thText, !textCols.has(col.key) && styles.right]}>{col.title}</Text>
          <Text style={[type.caption, styles.unit, !textCols.has(col.key) && styles.right]}>{col.kind ? unitLabel(col.kind, system) : ' '}</Text>
        </View>
      ))}
    </View>
  );
  const row = (c: CircuitResult, cols: typeof COLS, testID?: string) => (
    <Pressable
      key={c.index}
      role="button"
      accessibilityLabel={`Show circuit ${c.index} on the sheet`}
      onPress={() => onSelect(c.index)}
      style={({ pressed }) => [styles.tr, styles.trBody, pressed && { backgroundColor: colors.surfaceMuted }]}
      testID={testID}
    >
      {cols.map((col) => (
        <Text key={col.key} style={[textCols.has(col.key) ? [type.small, styles.textCol] : type.number, { width: col.width, color: colors.text }, !textCols.has(col.key) && styles.right]} numberOfLines={1}>
          {cell(c, col.key, system)}
        </Text>
      ))}
    </Pressable>
  );
  // The circuit number stays put while the figures scroll sideways when the panel is narrower than the table.
  return (
    <View style={styles.tableWrap} testID="circuit-table">
      <View style={styles.stickyCol}>
        {header([first])}
        {circuits.map((c) => row(c, [first]))}
      </View>
      <ScrollView horizontal style={styles.tableScroll} contentContainerStyle={styles.table}>
        <View>
          {header(rest)}
          {circuits.map((c) => row(c, rest, `circuit-row-${c.index}`))}
        </View>
      </ScrollView>
    </View>
  );
});

const severityTone = { critical: colors.danger, warning: colors.warning, info: colors.primary } as const;

export function IssueList({
  errors,
  warnings,
  onSelect,
}: {
  errors: TopologyError[];
  warnings: ResultWarning[];
  onSelect: (tubes: TubeRef[], circuits: number[]) => void;
}) {
  if (errors.length === 0 && warnings.length === 0) return <Text style={[type.small, { color: colors.textMuted }]}>No warnings.</Text>;
  return (
    <View style={styles.issues} testID="issue-list">
      {errors.map((e, i) => (
        <Pressable key={`e${i}`} role="button" onPress={() => onSelect(e.tubes ?? [], [])} style={[styles.issue, { borderLeftColor: colors.danger }]} testID={`error-${e.code}`} accessibilityLabel={`Error: ${e.message}. Show on the sheet`}>
          <Text style={[type.smallStrong, { color: colors.danger }]}>Error</Text>
          <Text style={[type.small, { color: colors.text }]}>{e.message}</Text>
        </Pressable>
      ))}
      {warnings.map((w, i) => (
        <Pressable key={`w${i}`} role="button" onPress={() => onSelect(w.tubes ?? [], w.circuits ?? [])} style={[styles.issue, { borderLeftColor: severityTone[w.severity] }]} testID={`warning-${w.code}`} accessibilityLabel={`${w.severity}: ${w.message}. Show on the sheet`}>
          <Text style={[type.smallStrong, { color: severityTone[w.severity] }]}>{w.severity === 'critical' ? 'Critical' : w.severity === 'warning' ? 'Warning' : 'Note'}</Text>
          <Text style={[type.small, { color: colors.text }]}>{w.message}</Text>
        </Pressable>
      ))}
    </View>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Text role="heading" aria-level={3} style={[type.smallStrong, styles.sectionTitle]}>
        {title}
      </Text>
      {children}
    </View>
  );
}

export function ResultsPanel({
  live,
  system,
  onSelectIssue,
  onSelectCircuit,
}: {
  live: LiveSolve;
  system: UnitSystem;
  onSelectIssue: (tubes: TubeRef[], circuits: number[]) => void;
  onSelectCircuit: (index: number) => void;
}) {
  const { topology, result, fresh, documentIssues } = live;
  const invalid = !topology.valid || documentIssues.length > 0;
  const warnings = fresh && result ? result.warnings : topology.warnings;
  return (
    <View style={styles.panel} testID="results-panel">
      {documentIssues.length > 0 ? (
        <Banner tone="error" title="Some values need fixing">{documentIssues.map((i) => i.message).join('; ')}</Banner>
      ) : null}
      {!topology.valid ? (
        <Banner tone="error" title="The circuiting is not complete">{`${topology.errors.length} problem${topology.errors.length === 1 ? '' : 's'} on the sheet; fix them to see performance.`}</Banner>
      ) : null}
      {live.error && !invalid ? <Banner tone="error" title="The solve failed">{live.error}</Banner> : null}
      {result && result.valid ? (
        // Kept mounted but hidden while the drawing is invalid (never old numbers on screen), so mending the
        // drawing does not rebuild the whole table.
        <View
          style={[styles.stack, !fresh && styles.stale, invalid && styles.hidden]}
          testID={invalid ? undefined : fresh ? 'results-fresh' : 'results-stale'}
          {...({ dataSet: { solveVersion: String(live.resultVersion) } } as object)}
        >
          {!fresh ? (
            <Text style={[type.smallStrong, styles.staleTag]} testID="results-stale-tag">
              Updating: these figures are for the previous drawing
            </Text>
          ) : null}
          <Section title="Coil">
            <Totals result={result} system={system} />
          </Section>
          <Section title="Circuits">
            <CircuitTable circuits={result.circuits} system={system} onSelect={onSelectCircuit} />
          </Section>
          {result.billOfMaterials ? (
            <Section title="Bill of materials">
              <BillOfMaterialsTable bom={result.billOfMaterials} system={system} />
            </Section>
          ) : null}
          {result.turndown && result.turndown.length > 1 ? (
            <Section title="Turndown">
              <TurndownChart points={result.turndown} system={system} />
            </Section>
          ) : null}
        </View>
      ) : null}
      {!invalid && !(result && result.valid) ? <Text style={[type.small, { color: colors.textMuted }]}>Solving…</Text> : null}
      <Section title={invalid ? 'Problems' : 'Warnings'}>
        <IssueList errors={topology.errors} warnings={warnings} onSelect={onSelectIssue} />
      </Section>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.lg },
  stack: { gap: space.lg },
  stale: { opacity: 0.55 },
  hidden: { display: 'none' },
  staleTag: { color: colors.warning },
  section: { gap: space.sm },
  sectionTitle: { color: colors.textMuted, textTransform: 'uppercase', letterSpacing: 0.6 },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  figure: { flexGrow: 1, flexBasis: 140, padding: space.sm, borderRadius: radius.sm, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border },
  figureValue: { textAlign: 'right', color: colors.text, fontSize: 16 },
  tableWrap: { flexDirection: 'row' },
  stickyCol: { borderRightWidth: 1, borderRightColor: colors.border, paddingRight: space.xs },
  tableScroll: { flexGrow: 1, flexShrink: 1 },
  trBody: { height: 32 },
  table: { paddingBottom: space.xs },
  tr: { flexDirection: 'row', gap: space.xs, paddingVertical: space.xs, paddingLeft: space.xxs, borderBottomWidth: 1, borderBottomColor: colors.border, alignItems: 'center' },
  th: { borderBottomColor: colors.borderStrong },
  thText: { color: colors.text, fontWeight: '600' },
  unit: { color: colors.textMuted },
  right: { textAlign: 'right' },
  textCol: { paddingLeft: space.sm },
  cards: { gap: space.sm },
  card: { padding: space.sm, gap: space.xs, borderRadius: radius.sm, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border },
  cardFigures: { flexDirection: 'row', flexWrap: 'wrap', rowGap: space.xs, columnGap: space.md },
  cardFigure: { flexBasis: 96, flexGrow: 1 },
  issues: { gap: space.xs },
  issue: { borderLeftWidth: 4, paddingLeft: space.sm, paddingVertical: space.xs, backgroundColor: colors.surface, borderRadius: 2 },
});
