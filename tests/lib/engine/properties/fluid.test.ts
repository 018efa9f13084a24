import { describe, expect, it } from 'vitest';
import { fluidProperties, fluidTemperatureRange_C, freezingPoint_C } from '@/lib/engine/properties/fluid';
import { expectAbs, expectRel } from '@/tests/lib/engine/expect-close';

const water = { kind: 'water', glycolMassFraction: 0 } as const;

describe('fluidProperties: water at 0.3 MPa (source: [C] computed from ENGINEERING.md 3.1, checks W7–W11)', () => {
  const cases = [
    { id: 'W7', t: 7, rho: 1000.00052, cp: 4199.863, mu: 1.426806e-3, k: 0.572449, pr: 10.468 },
    { id: 'W8', t: 12, rho: 999.59302, cp: 4191.882, mu: 1.233897e-3, k: 0.583018, pr: 8.87168 },
    { id: 'W9', t: 45, rho: 990.30983, cp: 4178.295, mu: 5.958069e-4, k: 0.6349, pr: 3.92102 },
    { id: 'W10', t: 60, rho: 983.29721, cp: 4182.321, mu: 4.660908e-4, k: 0.651121, pr: 2.99382 },
    { id: 'W11', t: 82, rho: 970.63482, cp: 4196.813, mu: 3.454532e-4, k: 0.668388, pr: 2.1691 },
  ];
  for (const c of cases) {
    it(`${c.id}: ${c.t} °C`, () => {
      const p = fluidProperties(water, c.t);
      expectRel(p.density_kg_m3, c.rho, 1e-5, 'rho');
      expectRel(p.specificHeat_J_kgK, c.cp, 1e-5, 'cp');
      expectRel(p.viscosity_Pa_s, c.mu, 1e-5, 'mu');
      expectRel(p.conductivity_W_mK, c.k, 1e-5, 'k');
      expectRel(p.prandtl, c.pr, 1e-5, 'Pr');
    });
  }
});

describe('fluidProperties: glycols (source: [C] Melinder 2010 polynomial, ENGINEERING.md G1, G4)', () => {
  it('G1: EG 30 % at 20 °C', () => {
    const p = fluidProperties({ kind: 'ethylene-glycol', glycolMassFraction: 0.3 }, 20);
    expectRel(p.density_kg_m3, 1038.0455, 1e-5, 'rho');
    expectRel(p.viscosity_Pa_s, 2.166449e-3, 1e-5, 'mu');
    expectRel(p.prandtl, (3718.251 * 2.166449e-3) / 0.464897, 3e-5, 'Pr');
  });
  it('G4: PG 30 % at 5 °C', () => {
    const p = fluidProperties({ kind: 'propylene-glycol', glycolMassFraction: 0.3 }, 5);
    expectRel(p.specificHeat_J_kgK, 3816.291, 1e-5, 'cp');
    expectRel(p.conductivity_W_mK, 0.432416, 1e-5, 'k');
  });
});

describe('ranges and freezing points', () => {
  it('water freezes at 0 °C and is valid 0–130 °C at 0.3 MPa', () => {
    expect(freezingPoint_C(water)).toBe(0);
    expect(fluidTemperatureRange_C(water)).toEqual({ min: 0, max: 130 });
    expect(() => fluidProperties(water, -1)).toThrow(/0 °C/);
    expect(() => fluidProperties(water, 140)).toThrow(/130 °C/);
  });
  it('glycol range runs from the freezing point (source: [C] Melinder T_f, ENGINEERING.md G6) to 100 °C', () => {
    const eg = { kind: 'ethylene-glycol', glycolMassFraction: 0.3 } as const;
    expectAbs(freezingPoint_C(eg), -14.58, 0.01, 'T_f');
    const r = fluidTemperatureRange_C(eg);
    expect(r.max).toBe(100);
    expectAbs(r.min, -14.58, 0.01, 'min');
    expect(() => fluidProperties(eg, -16)).toThrow(/freezing point/);
    expect(() => fluidProperties(eg, 100.5)).toThrow(/100 °C/);
  });
  it('is fast enough for the solver (10 000 water calls well under a second)', () => {
    const t0 = performance.now();
    let sum = 0;
    for (let i = 0; i < 10000; i++) sum += fluidProperties(water, 5 + (i % 80)).density_kg_m3;
    expect(sum).toBeGreaterThan(0);
    expect(performance.now() - t0).toBeLessThan(1000);
  });
});
