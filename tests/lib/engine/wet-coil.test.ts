import { describe, expect, it } from 'vitest';
import { wetCoilBraunKleinMitchell1989, wetSegmentBraunKleinMitchell1989 } from '@/lib/engine/wet-coil';
import { segmentEffectivenessWaterMixed } from '@/lib/engine/effectiveness';
import { saturationEnthalpy_J_kg } from '@/lib/engine/psychrometrics';
import { expectRel } from '@/tests/lib/engine/expect-close';

const K1 = {
  airMassFlowDry_kg_s: 1.0,
  airInletTemperature_C: 27,
  airInletHumidityRatio: 0.0112,
  pressure_Pa: 101325,
  waterMassFlow_kg_s: 1.2,
  waterSpecificHeat_J_kgK: 4200,
  waterInletTemperature_C: 7,
  uaAir_W_K: 3000,
  uaWater_W_K: 17500,
};

describe('Braun, Klein & Mitchell 1989 whole coil (source: [C] ENGINEERING.md checks K1, K2)', () => {
  it('K1: all-wet counterflow', () => {
    const r = wetCoilBraunKleinMitchell1989(K1);
    expect(r.surface).toBe('wet');
    expectRel(r.wet.saturationSpecificHeat_J_kgK, 2299.6, 1e-3, 'c_s');
    expectRel(r.wet.ntuStar, 2.1425, 1e-3, 'NTU*');
    expectRel(r.wet.mStar, 0.4563, 1e-3, 'm*');
    expectRel(r.wet.effectivenessStar, 0.80225, 1e-3, 'eps*');
    expectRel(r.total_W, 26536, 1e-3, 'Q');
    expectRel(r.waterOutletTemperature_C, 12.265, 1e-3, 't_w,out');
    expectRel(r.airOutletTemperature_C, 10.241, 1e-3, 't_a,out');
    expectRel(r.airOutletHumidityRatio, 0.0075, 1e-3 + 0.00005 / 0.0075, 'W_out (printed to 5 decimals)');
    expectRel(r.condensate_kg_s * 1000, 3.7, 1e-3 + 0.005 / 3.7, 'condensate g/s (printed to 2 decimals)');
    expectRel(r.sensible_W + r.latent_W, r.total_W, 1e-12, 'sensible + latent');
  });
  it('K2: W_in 0.0080 → wet beats dry', () => {
    const r = wetCoilBraunKleinMitchell1989({ ...K1, airInletHumidityRatio: 0.008 });
    expect(r.surface).toBe('wet');
    expectRel(r.wet.total_W, 20082, 1e-3, 'Q wet');
    expectRel(r.dry.total_W, 18153, 1e-3, 'Q dry');
    expectRel(r.condensate_kg_s * 1000, 0.95, 1e-3 + 0.005 / 0.95, 'condensate g/s');
  });
  it('K2: W_in 0.0050 → the wet result would add moisture, so dry', () => {
    const r = wetCoilBraunKleinMitchell1989({ ...K1, airInletHumidityRatio: 0.005 });
    expect(r.wet.airOutletHumidityRatio).toBeGreaterThan(0.005);
    expectRel(r.wet.airOutletHumidityRatio, 0.00665, 1e-3 + 0.000005 / 0.00665, 'wet W_out');
    expect(r.surface).toBe('dry');
    expectRel(r.total_W, 18083, 1e-3, 'Q');
    expectRel(r.airOutletTemperature_C, 9.19, 1e-3, 't_a,out');
    expectRel(r.waterOutletTemperature_C, 10.588, 1e-3, 't_w,out');
    expect(r.condensate_kg_s).toBe(0);
  });
  it('refuses impossible inputs', () => {
    expect(() => wetCoilBraunKleinMitchell1989({ ...K1, uaAir_W_K: -1 })).toThrow(RangeError);
  });
});

describe('wet segment (source: [C] the wet-segment formulas of ENGINEERING.md 3.11)', () => {
  const hIn = 1006 * 27 + 0.0112 * (2_501_000 + 1860 * 27);
  const seg = {
    uaAir_W_K: 30,
    uaWater_W_K: 175,
    airMassFlowDry_kg_s: 0.01,
    airInletEnthalpy_J_kg: hIn,
    airInletTemperature_C: 27,
    waterInletTemperature_C: 7,
    waterCapacityRate_W_K: 210,
    pressure_Pa: 101325,
  };
  it('balances energy and satisfies its own c_s fixed point', () => {
    const r = wetSegmentBraunKleinMitchell1989(seg);
    expectRel(r.heat_W, seg.airMassFlowDry_kg_s * (hIn - r.airOutletEnthalpy_J_kg), 1e-12, 'air side');
    expectRel(r.heat_W, 210 * (r.waterOutletTemperature_C - 7), 1e-6, 'water side');
    const cs = (saturationEnthalpy_J_kg(r.waterOutletTemperature_C, 101325) - saturationEnthalpy_J_kg(7, 101325)) / (r.waterOutletTemperature_C - 7);
    expectRel(r.saturationSpecificHeat_J_kgK, cs, 1e-5, 'c_s chord');
    // The segment relation is the dry segment formula with enthalpies and starred capacities.
    const ua = 30 / 1006 / (1 + (cs * 30) / (1006 * 175));
    const pStar = segmentEffectivenessWaterMixed(ua, 0.01, 210 / cs);
    expectRel(r.heat_W, pStar * (210 / cs) * (hIn - saturationEnthalpy_J_kg(7, 101325)), 1e-6, 'Q');
    // Doc-comment example (regression value of this implementation; the formula is checked by K4 below).
    expectRel(r.heat_W, 280.589, 1e-5, 'Q example');
    expectRel(r.waterOutletTemperature_C, 8.33614, 1e-5, 't_w,out example');
    expectRel(r.airOutletTemperature_C, 9.5627, 1e-5, 't_a,out example');
    expectRel(r.airOutletHumidityRatio, 0.0071688, 1e-5, 'W_out example');
    expect(r.airOutletHumidityRatio).toBeLessThan(0.0112);
    expect(r.airOutletTemperature_C).toBeLessThan(27);
    expect(r.airOutletTemperature_C).toBeGreaterThan(r.waterOutletTemperature_C);
  });
  it.each([
    [2, 25938, 12.146],
    [4, 26510, 12.26],
  ])('K4: %i-row serpentine of wet segments, strip model, 10 segments per tube (source: [C] ENGINEERING.md check K4)', (rows, q, two) => {
    const segments = 10;
    const p = 101325;
    const cw = 1.2 * 4200;
    const hAirIn = 1006 * 27 + 0.0112 * (2_501_000 + 1860 * 27);
    // airIn[r][s]: air entering row r (0 = air-inlet row) in strip s.
    const airIn = Array.from({ length: rows + 1 }, () => Array.from({ length: segments }, () => ({ h: hAirIn, t: 27 })));
    let total = 0;
    let tWaterOut = 7;
    for (let sweep = 0; sweep < 200; sweep++) {
      let tw = 7;
      let qSum = 0;
      // Water enters the air-leaving row and runs toward row 0, reversing along the tube at every pass.
      for (let pass = 0; pass < rows; pass++) {
        const r = rows - 1 - pass;
        for (let k = 0; k < segments; k++) {
          const s = pass % 2 === 0 ? k : segments - 1 - k;
          const res = wetSegmentBraunKleinMitchell1989({
            uaAir_W_K: 3000 / (rows * segments),
            uaWater_W_K: 17500 / (rows * segments),
            airMassFlowDry_kg_s: 1.0 / segments,
            airInletEnthalpy_J_kg: airIn[r][s].h,
            airInletTemperature_C: airIn[r][s].t,
            waterInletTemperature_C: tw,
            waterCapacityRate_W_K: cw,
            pressure_Pa: p,
          });
          airIn[r + 1][s] = { h: res.airOutletEnthalpy_J_kg, t: res.airOutletTemperature_C };
          tw = res.waterOutletTemperature_C;
          qSum += res.heat_W;
        }
      }
      const converged = Math.abs(qSum - total) < 1e-6 * Math.abs(qSum);
      total = qSum;
      tWaterOut = tw;
      if (converged) break;
    }
    expectRel(total, q, 2e-3, 'Q');
    expectRel(tWaterOut, two, 2e-3, 't_w,out');
  });
});
