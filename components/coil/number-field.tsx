/**
 * A number input in display units: the user types in their own units, the value is committed (converted to SI by
 * the caller) on Enter or when the field loses focus, so one edit is one undo step.
 */
import { useEffect, useState } from 'react';
import { Text } from 'react-native';
import { TextField } from '@/components/ui/text-field';
import { colors, type } from '@/components/ui/theme';
import { formatNumber, fromDisplay, toDisplay, unitLabel, UNITS, type QuantityKind, type UnitSystem } from '@/lib/units';

export interface NumberFieldProps {
  label: string;
  /** Value in display units. */
  value: number | undefined;
  unit: string;
  decimals: number;
  onCommit: (display: number) => void;
  /** Checks a typed value; returns a message when it is not acceptable. */
  check?: (display: number) => string | null;
  integer?: boolean;
  /** When given, an empty field is allowed and clears the value. */
  onClear?: () => void;
  hint?: string;
  error?: string | null;
  testID?: string;
}

/** The value as the field shows it: fixed decimals with trailing zeros dropped ("2.50" -> "2.5"). */
function show(v: number | undefined, decimals: number): string {
  if (v === undefined || !Number.isFinite(v)) return '';
  const text = formatNumber(v, decimals);
  return text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
}

export function NumberField({ label, value, unit, decimals, onCommit, check, integer = false, onClear, hint, error, testID }: NumberFieldProps) {
  const [text, setText] = useState(show(value, decimals));
  const [focused, setFocused] = useState(false);
  const [local, setLocal] = useState<string | null>(null);
  useEffect(() => {
    if (!focused) setText(show(value, decimals));
  }, [value, decimals, focused]);

  const commit = () => {
    setFocused(false);
    const trimmed = text.trim().replace(',', '.');
    const n = Number(trimmed);
    if (trimmed === '' && onClear) {
      setLocal(null);
      if (value !== undefined) onClear();
      return;
    }
    if (trimmed === '' || !Number.isFinite(n)) {
      setLocal('Enter a number');
      return;
    }
    if (integer && !Number.isInteger(n)) {
      setLocal('Enter a whole number');
      return;
    }
    const problem = check?.(n) ?? null;
    setLocal(problem);
    if (problem) return;
    if (value === undefined || Math.abs(n - value) > Math.pow(10, -decimals - 2)) onCommit(n);
  };

  return (
    <TextField
      label={label}
      value={text}
      onChangeText={(t) => {
        setFocused(true);
        setText(t);
      }}
      onBlur={commit}
      onSubmitEditing={commit}
      inputMode="decimal"
      numeric
      hint={hint}
      error={local ?? error ?? null}
      testID={testID}
      trailing={<Text style={[type.small, { color: colors.textMuted }]}>{unit}</Text>}
    />
  );
}

/** A NumberField for an SI quantity shown in the user's unit system. */
export function QuantityField({
  kind,
  system,
  valueSI,
  onCommitSI,
  minSI,
  maxSI,
  ...rest
}: Omit<NumberFieldProps, 'value' | 'unit' | 'decimals' | 'onCommit' | 'check'> & {
  kind: QuantityKind;
  system: UnitSystem;
  valueSI: number | undefined;
  onCommitSI: (si: number) => void;
  minSI?: number;
  maxSI?: number;
  decimals?: number;
}) {
  const decimals = rest.decimals ?? UNITS[kind][system].decimals + 1;
  const fmt = (si: number) => `${formatNumber(toDisplay(kind, si, system), decimals)} ${unitLabel(kind, system)}`;
  return (
    <NumberField
      {...rest}
      value={valueSI === undefined ? undefined : toDisplay(kind, valueSI, system)}
      unit={unitLabel(kind, system)}
      decimals={decimals}
      check={(d) => {
        const si = fromDisplay(kind, d, system);
        if (minSI !== undefined && si < minSI - 1e-12) return `At least ${fmt(minSI)}`;
        if (maxSI !== undefined && si > maxSI + 1e-12) return `At most ${fmt(maxSI)}`;
        return null;
      }}
      onCommit={(d) => onCommitSI(fromDisplay(kind, d, system))}
    />
  );
}
