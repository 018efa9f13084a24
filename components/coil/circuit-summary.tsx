/** One line under the sheet: circuits, passes and arrangement from the client-side trace (instant). */
import { Text } from 'react-native';
import { colors, space, type } from '@/components/ui/theme';
import type { Topology } from '@/lib/engine/topology';

export function summaryLine(topology: Topology): string {
  const n = topology.circuits.length;
  if (n === 0) return topology.errors.length > 0 ? `No complete circuit · ${topology.errors.length} problem${topology.errors.length === 1 ? '' : 's'}` : 'No circuits yet';
  const passes = topology.circuits.map((c) => c.passes);
  const lo = Math.min(...passes);
  const hi = Math.max(...passes);
  const arrangements = [...new Set(topology.circuits.map((c) => (c.arrangement === 'parallel' ? 'parallel flow' : c.arrangement === 'single-row' ? 'single row' : c.arrangement)))];
  const parts = [`${n} circuit${n === 1 ? '' : 's'}`, `${lo === hi ? lo : `${lo}–${hi}`} passes`, arrangements.join(' / ')];
  if (topology.errors.length > 0) parts.push(`${topology.errors.length} problem${topology.errors.length === 1 ? '' : 's'}`);
  return parts.join(' · ');
}

export function CircuitSummary({ topology }: { topology: Topology }) {
  return (
    <Text style={[type.smallStrong, { color: topology.valid ? colors.text : colors.danger, paddingHorizontal: space.md, paddingVertical: space.xs }]} testID="circuit-summary" accessibilityLiveRegion="polite">
      {summaryLine(topology)}
    </Text>
  );
}
