import { describe, expect, it } from 'vitest';
import { frictionFactorChurchill1977, frictionFactorColebrook1939, frictionFactorFilonenko1954 } from '@/lib/engine/friction';
import { expectRel } from '@/tests/lib/engine/expect-close';

describe('Churchill 1977', () => {
  it('F1: Re 1e5, ε/D 1e-4 (source: `fluids` docstring, Churchill 1977)', () => {
    expectRel(frictionFactorChurchill1977(1e5, 1e-4), 0.018462624566280075, 1e-12, 'f_D');
  });
  it.each([
    [500, 0.128],
    [1000, 0.064],
    [2300, 0.0308401],
    [3000, 0.0429747],
  ])('F3: smooth, Re %f (source: [C] computed from ENGINEERING.md section 3.4; laminar points = 64/Re)', (re, f) => {
    expectRel(frictionFactorChurchill1977(re, 0), f, 1e-5, 'f_D');
  });
  it('refuses impossible inputs', () => {
    expect(() => frictionFactorChurchill1977(-1, 0)).toThrow(RangeError);
    expect(() => frictionFactorChurchill1977(1e4, -1e-5)).toThrow(RangeError);
  });
});

describe('Colebrook 1939', () => {
  it('F2: Re 1e5, ε/D 1e-4 (source: `fluids` docstring)', () => {
    expectRel(frictionFactorColebrook1939(1e5, 1e-4), 0.018513866077471, 1e-9, 'f_D');
  });
  it.each([
    [1e4, 0.030883],
    [2e4, 0.0258831],
    [1e5, 0.0179898],
  ])('F4: smooth, Re %f (source: [C] computed from ENGINEERING.md section 3.4; Moody smooth line)', (re, f) => {
    expectRel(frictionFactorColebrook1939(re, 0), f, 1e-5, 'f_D');
  });
  it('refuses laminar Re', () => {
    expect(() => frictionFactorColebrook1939(1000, 0)).toThrow(/2300/);
  });
});

describe('Filonenko 1954', () => {
  it('Re 1e4 (source: [C] the formula of ENGINEERING.md section 3.4)', () => {
    expectRel(frictionFactorFilonenko1954(1e4), 0.0314798, 1e-6, 'f_D');
  });
});
