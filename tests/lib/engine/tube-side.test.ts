import { describe, expect, it } from 'vitest';
import {
  flowRegime,
  nusseltGnielinski1976,
  nusseltGnielinski2013Vdi,
  nusseltHausenLaminar,
  nusseltPetukhovKirillovPopov,
  nusseltSiederTateLaminar,
} from '@/lib/engine/tube-side';
import { expectRel } from '@/tests/lib/engine/expect-close';

describe('published Nusselt values', () => {
  it('H1: Gnielinski 1976, Re 1e5, Pr 1.2, f_D 0.0185 (source: `ht` docstring)', () => {
    expectRel(nusseltGnielinski1976(1e5, 1.2, 0.0185), 254.62682749359632, 1e-12, 'Nu');
  });
  it('H2: Petukhov–Kirillov–Popov, same inputs (source: `ht` docstring)', () => {
    expectRel(nusseltPetukhovKirillovPopov(1e5, 1.2, 0.0185), 250.11935088905105, 1e-12, 'Nu');
  });
  it('H3: Hausen laminar, Re 1e5, Pr 1.1, D/L 0.1 (source: `ht` docstring)', () => {
    expectRel(nusseltHausenLaminar(1e5, 1.1, 0.1), 39.01352358988535, 1e-12, 'Nu');
  });
  it('H4: Sieder–Tate laminar, same, no viscosity correction (source: `ht` docstring)', () => {
    expectRel(nusseltSiederTateLaminar(1e5, 1.1, 0.1), 41.366029684589265, 1e-12, 'Nu');
  });
});

describe('H5: VDI / Gnielinski 2013 scheme (source: [C] computed from the formulas in ENGINEERING.md section 3.4)', () => {
  it.each([
    [2500, 10.47, 0.01, 13.1388],
    [5000, 10.47, 0.01, 44.0413],
    [10000, 10.47, 0.01, 105.8462],
    [20000, 3, 0.001, 109.4148],
    [1500, 10.47, 0.001, 4.5236],
  ])('Re %f, Pr %f, D/L %f', (re, pr, dl, nu) => {
    expectRel(nusseltGnielinski2013Vdi(re, pr, dl), nu, 1e-5, 'Nu');
  });
  it('Gnielinski 1976 with Filonenko f_D, the H5 comparison values', () => {
    expectRel(nusseltGnielinski1976(5000, 10.47), 46.5766, 1e-5, 'Re 5000');
    expectRel(nusseltGnielinski1976(1e4, 10.47), 92.3267, 1e-5, 'Re 1e4');
    expectRel(nusseltGnielinski1976(2e4, 3), 104.4288, 1e-5, 'Re 2e4');
  });
  it('is continuous at Re 2300 and 1e4', () => {
    const below = nusseltGnielinski2013Vdi(2300, 5, 0.005);
    expectRel(nusseltGnielinski2013Vdi(2300.0001, 5, 0.005), below, 1e-6, '2300');
    expectRel(nusseltGnielinski2013Vdi(9999.9999, 5, 0.005), nusseltGnielinski2013Vdi(1e4, 5, 0.005), 1e-6, '1e4');
  });
  it('refuses impossible inputs', () => {
    expect(() => nusseltGnielinski2013Vdi(-5, 5, 0.01)).toThrow(RangeError);
    expect(() => nusseltGnielinski2013Vdi(5000, 0, 0.01)).toThrow(RangeError);
  });
});

describe('flowRegime (v1 decision 6)', () => {
  it('uses the 2300 / 4000 bounds', () => {
    expect(flowRegime(2299)).toBe('laminar');
    expect(flowRegime(2300)).toBe('transitional');
    expect(flowRegime(3000)).toBe('transitional');
    expect(flowRegime(3999)).toBe('transitional');
    expect(flowRegime(4000)).toBe('turbulent');
    expect(() => flowRegime(0)).toThrow(RangeError);
  });
});
