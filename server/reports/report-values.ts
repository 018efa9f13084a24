/**
 * Turning result values into the texts a report prints, through lib/units: a number and its unit in the reader's
 * system, or "not rated" when the solver gave no value (thermal results missing, invalid circuiting).
 */
import type { CoilDocument, Fluid, TubeRef } from '@/lib/engine/types';
import { FOOT_m, formatNumber, formatQuantity, type QuantityKind, type UnitSystem } from '@/lib/units';
import type { ValueRow } from '@/server/reports/pdf-layout';

export const NOT_RATED = 'not rated';

export interface Shown { value: string; unit: string }

/** A value in the reader's units, or undefined when there is none. */
export function show(kind: QuantityKind, valueSI: number | undefined, system: UnitSystem, digits?: number): Shown | undefined {
  if (valueSI === undefined || !Number.isFinite(valueSI)) return undefined;
  const f = formatQuantity(kind, valueSI, system, digits === undefined ? {} : { digits });
  return { value: f.text, unit: f.unit };
}

/** A label/value row; a missing value prints "not rated". */
export function row(label: string, shown: Shown | undefined, missing = NOT_RATED): ValueRow {
  return shown ? { label, value: shown.value, unit: shown.unit } : { label, value: '', note: missing };
}

/** A plain number row (counts, ratios) with an optional unit word. */
export function countRow(label: string, value: number | undefined, decimals = 0, unit = ''): ValueRow {
  return value === undefined || !Number.isFinite(value)
    ? { label, value: '', note: NOT_RATED }
    : { label, value: formatNumber(value, decimals), unit };
}

export function textRow(label: string, text: string): ValueRow {
  return { label, value: text, unit: '' };
}

/** A cell text: the number only (the unit sits in the column header), or an en dash when missing. */
export function cell(kind: QuantityKind, valueSI: number | undefined, system: UnitSystem, digits?: number): string {
  return show(kind, valueSI, system, digits)?.value ?? '–';
}

export function numberCell(value: number | undefined, decimals = 0): string {
  return value === undefined || !Number.isFinite(value) ? '–' : formatNumber(value, decimals);
}

/** Altitude: metres or feet (lib/units has no altitude kind; the foot is its exact definition). */
export function altitude(altitude_m: number, system: UnitSystem): Shown {
  return system === 'si'
    ? { value: formatNumber(altitude_m, 0), unit: 'm' }
    : { value: formatNumber(altitude_m / FOOT_m, 0), unit: 'ft' };
}

/** Fins per inch, the trade's own measure in both unit systems. */
export function finsPerInch(pitch_m: number): Shown {
  return { value: formatNumber(0.0254 / pitch_m, 1), unit: 'FPI' };
}

export function fluidName(fluid: Fluid): string {
  if (fluid.kind === 'water') return 'water';
  const name = fluid.kind === 'ethylene-glycol' ? 'ethylene glycol' : 'propylene glycol';
  return `${name}, ${formatNumber(fluid.glycolMassFraction * 100, 0)} % by mass`;
}

export const tubeText = (t: TubeRef): string => `R${t.row} T${t.tube}`;

/** First letter upper case (engine messages start in lower case to read well inside sentences). */
export const sentence = (s: string): string => (s ? s[0].toUpperCase() + s.slice(1) : s);

export const percent = (fraction: number, decimals = 0): string => `${formatNumber(fraction * 100, decimals)} %`;

/** The smallest and largest pass counts, "8" or "6–8". */
export function passRange(passes: readonly number[]): string {
  if (passes.length === 0) return '–';
  const lo = Math.min(...passes);
  const hi = Math.max(...passes);
  return lo === hi ? String(lo) : `${lo}–${hi}`;
}

export const coilSize = (doc: CoilDocument): string =>
  `${doc.geometry.rows} ${doc.geometry.rows === 1 ? 'row' : 'rows'} × ${doc.geometry.tubesPerRow} tubes high`;
