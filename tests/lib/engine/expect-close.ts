import { expect } from 'vitest';

/** Asserts |actual/expected − 1| ≤ relTol (or |actual − expected| ≤ relTol when expected is 0). */
export function expectRel(actual: number, expected: number, relTol: number, label = ''): void {
  const err = expected === 0 ? Math.abs(actual) : Math.abs(actual / expected - 1);
  expect(err, `${label}: got ${actual}, expected ${expected} (rel. tol ${relTol})`).toBeLessThanOrEqual(relTol);
}

/** Asserts |actual − expected| ≤ absTol. */
export function expectAbs(actual: number, expected: number, absTol: number, label = ''): void {
  expect(Math.abs(actual - expected), `${label}: got ${actual}, expected ${expected} (abs. tol ${absTol})`).toBeLessThanOrEqual(absTol);
}
