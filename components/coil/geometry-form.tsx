/**
 * The geometry form: tube size (filling wall and pitches), rows, tubes high, finned length, pitches, fins. Every
 * field is editable in the user's units; each committed field is one command (one undo step).
 */
import { StyleSheet, View } from 'react-native';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { space } from '@/components/ui/theme';
import { useEditor } from '@/canvas/use-editor';
import type { EditorStore } from '@/canvas/store';
import { INCH_m, type UnitSystem } from '@/lib/units';
import { FieldGroup, Pair } from './form-layout';
import { NumberField, QuantityField } from './number-field';
import { COMMON_FPI, CONDUCTIVITY_IP_W_mK, TUBE_SIZES, tubeSizeOf } from './tube-sizes';

export function GeometryForm({ store, system, fieldErrors }: { store: EditorStore; system: UnitSystem; fieldErrors: Record<string, string> }) {
  const g = useEditor(store, (s) => s.document.geometry);
  const set = store.getState().dispatch;
  const size = tubeSizeOf(g.tubeOuterDiameter_m);
  const fpi = INCH_m / g.fin.pitch_m;
  const kUnit = system === 'si' ? 'W/(m·K)' : 'Btu/(h·ft·°F)';
  const kTo = (si: number) => (system === 'si' ? si : si / CONDUCTIVITY_IP_W_mK);
  const kFrom = (d: number) => (system === 'si' ? d : d * CONDUCTIVITY_IP_W_mK);
  const err = (path: string) => fieldErrors[`geometry.${path}`] ?? null;

  return (
    <View style={styles.form} testID="geometry-form">
      <FieldGroup title="Tube">
        <SegmentedControl
          label="Tube size"
          value={size?.id ?? 'custom'}
          options={[...TUBE_SIZES.map((t) => ({ value: t.id, label: t.label })), ...(size ? [] : [{ value: 'custom', label: 'Custom' }])]}
          onChange={(id) => {
            const t = TUBE_SIZES.find((x) => x.id === id);
            if (t) set('setGeometry', { tubeOuterDiameter_m: t.outerDiameter_m, tubeWall_m: t.wall_m, transversePitch_m: t.transversePitch_m, rowPitch_m: t.rowPitch_m }, { label: 'Tube size' });
          }}
          testID="tube-size"
        />
        <Pair>
          <QuantityField label="Outside diameter" kind="smallLength" system={system} valueSI={g.tubeOuterDiameter_m} minSI={0.005} maxSI={0.0254} onCommitSI={(v) => set('setGeometry', { tubeOuterDiameter_m: v })} error={err('tubeOuterDiameter_m')} testID="geometry-od" />
          <QuantityField label="Wall" kind="smallLength" system={system} valueSI={g.tubeWall_m} minSI={0.0002} maxSI={0.002} onCommitSI={(v) => set('setGeometry', { tubeWall_m: v })} error={err('tubeWall_m')} testID="geometry-wall" />
        </Pair>
        <NumberField label="Tube conductivity" value={kTo(g.tubeConductivity_W_mK)} unit={kUnit} decimals={0} onCommit={(d) => set('setGeometry', { tubeConductivity_W_mK: kFrom(d) })} error={err('tubeConductivity_W_mK')} />
      </FieldGroup>
      <FieldGroup title="Size">
        <Pair>
          <NumberField label="Rows" value={g.rows} unit="rows" decimals={0} integer check={(n) => (n < 1 || n > 12 ? '1 to 12 rows' : null)} onCommit={(n) => set('setGeometry', { rows: n })} testID="geometry-rows" />
          <NumberField label="Tubes high" value={g.tubesPerRow} unit="tubes" decimals={0} integer check={(n) => (n < 1 || n > 80 ? '1 to 80 tubes' : null)} onCommit={(n) => set('setGeometry', { tubesPerRow: n })} testID="geometry-tubes" />
        </Pair>
        <QuantityField label="Finned length" kind="length" system={system} valueSI={g.finnedLength_m} minSI={0.1} maxSI={5} onCommitSI={(v) => set('setGeometry', { finnedLength_m: v })} error={err('finnedLength_m')} testID="geometry-length" />
        <Pair>
          <QuantityField label="Tube pitch (face)" kind="smallLength" system={system} valueSI={g.transversePitch_m} minSI={0.01} maxSI={0.08} onCommitSI={(v) => set('setGeometry', { transversePitch_m: v })} error={err('transversePitch_m')} testID="geometry-pt" />
          <QuantityField label="Row pitch (depth)" kind="smallLength" system={system} valueSI={g.rowPitch_m} minSI={0.008} maxSI={0.08} onCommitSI={(v) => set('setGeometry', { rowPitch_m: v })} error={err('rowPitch_m')} testID="geometry-pl" />
        </Pair>
      </FieldGroup>
      <FieldGroup title="Fins">
        <SegmentedControl
          label="Fin type"
          value={g.fin.type}
          options={[
            { value: 'plain', label: 'Plain' },
            { value: 'wavy', label: 'Wavy' },
          ]}
          onChange={(type) =>
            set('setGeometry', type === 'wavy' ? { fin: { type, waveDepth_m: g.fin.waveDepth_m ?? 0.0015, waveHalfLength_m: g.fin.waveHalfLength_m ?? 0.00318 } } : { fin: { type } }, { label: 'Fin type' })
          }
        />
        <SegmentedControl
          label="Common fin densities"
          value={COMMON_FPI.find((n) => Math.abs(n - fpi) < 0.01)?.toString() ?? 'other'}
          options={[...COMMON_FPI.map((n) => ({ value: String(n), label: `${n} FPI`, accessibilityLabel: `${n} fins per inch` })), { value: 'other', label: 'Other' }]}
          onChange={(v) => v !== 'other' && set('setGeometry', { fin: { pitch_m: INCH_m / Number(v) } }, { label: 'Fin density' })}
        />
        <Pair>
          <NumberField label="Fins per inch" value={fpi} unit="FPI" decimals={1} check={(n) => (n < 2 || n > 25 ? '2 to 25 fins per inch' : null)} onCommit={(n) => set('setGeometry', { fin: { pitch_m: INCH_m / n } })} error={err('fin.pitch_m')} testID="geometry-fpi" />
          <QuantityField label="Fin thickness" kind="smallLength" system={system} valueSI={g.fin.thickness_m} decimals={system === 'si' ? 3 : 4} minSI={0.00005} maxSI={0.001} onCommitSI={(v) => set('setGeometry', { fin: { thickness_m: v } })} error={err('fin.thickness_m')} />
        </Pair>
        <NumberField label="Fin conductivity" value={kTo(g.fin.conductivity_W_mK)} unit={kUnit} decimals={0} onCommit={(d) => set('setGeometry', { fin: { conductivity_W_mK: kFrom(d) } })} error={err('fin.conductivity_W_mK')} />
        {g.fin.type === 'wavy' ? (
          <Pair>
            <QuantityField label="Wave depth" kind="smallLength" system={system} valueSI={g.fin.waveDepth_m} minSI={0.0002} maxSI={0.005} onCommitSI={(v) => set('setGeometry', { fin: { waveDepth_m: v } })} error={err('fin.waveDepth_m')} />
            <QuantityField label="Wave half length" kind="smallLength" system={system} valueSI={g.fin.waveHalfLength_m} minSI={0.001} maxSI={0.02} onCommitSI={(v) => set('setGeometry', { fin: { waveHalfLength_m: v } })} error={err('fin.waveHalfLength_m')} />
          </Pair>
        ) : null}
      </FieldGroup>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
});
