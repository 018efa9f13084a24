import { describe, expect, it } from 'vitest';
import {
  airPressureDropKaysLondon,
  colburnAndFrictionWangChiChang2000,
  colburnAndFrictionWangHwangLin2002Herringbone,
} from '@/lib/engine/air-side';
import { finEfficiencySchmidt1949, surfaceEfficiency } from '@/lib/engine/fins';
import { expectAbs, expectRel } from '@/tests/lib/engine/expect-close';

// Reference coil of ENGINEERING.md 1.3 (1/2 in, 31.75 × 27.5 mm, 10 FPI, 0.15 mm fins, 24 high, 1.2192 m, 4 rows).
const DC = 13.0e-3;
const PT = 31.75e-3;
const PL = 27.5e-3;
const FP = 2.54e-3;
const FIN_T = 0.15e-3;
const A_FR = 0.929032;
const SIGMA = 0.55568;
const A_C = SIGMA * A_FR;
const A_O = 72.7324;
const FIN_FRACTION = 0.93816;
const DEPTH = 4 * PL;
const DH = (4 * A_C * DEPTH) / A_O;

const geometry = { collarDiameter_m: DC, hydraulicDiameter_m: 3.123e-3, transversePitch_m: PT, rowPitch_m: PL, finPitch_m: FP };

describe('A1: Wang, Chi & Chang 2000 plain fin (source: [C] computed from the formulas in ENGINEERING.md section 3.7)', () => {
  it.each([
    [1000, 1, 0.0211934, 0.0606614],
    [3000, 1, 0.0104767, 0.0345073],
    [1000, 4, 0.0160784, 0.063091],
    [3000, 4, 0.0098169, 0.0361143],
    [10000, 4, 0.0056337, 0.0236848],
  ])('Re %f, %i rows', (re, rows, j, f) => {
    const r = colburnAndFrictionWangChiChang2000({ reynoldsDc: re, rows, ...geometry });
    // Values are printed to 7 decimals: agree to half a unit in the last printed digit.
    expectAbs(r.j, j, 5e-8, 'j');
    expectAbs(r.f, f, 5e-8, 'f');
    expect(r.warnings).toEqual([]);
  });
});

describe('A2/A3: reference coil, 4 rows, dry (source: [C] ENGINEERING.md checks A2, A3)', () => {
  const air = { rho: 1.1843, mu: 1.8448e-5, cp: 1006.3, pr: 0.7073 };
  function coil(faceVelocity: number) {
    const g = (air.rho * faceVelocity) / SIGMA;
    const re = (g * DC) / air.mu;
    const { j, f } = colburnAndFrictionWangChiChang2000({ reynoldsDc: re, rows: 4, ...geometry, hydraulicDiameter_m: DH });
    const h = (j * g * air.cp) / Math.pow(air.pr, 2 / 3);
    const fin = finEfficiencySchmidt1949({
      h_W_m2K: h,
      finConductivity_W_mK: 200,
      finThickness_m: FIN_T,
      collarDiameter_m: DC,
      transversePitch_m: PT,
      rowPitch_m: PL,
      layout: 'staggered',
    });
    const dp = airPressureDropKaysLondon({ massVelocity: g, densityIn: air.rho, densityOut: air.rho, sigma: SIGMA, f, areaRatioAoAc: A_O / A_C });
    return { g, re, j, f, h, etaF: fin.efficiency, etaO: surfaceEfficiency(fin.efficiency, FIN_FRACTION), dp };
  }
  it('A2: V_fr 2.5 m/s', () => {
    const c = coil(2.5);
    expectRel(c.g, 5.32819, 2e-4, 'G_c');
    expectRel(c.re, 3754.69, 2e-4, 'Re_Dc');
    expectRel(c.j, 0.0088601, 2e-4, 'j');
    expectRel(c.f, 0.0329651, 2e-4, 'f');
    expectRel(c.h, 59.843, 2e-4, 'h_o');
    expectRel(c.etaF, 0.80495, 2e-4, 'eta_f');
    expectRel(c.etaO, 0.81701, 2e-4, 'eta_o');
    expectRel(c.dp, 55.667, 2e-4, 'dP');
  });
  it.each([
    [1.5, 45.31, 24.915],
    [2.0, 53.013, 39.01],
    [3.0, 66.048, 74.781],
  ])('A3: V_fr %f m/s', (v, h, dp) => {
    const c = coil(v);
    expectRel(c.h, h, 2e-4, 'h_o');
    expectRel(c.dp, dp, 2e-4, 'dP');
  });
});

describe('validity warnings (v1 decision 8)', () => {
  it('rows > 6 use N = 6 and warn "extrapolated" naming the row count', () => {
    const eight = colburnAndFrictionWangChiChang2000({ reynoldsDc: 3000, rows: 8, ...geometry });
    const six = colburnAndFrictionWangChiChang2000({ reynoldsDc: 3000, rows: 6, ...geometry });
    expect(eight.j).toBe(six.j);
    expect(eight.f).toBe(six.f);
    expect(eight.warnings).toHaveLength(1);
    expect(eight.warnings[0]).toMatch(/8 rows.*extrapolated/);
  });
  it('names the input and the range when outside it (5/8 in tubes)', () => {
    const r = colburnAndFrictionWangChiChang2000({ reynoldsDc: 200, rows: 4, ...geometry, collarDiameter_m: 16.18e-3, transversePitch_m: 38.1e-3, rowPitch_m: 33e-3 });
    expect(r.warnings.some((w) => /collar diameter 16\.18 mm .*6\.9–13\.6 mm/.test(w))).toBe(true);
    expect(r.warnings.some((w) => /transverse pitch 38\.1 mm .*20\.4–31\.8 mm/.test(w))).toBe(true);
    expect(r.warnings.some((w) => /row pitch 33 mm .*12\.7–32 mm/.test(w))).toBe(true);
    expect(r.warnings.some((w) => /Re_Dc 200 .*300–20000/.test(w))).toBe(true);
  });
  it('refuses impossible inputs', () => {
    expect(() => colburnAndFrictionWangChiChang2000({ reynoldsDc: -5, rows: 4, ...geometry })).toThrow(RangeError);
    expect(() => colburnAndFrictionWangChiChang2000({ reynoldsDc: 3000, rows: 0, ...geometry })).toThrow(RangeError);
  });
});

describe('Wang, Hwang & Lin 2002 herringbone (source: [C] independent python evaluation of the formulas in ENGINEERING.md 3.7; the correlation itself is unverified)', () => {
  it('large-tube set', () => {
    const r = colburnAndFrictionWangHwangLin2002Herringbone({
      reynoldsDc: 3000,
      rows: 4,
      collarDiameter_m: 16.18e-3,
      hydraulicDiameter_m: 3.0e-3,
      transversePitch_m: 38.1e-3,
      rowPitch_m: 33.0e-3,
      finPitch_m: 3.175e-3,
      finThickness_m: 0.15e-3,
      corrugationDepth_m: 1.8e-3,
      halfWavelength_m: 7.5e-3,
      areaRatioToBareTube: 18,
    });
    expectRel(r.j, 0.009029859749409359, 1e-12, 'j');
    expectRel(r.f, 0.02784669315584653, 1e-12, 'f');
    expect(r.warnings[0]).toMatch(/unverified/);
  });
  it('small-tube set', () => {
    const r = colburnAndFrictionWangHwangLin2002Herringbone({
      reynoldsDc: 2000,
      rows: 3,
      collarDiameter_m: 10.0e-3,
      hydraulicDiameter_m: 2.8e-3,
      transversePitch_m: 25.4e-3,
      rowPitch_m: 22.0e-3,
      finPitch_m: 1.8e-3,
      finThickness_m: 0.12e-3,
      corrugationDepth_m: 1.5e-3,
      halfWavelength_m: 5.0e-3,
      areaRatioToBareTube: 15,
    });
    expectRel(r.j, 0.02439377868491011, 1e-12, 'j');
    expectRel(r.f, 0.1881042583398355, 1e-12, 'f');
    expect(r.warnings[0]).toMatch(/unverified/);
    expect(r.warnings).toHaveLength(1); // every input inside the small-tube ranges
  });
  it('warns on rows beyond 6', () => {
    const r = colburnAndFrictionWangHwangLin2002Herringbone({
      reynoldsDc: 2000, rows: 8, collarDiameter_m: 10.0e-3, hydraulicDiameter_m: 2.8e-3, transversePitch_m: 25.4e-3, rowPitch_m: 22.0e-3,
      finPitch_m: 1.8e-3, finThickness_m: 0.12e-3, corrugationDepth_m: 1.5e-3, halfWavelength_m: 5.0e-3, areaRatioToBareTube: 15,
    });
    expect(r.warnings.some((w) => /8 rows.*extrapolated/.test(w))).toBe(true);
  });
});

describe('Kays & London core pressure drop', () => {
  it('adds the acceleration term when the air heats (source: [C] the equation of ENGINEERING.md 3.7)', () => {
    const iso = airPressureDropKaysLondon({ massVelocity: 5, densityIn: 1.2, densityOut: 1.2, sigma: 0.55, f: 0.03, areaRatioAoAc: 140 });
    expectRel(iso, (25 / 2.4) * 0.03 * 140, 1e-14, 'isothermal');
    const heated = airPressureDropKaysLondon({ massVelocity: 5, densityIn: 1.2, densityOut: 1.1, sigma: 0.55, f: 0.03, areaRatioAoAc: 140 });
    const expected = (25 / 2.4) * ((1 + 0.55 ** 2) * (1.2 / 1.1 - 1) + 0.03 * 140 * 1.2 * 0.5 * (1 / 1.2 + 1 / 1.1));
    expectRel(heated, expected, 1e-14, 'heated');
  });
});
