import { describe, expect, it } from 'vitest';
import {
  annularFinEfficiencyExact,
  finEfficiencySchmidt1949,
  modifiedBessel,
  surfaceEfficiency,
  wetFinParameterThrelkeld,
} from '@/lib/engine/fins';
import { expectRel } from '@/tests/lib/engine/expect-close';

describe('modified Bessel functions (source: Abramowitz & Stegun 9.8 approximations vs scipy.special values)', () => {
  it.each([
    ['i0', 1, 1.2660658777520082],
    ['i1', 1, 0.5651591039924851],
    ['k0', 1, 0.42102443824070823],
    ['k1', 1, 0.6019072301972346],
    ['i0', 5, 27.239871823604442],
    ['k1', 3, 0.04015643112819419],
  ] as const)('%s(%f)', (name, x, v) => {
    expectRel(modifiedBessel[name](x), v, 3e-7, name);
  });
});

describe('Schmidt 1949 equivalent circular fin', () => {
  it('H6: hexagonal fin of the reference coil (source: [C] computed from ENGINEERING.md section 3.8)', () => {
    const r = finEfficiencySchmidt1949({
      h_W_m2K: 59.84,
      finConductivity_W_mK: 200,
      finThickness_m: 0.15e-3,
      collarDiameter_m: 13.0e-3,
      transversePitch_m: 31.75e-3,
      rowPitch_m: 27.5e-3,
      layout: 'staggered',
    });
    expectRel(r.equivalentRadiusRatio, 2.5953, 1e-4, 'R_eq/r');
    expectRel(r.phi, 2.1278, 1e-4, 'phi');
    expectRel(r.efficiency, 0.8049, 1e-4, 'eta_f');
  });
  it('refuses a pitch smaller than the collar', () => {
    expect(() =>
      finEfficiencySchmidt1949({ h_W_m2K: 50, finConductivity_W_mK: 200, finThickness_m: 1e-4, collarDiameter_m: 0.02, transversePitch_m: 0.015, rowPitch_m: 0.02, layout: 'staggered' }),
    ).toThrow(RangeError);
  });
});

/** Schmidt's η with a given equivalent radius: tanh(m r φ)/(m r φ), φ from R_eq/r (ENGINEERING.md 3.8). */
function schmidtWithRadius(h: number, k: number, t: number, r1: number, r2: number): number {
  const ratio = r2 / r1;
  const phi = (ratio - 1) * (1 + 0.35 * Math.log(ratio));
  const x = Math.sqrt((2 * h) / (k * t)) * r1 * phi;
  return Math.tanh(x) / x;
}

describe('exact annular fin (source: exact Bessel form, Gardner 1945 / Incropera table 3.5 [M form, C value])', () => {
  it('H7: h 50, k 200, δ 0.15 mm, r1 6.5, r2 16.5 mm', () => {
    const exact = annularFinEfficiencyExact({ h_W_m2K: 50, finConductivity_W_mK: 200, finThickness_m: 0.15e-3, innerRadius_m: 6.5e-3, outerRadius_m: 16.5e-3 });
    expectRel(exact, 0.84952, 1e-5, 'exact');
    const schmidt = schmidtWithRadius(50, 200, 0.15e-3, 6.5e-3, 16.5e-3);
    expectRel(schmidt, 0.84165, 1e-5, 'Schmidt');
    expectRel(schmidt, exact, 0.015, 'Schmidt within 1.5 % of exact');
  });
  it('H8: h 100, δ 0.10 mm, r1 5, r2 12 mm', () => {
    const exact = annularFinEfficiencyExact({ h_W_m2K: 100, finConductivity_W_mK: 200, finThickness_m: 0.1e-3, innerRadius_m: 5e-3, outerRadius_m: 12e-3 });
    expectRel(exact, 0.79956, 1e-5, 'exact');
    const schmidt = schmidtWithRadius(100, 200, 0.1e-3, 5e-3, 12e-3);
    expectRel(schmidt, 0.79091, 1e-5, 'Schmidt');
    expectRel(schmidt, exact, 0.015, 'Schmidt within 1.5 % of exact');
  });
});

describe('wet fin and surface efficiency', () => {
  it('Threlkeld m_w = sqrt(2 h c_s / (c_pa k δ)) (source: [C] the formula of ENGINEERING.md section 3.8)', () => {
    expectRel(
      wetFinParameterThrelkeld({ h_W_m2K: 60, saturationSpecificHeat_J_kgK: 2300, airSpecificHeat_J_kgK: 1006, finConductivity_W_mK: 200, finThickness_m: 0.15e-3 }),
      95.63016900880228,
      1e-12,
      'm_w',
    );
  });
  it('A2: η_o of the 4-row reference coil (source: [C] ENGINEERING.md check A2)', () => {
    expectRel(surfaceEfficiency(0.80495, 0.93816), 0.81701, 2e-4, 'eta_o');
    expect(() => surfaceEfficiency(1.2, 0.9)).toThrow(RangeError);
  });
});
