/** Number formatting with units: every number the product shows carries its unit. */
import { UNITS, type QuantityKind, type UnitSystem } from '@/lib/units/quantities';

export interface FormattedQuantity {
  /** The converted number. */
  value: number;
  /** The number as text ("2.50"), never "-0". */
  text: string;
  /** The unit label ("m/s"). */
  unit: string;
  /** Number and unit ("2.50 m/s"). */
  label: string;
}

/** Fixed-decimal text without a negative zero; "—" for values that are not finite. */
export function formatNumber(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toFixed(Math.max(0, Math.min(decimals, 12)));
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** Convert an SI value to the system's display unit and format it (decimals per kind unless `digits` is given). */
export function formatQuantity(kind: QuantityKind, valueSI: number, system: UnitSystem, options: { digits?: number } = {}): FormattedQuantity {
  const def = UNITS[kind][system];
  const value = def.to(valueSI);
  const text = formatNumber(value, options.digits ?? def.decimals);
  return { value, text, unit: def.unit, label: text === '—' ? '—' : `${text} ${def.unit}` };
}
