/**
 * Operating conditions: air (face velocity, entering dry bulb with wet bulb or relative humidity, altitude), fluid
 * (water or a glycol and its mass fraction, entering temperature, mass flow) and the part-load and freeze checks.
 */
import { View } from 'react-native';
import { SegmentedControl } from '@/components/ui/segmented-control';
import { space } from '@/components/ui/theme';
import { useEditor } from '@/canvas/use-editor';
import type { EditorStore } from '@/canvas/store';
import { FOOT_m, type UnitSystem } from '@/lib/units';
import type { FluidKind } from '@/lib/engine/types';
import { FieldGroup, Pair } from './form-layout';
import { NumberField, QuantityField } from './number-field';

export function ConditionsForm({ store, system, fieldErrors }: { store: EditorStore; system: UnitSystem; fieldErrors: Record<string, string> }) {
  const c = useEditor(store, (s) => s.document.conditions);
  const set = store.getState().dispatch;
  const err = (path: string) => fieldErrors[`conditions.${path}`] ?? null;
  const humidity = c.air.inletWetBulb_C !== undefined ? 'wb' : 'rh';
  const altitudeUnit = system === 'si' ? 'm' : 'ft';
  const altTo = (m: number) => (system === 'si' ? m : m / FOOT_m);
  const altFrom = (d: number) => (system === 'si' ? d : d * FOOT_m);

  return (
    <View style={{ gap: space.lg }} testID="conditions-form">
      <FieldGroup title="Entering air">
        <Pair>
          <QuantityField label="Face velocity" kind="faceVelocity" system={system} valueSI={c.air.faceVelocity_m_s} minSI={0.2} maxSI={6} onCommitSI={(v) => set('setConditions', { air: { faceVelocity_m_s: v } })} error={err('air.faceVelocity_m_s')} testID="air-velocity" />
          <QuantityField label="Dry bulb" kind="temperature" system={system} valueSI={c.air.inletDryBulb_C} minSI={-40} maxSI={60} onCommitSI={(v) => set('setConditions', { air: { inletDryBulb_C: v } })} error={err('air.inletDryBulb_C')} testID="air-dry-bulb" />
        </Pair>
        <SegmentedControl
          label="Air humidity given as"
          value={humidity}
          options={[
            { value: 'wb', label: 'Wet bulb' },
            { value: 'rh', label: 'Relative humidity' },
          ]}
          onChange={(v) =>
            v === 'wb'
              ? set('setConditions', { air: { inletWetBulb_C: c.air.inletDryBulb_C - 5 } }, { label: 'Humidity' })
              : set('setConditions', { air: { inletRelativeHumidity: 0.5 } }, { label: 'Humidity' })
          }
        />
        <Pair>
          {humidity === 'wb' ? (
            <QuantityField label="Wet bulb" kind="temperature" system={system} valueSI={c.air.inletWetBulb_C} minSI={-40} maxSI={60} onCommitSI={(v) => set('setConditions', { air: { inletWetBulb_C: v } })} error={err('air.inletWetBulb_C')} testID="air-wet-bulb" />
          ) : (
            <NumberField label="Relative humidity" value={(c.air.inletRelativeHumidity ?? 0) * 100} unit="%" decimals={0} check={(n) => (n < 0 || n > 100 ? '0 to 100 %' : null)} onCommit={(n) => set('setConditions', { air: { inletRelativeHumidity: n / 100 } })} error={err('air.inletRelativeHumidity')} testID="air-rh" />
          )}
          <NumberField label="Altitude" value={altTo(c.air.altitude_m)} unit={altitudeUnit} decimals={0} check={(d) => (altFrom(d) < -500 || altFrom(d) > 5000 ? 'Between -500 and 5000 m' : null)} onCommit={(d) => set('setConditions', { air: { altitude_m: altFrom(d) } })} error={err('air.altitude_m')} testID="air-altitude" />
        </Pair>
      </FieldGroup>
      <FieldGroup title="Fluid">
        <SegmentedControl<FluidKind>
          label="Fluid"
          value={c.fluid.kind}
          options={[
            { value: 'water', label: 'Water' },
            { value: 'ethylene-glycol', label: 'Ethylene glycol' },
            { value: 'propylene-glycol', label: 'Propylene glycol' },
          ]}
          onChange={(kind) =>
            set('setConditions', { fluid: kind === 'water' ? { kind } : { kind, glycolMassFraction: c.fluid.glycolMassFraction >= 0.05 ? c.fluid.glycolMassFraction : 0.3 } }, { label: 'Fluid' })
          }
          testID="fluid-kind"
        />
        {c.fluid.kind !== 'water' ? (
          <NumberField label="Glycol by mass" value={c.fluid.glycolMassFraction * 100} unit="%" decimals={0} check={(n) => (n < 5 || n > 60 ? '5 to 60 %' : null)} onCommit={(n) => set('setConditions', { fluid: { glycolMassFraction: n / 100 } })} error={err('fluid.glycolMassFraction')} testID="fluid-glycol" />
        ) : null}
        <Pair>
          <QuantityField label="Entering temperature" kind="temperature" system={system} valueSI={c.fluid.inletTemperature_C} minSI={-30} maxSI={120} onCommitSI={(v) => set('setConditions', { fluid: { inletTemperature_C: v } })} error={err('fluid.inletTemperature_C')} testID="fluid-temperature" />
          <QuantityField label="Mass flow" kind="massFlow" system={system} valueSI={c.fluid.massFlow_kg_s} minSI={0.001} maxSI={100} onCommitSI={(v) => set('setConditions', { fluid: { massFlow_kg_s: v } })} error={err('fluid.massFlow_kg_s')} testID="fluid-flow" />
        </Pair>
      </FieldGroup>
      <FieldGroup title="Part load and freezing">
        <Pair>
          <NumberField label="Lowest flow" hint="Share of design flow at part load" value={c.minimumFlowFraction * 100} unit="%" decimals={0} check={(n) => (n < 5 || n > 100 ? '5 to 100 %' : null)} onCommit={(n) => set('setConditions', { minimumFlowFraction: n / 100 })} testID="min-flow" />
          <QuantityField
            label="Coldest entering air"
            hint="Leave empty when the coil never sees freezing air"
            kind="temperature"
            system={system}
            valueSI={c.minimumAirTemperature_C ?? undefined}
            minSI={-50}
            maxSI={40}
            onCommitSI={(v) => set('setConditions', { minimumAirTemperature_C: v })}
            onClear={() => set('setConditions', { minimumAirTemperature_C: null })}
            testID="min-air"
          />
        </Pair>
      </FieldGroup>
    </View>
  );
}
