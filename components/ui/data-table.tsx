/**
 * A sortable table for wide screens. Numeric columns are right-aligned in the mono face with tabular figures and
 * carry their unit in the header ("Capacity (kW)"). Sorting is local (by `sortValue`) unless the caller controls
 * it with `sort` + `onSortChange` (e.g. sorting done by the server).
 */
import { useMemo, useState, type ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import { colors, fonts, radius, space, type } from '@/components/ui/theme';

export type SortDir = 'asc' | 'desc';
export interface SortState {
  key: string;
  dir: SortDir;
}

export interface Column<Row> {
  key: string;
  title: string;
  /** Unit shown in the header, e.g. "kPa". */
  unit?: string;
  numeric?: boolean;
  sortable?: boolean;
  /** Relative width (flex grow); default 1. */
  flex?: number;
  minWidth?: number;
  render: (row: Row) => ReactNode;
  sortValue?: (row: Row) => string | number | null;
}

function compare(a: string | number | null, b: string | number | null): number {
  if (a === b) return 0;
  if (a === null) return 1;
  if (b === null) return -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return String(a).localeCompare(String(b), undefined, { sensitivity: 'base', numeric: true });
}

export function DataTable<Row>({
  label,
  columns,
  rows,
  rowKey,
  sort: controlledSort,
  onSortChange,
  initialSort,
  onRowPress,
  rowAccessibilityLabel,
  testID,
}: {
  /** Accessible name of the table. */
  label: string;
  columns: readonly Column<Row>[];
  rows: readonly Row[];
  rowKey: (row: Row) => string;
  sort?: SortState;
  onSortChange?: (next: SortState) => void;
  initialSort?: SortState;
  onRowPress?: (row: Row) => void;
  rowAccessibilityLabel?: (row: Row) => string;
  testID?: string;
}) {
  const [localSort, setLocalSort] = useState<SortState | undefined>(initialSort);
  const sort = controlledSort ?? localSort;
  const sorted = useMemo(() => {
    if (controlledSort || !sort) return rows;
    const col = columns.find((c) => c.key === sort.key);
    if (!col?.sortValue) return rows;
    const get = col.sortValue;
    const out = [...rows].sort((a, b) => compare(get(a), get(b)));
    return sort.dir === 'desc' ? out.reverse() : out;
  }, [rows, columns, sort, controlledSort]);

  const toggle = (key: string) => {
    const next: SortState = sort?.key === key ? { key, dir: sort.dir === 'asc' ? 'desc' : 'asc' } : { key, dir: 'asc' };
    if (onSortChange) onSortChange(next);
    if (!controlledSort) setLocalSort(next);
  };

  const minTotal = columns.reduce((s, c) => s + (c.minWidth ?? 120), 0) + 2;
  // Fill the available width; scroll sideways (inside the table only) when the columns cannot fit.
  const [available, setAvailable] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setAvailable(e.nativeEvent.layout.width);
  const fits = available >= minTotal;

  const table = (
    <View role="table" accessibilityLabel={label} style={[styles.table, { width: fits ? available : minTotal }]} testID={testID}>
      <View role="row" style={[styles.row, styles.headRow]}>
        {columns.map((c) => {
          const active = sort?.key === c.key;
          const arrow = active ? (sort?.dir === 'asc' ? '▲' : '▼') : '';
          const title = c.unit ? `${c.title} (${c.unit})` : c.title;
          const cellStyle = [styles.cell, { flex: c.flex ?? 1, minWidth: c.minWidth ?? 120 }, c.numeric && styles.numCell];
          return c.sortable ? (
            <Pressable
              key={c.key}
              role="columnheader"
              accessibilityLabel={`${title}, ${active ? (sort?.dir === 'asc' ? 'sorted ascending' : 'sorted descending') : 'not sorted'}. Press to sort.`}
              onPress={() => toggle(c.key)}
              style={({ pressed }) => [cellStyle, styles.headCell, pressed && { backgroundColor: colors.border }]}
            >
              <Text style={[type.smallStrong, styles.headText, c.numeric && styles.right]} numberOfLines={2}>
                {title} <Text style={styles.arrow}>{arrow}</Text>
              </Text>
            </Pressable>
          ) : (
            <View key={c.key} role="columnheader" style={[cellStyle, styles.headCell]}>
              <Text style={[type.smallStrong, styles.headText, c.numeric && styles.right]} numberOfLines={2}>
                {title}
              </Text>
            </View>
          );
        })}
      </View>
      {sorted.map((row, i) => {
        const cells = columns.map((c) => {
          const content = c.render(row);
          return (
            <View key={c.key} role="cell" style={[styles.cell, { flex: c.flex ?? 1, minWidth: c.minWidth ?? 120 }, c.numeric && styles.numCell]}>
              {typeof content === 'string' || typeof content === 'number' ? (
                <Text style={[c.numeric ? styles.num : type.small, styles.cellText, c.numeric && styles.right]} numberOfLines={2}>
                  {content}
                </Text>
              ) : (
                content
              )}
            </View>
          );
        });
        const zebra = i % 2 === 1 ? styles.zebra : null;
        return onRowPress ? (
          <Pressable
            key={rowKey(row)}
            role="row"
            accessibilityLabel={rowAccessibilityLabel?.(row)}
            onPress={() => onRowPress(row)}
            style={({ pressed, hovered }: { pressed: boolean; hovered?: boolean }) => [
              styles.row,
              zebra,
              (pressed || hovered) && styles.rowHover,
            ]}
          >
            {cells}
          </Pressable>
        ) : (
          <View key={rowKey(row)} role="row" style={[styles.row, zebra]}>
            {cells}
          </View>
        );
      })}
    </View>
  );
  return (
    <View onLayout={onLayout} style={styles.frame}>
      {available === 0 ? null : fits ? table : <ScrollView horizontal>{table}</ScrollView>}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { alignSelf: 'stretch' },
  table: {
    borderWidth: 1,
    borderColor: colors.border,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    overflow: 'hidden',
  },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.border, alignItems: 'stretch' },
  headRow: { backgroundColor: colors.surfaceMuted },
  rowHover: { backgroundColor: colors.primarySoft },
  zebra: { backgroundColor: colors.surfaceStripe },
  cell: { paddingHorizontal: space.md, paddingVertical: space.md, justifyContent: 'center' },
  headCell: { paddingVertical: space.sm },
  numCell: { alignItems: 'flex-end' },
  headText: { color: colors.textMuted },
  arrow: { color: colors.accent, fontSize: 10 },
  cellText: { color: colors.text },
  num: { fontFamily: fonts.mono, fontSize: 14, lineHeight: 20, fontVariant: ['tabular-nums'] },
  right: { textAlign: 'right' },
});
