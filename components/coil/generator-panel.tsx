/**
 * Standard circuiting: one line per candidate feed count (candidateFeedCounts) with its velocity, pressure drop and
 * capacity from the server's solve of that circuiting at the current conditions, so the user picks with numbers.
 * Applying one replaces the circuiting in one undo step.
 */
import { useQueries } from '@tanstack/react-query';
import { useMemo } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';
import type { EditorStore } from '@/canvas/store';
import { useEditor } from '@/canvas/use-editor';
import { solve } from '@/lib/api/solve';
import { candidateFeedCounts, serpentineCircuiting } from '@/lib/engine/generators';
import type { CoilDocument } from '@/lib/engine/types';
import { formatQuantity, type UnitSystem } from '@/lib/units';

export function GeneratorPanel({ store, system, onApplied }: { store: EditorStore; system: UnitSystem; onApplied: () => void }) {
  const doc = useEditor(store, (s) => s.document);
  const { geometry, conditions } = doc;
  const candidates = useMemo(
    () =>
      candidateFeedCounts(geometry).map((c) => {
        const circuiting = serpentineCircuiting(geometry, c.feeds);
        const trial: CoilDocument = { ...doc, circuiting };
        return { ...c, circuiting, trial };
      }),
    // The comparison depends on the geometry and conditions, not on the circuiting being drawn.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [geometry, conditions],
  );
  const solves = useQueries({
    queries: candidates.map((c) => ({
      queryKey: ['generator-solve', c.feeds, geometry, conditions],
      queryFn: () => solve(c.trial),
      staleTime: Infinity,
      retry: 0,
    })),
  });

  return (
    <View style={styles.list} testID="generator-panel">
      <Text style={[type.small, { color: colors.textMuted }]}>
        Counterflow serpentines by number of feeds (circuits). Figures are at the present conditions.
      </Text>
      {candidates.map((c, i) => {
        const r = solves[i]?.data;
        const velocities = r?.circuits.map((x) => x.velocity_m_s ?? 0) ?? [];
        const line = !r
          ? solves[i]?.error
            ? 'could not be solved'
            : 'solving…'
          : !r.valid
            ? 'not valid'
            : [
                `velocity ${formatQuantity('velocity', Math.max(...velocities), system).label}`,
                `pressure drop ${r.totals.waterPressureDrop_Pa === undefined ? '—' : formatQuantity('waterPressureDrop', r.totals.waterPressureDrop_Pa, system).label}`,
                `capacity ${r.totals.capacity_W === undefined ? '—' : formatQuantity('power', r.totals.capacity_W, system).label}`,
                `${r.warnings.length} warning${r.warnings.length === 1 ? '' : 's'}`,
              ].join(' · ');
        const passes = c.passes.min === c.passes.max ? `${c.passes.min}` : `${c.passes.min}–${c.passes.max}`;
        return (
          <Pressable
            key={c.feeds}
            role="button"
            accessibilityLabel={`Use ${c.feeds} feeds, ${passes} passes`}
            onPress={() => {
              store.getState().dispatch('replaceCircuiting', c.circuiting, { label: `${c.feeds} feeds`, selection: null });
              onApplied();
            }}
            style={({ pressed }) => [styles.item, pressed && { backgroundColor: colors.surfaceMuted }]}
            testID={`generate-${c.feeds}`}
          >
            <Text style={[type.bodyStrong, { color: colors.text }]}>
              {c.feeds} feed{c.feeds === 1 ? '' : 's'} · {passes} pass{passes === '1' ? '' : 'es'}{c.even ? '' : ' · return on the opposite end'}
            </Text>
            <Text style={[type.number, { color: colors.textMuted }]} testID={`generate-${c.feeds}-figures`}>
              {line}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { padding: space.md, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface, gap: space.xxs },
});
