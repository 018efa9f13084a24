/** Words and units for versions: dates, decision names, the compared result figures. */
import type { DecisionStatus, ResultDifference } from '@/lib/schema/api-versions';
import { formatNumber, formatQuantity, UNITS, type QuantityKind, type UnitSystem } from '@/lib/units';

export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}

export function formatDate(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return d.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}

export const DECISION_LABELS: Record<DecisionStatus, string> = {
  approved: 'Approved',
  'changes-requested': 'Changes requested',
};

/** How each compared figure is named and which quantity it is (null: a plain count). */
const RESULT_FIGURES: Record<string, { label: string; kind: QuantityKind | null; differenceKind?: QuantityKind }> = {
  capacity_W: { label: 'Capacity', kind: 'power' },
  sensibleCapacity_W: { label: 'Sensible capacity', kind: 'power' },
  latentCapacity_W: { label: 'Latent capacity', kind: 'power' },
  waterPressureDrop_Pa: { label: 'Water pressure drop', kind: 'waterPressureDrop' },
  airPressureDrop_Pa: { label: 'Air pressure drop', kind: 'airPressureDrop' },
  leavingAirDryBulb_C: { label: 'Leaving air dry bulb', kind: 'temperature', differenceKind: 'temperatureDifference' },
  leavingWaterTemperature_C: { label: 'Leaving water', kind: 'temperature', differenceKind: 'temperatureDifference' },
  circuitCount: { label: 'Circuits', kind: null },
  warningCount: { label: 'Warnings', kind: null },
  errorCount: { label: 'Errors', kind: null },
};

export function resultFigureLabel(key: string): string {
  return RESULT_FIGURES[key]?.label ?? key;
}

/** A compared figure as text with its unit; "—" when unknown. */
export function formatResultValue(key: string, value: number | null, system: UnitSystem): string {
  if (value === null) return '—';
  const f = RESULT_FIGURES[key];
  if (!f || f.kind === null) return formatNumber(value, 0);
  return formatQuantity(f.kind, value, system).label;
}

/**
 * The difference b − a with its sign and unit. Temperatures differ by a temperature difference (K or °F), never
 * by an absolute temperature; "no change" only when the difference is nil at two decimals more than the values.
 */
export function formatResultDifference(row: ResultDifference, system: UnitSystem): string {
  if (row.difference === null) return '—';
  if (row.difference === 0) return 'no change';
  const f = RESULT_FIGURES[row.key];
  const kind = f ? (f.differenceKind ?? f.kind) : null;
  if (kind === null) return `${row.difference > 0 ? '+' : ''}${formatNumber(row.difference, 0)}`;
  // A small difference gets up to two more decimals than the values, so two values that read differently never
  // show "no change" between them.
  const base = UNITS[kind][system].decimals;
  for (let digits = base; digits <= base + 2; digits++) {
    const q = formatQuantity(kind, row.difference, system, { digits });
    if (!/^-?0(\.0*)?$/.test(q.text)) return `${row.difference > 0 ? '+' : ''}${q.text} ${q.unit}`;
  }
  return 'no change';
}
