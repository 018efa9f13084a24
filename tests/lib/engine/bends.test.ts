import { describe, expect, it } from 'vitest';
import { bendLossCrane, bendLossIto1960, bendLossRennelsHudson2012, ENTRANCE_LOSS_SHARP, EXIT_LOSS } from '@/lib/engine/bends';
import { frictionFactorColebrook1939 } from '@/lib/engine/friction';
import { expectRel } from '@/tests/lib/engine/expect-close';

describe('Ito 1960 180° bend', () => {
  it.each([
    [5e3, 0.54747],
    [1e4, 0.486615],
    [2e4, 0.432524],
    [5e4, 0.370135],
  ])('B1: R/D 1.34, Re %f (source: [C]; identical to `fluids` bend_rounded_Ito)', (re, k) => {
    expectRel(bendLossIto1960(re, 1.34), k, 1e-5, 'K');
  });
  it.each([
    [1.0, 0.982251],
    [1.5, 0.412312],
    [2.0, 0.354135],
  ])('B2: Re 1e4, R/D %f (source: [C] + `fluids` bend_rounded_Ito)', (rd, k) => {
    expectRel(bendLossIto1960(1e4, rd), k, 1e-5, 'K');
  });
  it('refuses the laminar branch and other angles', () => {
    expect(() => bendLossIto1960(500, 1.34)).toThrow(/364/);
    expect(() => bendLossIto1960(1e4, 1.34, 90)).toThrow(RangeError);
  });
});

describe('Rennels & Hudson 2012', () => {
  it('B3: 30° bend, R/D 20/4.02, f_D Colebrook smooth at Re 1e5 (source: `fluids` bend_rounded docstring)', () => {
    const fd = frictionFactorColebrook1939(1e5, 0);
    expectRel(bendLossRennelsHudson2012(fd, Math.PI / 6, 20 / 4.02), 0.11519070808085, 1e-10, 'K');
  });
  it.each([
    [1.34, 0.421114],
    [1.5, 0.391594],
  ])('B4: 180°, f_D 0.03, R/D %f (source: [C] computed from ENGINEERING.md section 3.5)', (rd, k) => {
    expectRel(bendLossRennelsHudson2012(0.03, Math.PI, rd), k, 1e-6, 'K');
  });
  it('refuses impossible inputs', () => {
    expect(() => bendLossRennelsHudson2012(-0.02, Math.PI, 1.34)).toThrow(RangeError);
    expect(() => bendLossRennelsHudson2012(0.02, 4, 1.34)).toThrow(RangeError);
  });
});

describe('Crane TP-410 and header losses', () => {
  it('B5: K = 50 f_T (source: Crane TP-410 as tabulated in `fluids`)', () => {
    expect(bendLossCrane(0.0185)).toBeCloseTo(0.925, 12);
    expect(bendLossCrane(0.02)).toBeCloseTo(1.0, 12);
  });
  it('sharp entrance 0.5 and exit 1.0 (source: `fluids` entrance_sharp / exit_normal, ENGINEERING.md 3.5)', () => {
    expect(ENTRANCE_LOSS_SHARP).toBe(0.5);
    expect(EXIT_LOSS).toBe(1.0);
  });
});
