import { describe, expect, it } from 'vitest';
import {
  airEffectivenessRowsFedInParallel,
  airEffectivenessSerpentineCounterCrossflow,
  effectivenessCounterflow,
  effectivenessCounterflowSeries,
  effectivenessCrossflowCmaxMixed,
  effectivenessCrossflowCminMixed,
  effectivenessCrossflowUnmixedApprox,
  effectivenessCrossflowUnmixedExact,
  effectivenessParallelFlow,
  segmentEffectivenessWaterMixed,
} from '@/lib/engine/effectiveness';
import { expectRel } from '@/tests/lib/engine/expect-close';

describe('single-exchanger relations', () => {
  it('N1: counterflow NTU 5, C_r 0.7 (source: `ht` docstring, Incropera)', () => {
    expectRel(effectivenessCounterflow(5, 0.7), 0.920670368605, 1e-11, 'ε');
  });
  it('N2: parallel flow NTU 5, C_r 0.7 (source: `ht` docstring)', () => {
    expectRel(effectivenessParallelFlow(5, 0.7), 0.5881156068417585, 1e-12, 'ε');
  });
  it('N3: crossflow both unmixed (source: `ht` docstring, Triboix exact; approximate form [C])', () => {
    expectRel(effectivenessCrossflowUnmixedExact(5, 0.7), 0.84448217997, 1e-10, 'exact');
    expectRel(effectivenessCrossflowUnmixedApprox(5, 0.7), 0.8444804482, 1e-9, 'approx');
  });
  it('N4: crossflow C_max mixed, Holman Ex. 10-9 (source: `ht` docstring reproducing Holman)', () => {
    const cOil = 0.725 * 1900;
    const cSteam = 5.2 * 1860;
    const cr = cOil / cSteam;
    const ntu = (275 * 10.82) / cOil;
    expectRel(cOil, 1377.5, 1e-12, 'C_min');
    expectRel(cr, 0.1424214226633, 1e-9, 'C_r');
    expectRel(ntu, 2.16007259528, 1e-9, 'NTU');
    const eps = effectivenessCrossflowCmaxMixed(ntu, cr);
    expectRel(eps, 0.831218036142, 1e-9, 'ε');
    const q = eps * cOil * (130 - 15);
    expectRel(q, 131675.33, 1e-7, 'Q');
    expectRel(15 + q / cOil, 110.5901, 1e-6, 'T_co');
    expectRel(130 - q / cSteam, 116.3859, 1e-6, 'T_ho');
  });
  it('N5: counterflow C_r = 1, NTU 4 (source: closed form)', () => {
    expect(effectivenessCounterflow(4, 1)).toBe(0.8);
  });
  it('C_min mixed equals the segment formula when C_w < C_a (source: [C] identity stated in ENGINEERING.md 3.10)', () => {
    const ua = 150;
    const ca = 300;
    const cw = 200;
    expectRel(segmentEffectivenessWaterMixed(ua, ca, cw), effectivenessCrossflowCminMixed(ua / cw, cw / ca), 1e-14, 'P_w');
    // And C_max mixed when the air is C_min: Q = P_w C_w ΔT = ε C_a ΔT.
    const cwBig = 900;
    expectRel(segmentEffectivenessWaterMixed(ua, ca, cwBig) * cwBig, effectivenessCrossflowCmaxMixed(ua / ca, ca / cwBig) * ca, 1e-13, 'Q');
  });
  it('N exchangers in counterflow series reduce to counterflow for NTU split into N equal parts (source: [C] identity)', () => {
    const n = 4;
    const ep = effectivenessCounterflow(2 / n, 0.6);
    expectRel(effectivenessCounterflowSeries(ep, 0.6, n), effectivenessCounterflow(2, 0.6), 1e-12, 'ε');
    expectRel(effectivenessCounterflowSeries(0.5, 1, 2), 2 / 3, 1e-14, 'C_r 1');
  });
  it('refuses impossible inputs', () => {
    expect(() => effectivenessCounterflow(-1, 0.5)).toThrow(RangeError);
    expect(() => effectivenessParallelFlow(1, 1.5)).toThrow(RangeError);
    expect(() => segmentEffectivenessWaterMixed(10, 0, 5)).toThrow(RangeError);
  });
});

describe('N-row serpentine counter-crossflow, air side', () => {
  it('N6: 2 rows, R 0.5, NTU 2 (source: Nicole form in `ht`, stream = air confirmed by simulation [C])', () => {
    expectRel(airEffectivenessSerpentineCounterCrossflow(2, 0.5, 2), 0.7523072856, 1e-9, 'P');
  });
  it('N7: 3 rows (source: [C] closed form = simulation)', () => {
    expectRel(airEffectivenessSerpentineCounterCrossflow(3, 0.5, 2), 0.7646062269, 1e-9, 'P');
  });
  it('N8: 4 rows, corrected ξ (source: [C] sympy derivation = simulation)', () => {
    expectRel(airEffectivenessSerpentineCounterCrossflow(4, 0.5, 2), 0.7688870556, 1e-9, 'R 0.5');
    expectRel(airEffectivenessSerpentineCounterCrossflow(4, 1, 4), 0.7760371188, 1e-9, 'R 1');
  });
  it('N9: 5 rows (source: Nicole form, confirmed by simulation [C])', () => {
    expectRel(airEffectivenessSerpentineCounterCrossflow(5, 0.5, 2), 0.7709475852, 1e-9, 'R 0.5');
    expectRel(airEffectivenessSerpentineCounterCrossflow(5, 1, 4), 0.7841072516, 1e-9, 'R 1');
  });
  it.each([
    [1, 0.7060847555],
    [2, 0.7273365344],
    [3, 0.7316342115],
    [4, 0.733097264],
    [5, 0.7337873099],
  ])('N10: %i rows, R 0.25, NTU 1.5 (source: [C])', (rows, p) => {
    expectRel(airEffectivenessSerpentineCounterCrossflow(rows, 0.25, 1.5), p, 1e-9, 'P');
  });
  it('refuses more than 5 rows', () => {
    expect(() => airEffectivenessSerpentineCounterCrossflow(6, 0.5, 2)).toThrow(RangeError);
  });
});

describe('N11: rows fed in parallel (source: Schedwill form in `ht` with stream = air; simulation [C])', () => {
  it.each([
    [2, 0.72471],
    [3, 0.72899],
    [4, 0.73048],
  ])('%i rows, R 0.5, NTU 2', (rows, p) => {
    expectRel(airEffectivenessRowsFedInParallel(rows, 0.5, 2), p, 1e-5, 'P');
  });
  it('one row equals the one-row serpentine (source: [C] identity)', () => {
    expectRel(airEffectivenessRowsFedInParallel(1, 0.7, 1.3), airEffectivenessSerpentineCounterCrossflow(1, 0.7, 1.3), 1e-14, 'P');
  });
});

/**
 * Strip model of an N-row serpentine built only from segmentEffectivenessWaterMixed (ENGINEERING.md 3.12 option A):
 * C_air = 1, C_water = 1/R, UA = NTU; water enters the air-leaving row (counterflow) or the air-inlet row
 * (co-current) and reverses along the tube at every pass. Returns P_air.
 */
function stripModelAirEffectiveness(rows: number, r: number, ntu: number, segments: number, counterflow: boolean): number {
  const cw = 1 / r;
  const uaS = ntu / (rows * segments);
  const caS = 1 / segments;
  // airIn[row][strip], air inlet temperature 0, water inlet temperature 1.
  const airIn = Array.from({ length: rows + 1 }, () => new Float64Array(segments));
  const pw = segmentEffectivenessWaterMixed(uaS, caS, cw);
  let q = 0;
  for (let sweep = 0; sweep < 500; sweep++) {
    let tw = 1;
    let qSum = 0;
    for (let pass = 0; pass < rows; pass++) {
      const row = counterflow ? rows - 1 - pass : pass;
      for (let k = 0; k < segments; k++) {
        const s = pass % 2 === 0 ? k : segments - 1 - k;
        const qs = pw * cw * (tw - airIn[row][s]);
        airIn[row + 1][s] = airIn[row][s] + qs / caS;
        tw -= qs / cw;
        qSum += qs;
      }
    }
    const done = Math.abs(qSum - q) < 1e-13;
    q = qSum;
    if (done || !counterflow) break;
  }
  return q; // C_air (T_w,in − T_a,in) = 1
}

describe('the segment formula in a strip model reproduces the whole-coil checks', () => {
  it.each([
    [1, 0.769177],
    [2, 0.76896],
    [5, 0.768899],
  ])('N13: 4 rows counterflow, R 0.5, NTU 2, %i segments per tube (source: [C] ENGINEERING.md check N13)', (segments, p) => {
    expectRel(stripModelAirEffectiveness(4, 0.5, 2, segments, true), p, 1e-6 / p + 1e-9, 'P_air');
  });
  it('N12: co-current 2 and 4 rows, R 0.5, NTU 2, fine grid (source: [C] fine-grid simulation, ENGINEERING.md N12)', () => {
    expectRel(stripModelAirEffectiveness(2, 0.5, 2, 400, false), 0.640901, 1e-5, '2 rows');
    expectRel(stripModelAirEffectiveness(4, 0.5, 2, 400, false), 0.635518, 1e-5, '4 rows');
  });
  it('fine segments converge to the corrected 4-row closed form N8 (source: [C] ENGINEERING.md 3.10 accuracy note)', () => {
    expectRel(stripModelAirEffectiveness(4, 0.5, 2, 50, true), 0.7688870556, 2e-5, 'P_air');
  });
});

describe('doc-comment examples (source: [C] the formulas of ENGINEERING.md 3.10)', () => {
  it('C_min mixed, NTU 1, C_r 0.5', () => expectRel(effectivenessCrossflowCminMixed(1, 0.5), 0.544764, 1e-6, 'ε'));
  it('series, ε_p 0.5, C_r 0.5, N 2', () => expectRel(effectivenessCounterflowSeries(0.5, 0.5, 2), 5 / 7, 1e-14, 'ε'));
  it('segment, UA 100, C_a 200, C_w 1000', () => expectRel(segmentEffectivenessWaterMixed(100, 200, 1000), 0.0756772, 1e-6, 'P_w'));
});
