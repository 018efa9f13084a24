import { describe, expect, it } from 'vitest';
import { freezingPointMelinder2010_C, glycolPropertiesMelinder2010 } from '@/lib/engine/properties/glycol-melinder';
import { expectAbs, expectRel } from '@/tests/lib/engine/expect-close';

// Source for G1–G5: [C] computed from the Melinder (2010) polynomial with the coefficients of ENGINEERING.md 3.2;
// CoolProp INCOMP::MEG / MPG agree within 6e-6.
describe('Melinder 2010 glycol properties (ENGINEERING.md G1–G5)', () => {
  const cases = [
    { id: 'G1', kind: 'ethylene-glycol', x: 0.3, t: 20, rho: 1038.0455, cp: 3718.251, k: 0.464897, mu: 2.166449 },
    { id: 'G2', kind: 'ethylene-glycol', x: 0.3, t: -10, rho: 1047.4946, cp: 3627.072, k: 0.436159, mu: 6.507713 },
    { id: 'G3', kind: 'ethylene-glycol', x: 0.4, t: 0, rho: 1060.3864, cp: 3434.21, k: 0.409902, mu: 5.81066 },
    { id: 'G4', kind: 'propylene-glycol', x: 0.3, t: 5, rho: 1029.8934, cp: 3816.291, k: 0.432416, mu: 5.569379 },
    { id: 'G5', kind: 'propylene-glycol', x: 0.5, t: -20, rho: 1060.43, cp: 3375.674, k: 0.340444, mu: 84.738928 },
  ] as const;
  for (const c of cases) {
    it(`${c.id}: ${c.kind} ${c.x * 100} % at ${c.t} °C`, () => {
      const p = glycolPropertiesMelinder2010(c.kind, c.x, c.t);
      expectRel(p.density_kg_m3, c.rho, 1e-5, 'rho');
      expectRel(p.specificHeat_J_kgK, c.cp, 1e-5, 'cp');
      expectRel(p.conductivity_W_mK, c.k, 1e-5, 'k');
      expectRel(p.viscosity_Pa_s * 1e3, c.mu, 1e-5, 'mu');
    });
  }
});

describe('Melinder 2010 freezing point (source: [C] Melinder T_f polynomial, ENGINEERING.md G6)', () => {
  const eg: [number, number][] = [[0.2, -7.95], [0.3, -14.58], [0.4, -23.81], [0.5, -35.99]];
  const pg: [number, number][] = [[0.2, -7.17], [0.3, -12.79], [0.4, -20.57], [0.5, -32.2]];
  it.each(eg)('G6: EG %f', (x, tf) => expectAbs(freezingPointMelinder2010_C('ethylene-glycol', x), tf, 0.01, 'EG T_f'));
  it.each(pg)('G6: PG %f', (x, tf) => expectAbs(freezingPointMelinder2010_C('propylene-glycol', x), tf, 0.01, 'PG T_f'));
});

describe('Melinder 2010 validity', () => {
  it('refuses temperatures below the freezing point or above 100 °C, naming the limit', () => {
    expect(() => glycolPropertiesMelinder2010('ethylene-glycol', 0.3, -20)).toThrow(/freezing point -14\.6 °C/);
    expect(() => glycolPropertiesMelinder2010('propylene-glycol', 0.3, 101)).toThrow(/100 °C/);
    expect(() => glycolPropertiesMelinder2010('propylene-glycol', 0.7, 20)).toThrow(RangeError);
  });
});
