/**
 * The bill of materials of the current circuiting as a table (the shop's count): tubes and straight length,
 * hairpins by span, return bends, crossovers, header stubs, braze joints, fins, masses and water volume, in the
 * user's units. The same figures go to the data sheet and the CSV export.
 */
import { StyleSheet, Text, View } from 'react-native';
import type { BillOfMaterials } from '@/lib/engine/types';
import type { UnitSystem } from '@/lib/units';
import { billOfMaterialsLines } from './bill-of-materials-lines';
import { colors, space, type } from '@/components/ui/theme';

export function BillOfMaterialsTable({ bom, system }: { bom: BillOfMaterials; system: UnitSystem }) {
  return (
    <View style={styles.table} role="table" aria-label="Bill of materials" testID="bill-of-materials">
      {billOfMaterialsLines(bom, system).map((l) => (
        <View key={l.label} style={styles.row} role="row">
          <Text style={[type.small, styles.label, l.label.startsWith('  ') && styles.indent]} role="cell">
            {l.label.trim()}
          </Text>
          <Text style={[type.number, styles.value]} role="cell">
            {l.value}
          </Text>
          <Text style={[type.small, styles.unit]} role="cell">
            {l.unit}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderTopWidth: 1, borderColor: colors.border },
  row: { flexDirection: 'row', alignItems: 'baseline', paddingVertical: space.xs, borderBottomWidth: 1, borderColor: colors.border, gap: space.sm },
  label: { flex: 1, color: colors.text },
  indent: { paddingLeft: space.md, color: colors.textMuted },
  value: { minWidth: 72, textAlign: 'right', color: colors.text },
  unit: { width: 56, color: colors.textMuted },
});
