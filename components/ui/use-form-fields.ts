/**
 * The state of a small text form: its values and its per-field messages, plus `field(name)`, the three props every
 * TextField needs. Typing in a field sets its value and clears its own message; the others stay until the next try.
 */
import { useState, type Dispatch, type SetStateAction } from 'react';
import { withoutField, type FieldErrors } from '@/components/ui/form-errors';

/** What `field(name)` spreads onto a TextField. */
export interface FieldProps {
  value: string;
  onChangeText: (text: string) => void;
  error: string | undefined;
}

/** The props of field `name` given the form's state and setters; kept apart from React so it can be tested alone. */
export function fieldProps<V extends Record<keyof V, string>>(
  name: keyof V & string,
  values: V,
  errors: FieldErrors,
  setValues: Dispatch<SetStateAction<V>>,
  setErrors: Dispatch<SetStateAction<FieldErrors>>,
): FieldProps {
  return {
    value: values[name],
    onChangeText: (text) => {
      setValues((v) => ({ ...v, [name]: text }));
      setErrors((e) => withoutField(e, name));
    },
    error: errors[name],
  };
}

export function useFormFields<V extends Record<keyof V, string>>(initial: V) {
  const [values, setValues] = useState<V>(initial);
  const [errors, setErrors] = useState<FieldErrors>({});
  const field = (name: keyof V & string): FieldProps => fieldProps(name, values, errors, setValues, setErrors);
  return { values, setValues, errors, setErrors, field };
}
