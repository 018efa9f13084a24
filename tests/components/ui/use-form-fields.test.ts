/** The wiring `field(name)` gives a TextField: value and error of that field; typing sets it and clears its message. */
import type { SetStateAction } from 'react';
import { describe, expect, it } from 'vitest';
import type { FieldErrors } from '@/components/ui/form-errors';
import { fieldProps } from '@/components/ui/use-form-fields';

/** A tiny stand-in for useState: applies updaters the way React does. */
function box<T>(initial: T) {
  const b = {
    current: initial,
    set: (next: SetStateAction<T>) => {
      b.current = typeof next === 'function' ? (next as (prev: T) => T)(b.current) : next;
    },
  };
  return b;
}

describe('fieldProps', () => {
  it('hands out the value and message of the named field', () => {
    const values = box({ email: 'ana@example.test', password: 'x' });
    const errors = box<FieldErrors>({ password: 'Too short.' });
    const p = fieldProps('password', values.current, errors.current, values.set, errors.set);
    expect(p.value).toBe('x');
    expect(p.error).toBe('Too short.');
    expect(fieldProps('email', values.current, errors.current, values.set, errors.set).error).toBeUndefined();
  });

  it('typing sets only that value and clears only that message', () => {
    const values = box({ email: '', password: '' });
    const errors = box<FieldErrors>({ email: 'Type an e-mail address.', password: 'Too short.', _form: 'Try again.' });
    fieldProps('email', values.current, errors.current, values.set, errors.set).onChangeText('ana@example.test');
    expect(values.current).toEqual({ email: 'ana@example.test', password: '' });
    expect(errors.current).toEqual({ password: 'Too short.', _form: 'Try again.' });
  });

  it('leaves the message map untouched when the field had none', () => {
    const values = box({ name: '' });
    const before: FieldErrors = { other: 'Still wrong.' };
    const errors = box(before);
    fieldProps('name', values.current, errors.current, values.set, errors.set).onChangeText('Loom 1');
    expect(errors.current).toBe(before);
    expect(values.current.name).toBe('Loom 1');
  });
});
