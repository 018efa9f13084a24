import { describe, expect, it } from 'vitest';
import { wetCoilCounterflowEnthalpyIntegration } from '@/lib/engine/wet-coil-integration';
import { wetCoilBraunKleinMitchell1989 } from '@/lib/engine/wet-coil';
import { expectAbs, expectRel } from '@/tests/lib/engine/expect-close';

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

describe('counterflow enthalpy-potential integration (source: computed from the formulas in ENGINEERING.md section 3.11, check K3)', () => {
  const rk4 = wetCoilCounterflowEnthalpyIntegration(K1, 400, 'rk4');
  const euler = wetCoilCounterflowEnthalpyIntegration(K1, 400, 'euler');

  it('K3: converged integral (RK4, 400 steps) Q 26 638 W, t_w,out 12.285 °C', () => {
    expectRel(rk4.total_W, 26638, 2e-3, 'Q (K3 tolerance 0.2 %)');
    expectRel(rk4.waterOutletTemperature_C, 12.285, 2e-3, 't_w,out (K3 tolerance 0.2 %)');
    // Tighter: to the printed digits.
    expectAbs(rk4.total_W, 26638, 0.5, 'Q printed digits');
    expectAbs(rk4.waterOutletTemperature_C, 12.285, 5e-4, 't_w,out printed digits');
    expectAbs(rk4.waterInletResidual_K, 0, 1e-9, 'shooting residual at the water inlet');
  });

  it('K3: 400-step explicit Euler gives 26 650 W, 12.288 °C', () => {
    expectRel(euler.total_W, 26650, 2e-3, 'Q (K3 tolerance 0.2 %)');
    expectRel(euler.waterOutletTemperature_C, 12.288, 2e-3, 't_w,out (K3 tolerance 0.2 %)');
    expectAbs(euler.total_W, 26650, 0.5, 'Q printed digits');
    expectAbs(euler.waterOutletTemperature_C, 12.288, 5e-4, 't_w,out printed digits');
  });

  it('K3: BKM is 0.38 % lower (W_in 0.0112) and 0.47 % lower (W_in 0.014)', () => {
    const deficit = (w: number): number => {
      const input = { ...K1, airInletHumidityRatio: w };
      const bkm = wetCoilBraunKleinMitchell1989(input);
      expect(bkm.surface).toBe('wet');
      return 1 - bkm.total_W / wetCoilCounterflowEnthalpyIntegration(input, 400).total_W;
    };
    // The deficits are printed to 0.01 %: half a unit of that digit.
    expectAbs(deficit(0.0112), 0.0038, 0.00005, 'BKM deficit, W_in 0.0112');
    expectAbs(deficit(0.014), 0.0047, 0.00005, 'BKM deficit, W_in 0.014');
  });

  it('is self-consistent: energy balance, RK4 step-converged, Euler first-order, air dehumidified', () => {
    const cw = K1.waterMassFlow_kg_s * K1.waterSpecificHeat_J_kgK;
    expectRel(rk4.total_W, cw * (rk4.waterOutletTemperature_C - K1.waterInletTemperature_C), 1e-8, 'air side = water side');
    expectRel(wetCoilCounterflowEnthalpyIntegration(K1, 50).total_W, rk4.total_W, 1e-6, 'RK4 50 vs 400 steps');
    const euler800 = wetCoilCounterflowEnthalpyIntegration(K1, 800, 'euler');
    const ratio = (euler.total_W - rk4.total_W) / (euler800.total_W - rk4.total_W);
    expect(ratio).toBeGreaterThan(1.8);
    expect(ratio).toBeLessThan(2.2);
    expect(rk4.airOutletHumidityRatio).toBeLessThan(K1.airInletHumidityRatio);
    expect(rk4.airOutletTemperature_C).toBeGreaterThan(K1.waterInletTemperature_C);
    expect(rk4.airOutletTemperature_C).toBeLessThan(K1.airInletTemperature_C);
  });

  it('refuses impossible inputs', () => {
    expect(() => wetCoilCounterflowEnthalpyIntegration(K1, 0)).toThrow(RangeError);
    expect(() => wetCoilCounterflowEnthalpyIntegration(K1, 2.5)).toThrow(RangeError);
    expect(() => wetCoilCounterflowEnthalpyIntegration({ ...K1, uaWater_W_K: 0 })).toThrow(RangeError);
    expect(() => wetCoilCounterflowEnthalpyIntegration({ ...K1, airMassFlowDry_kg_s: -1 })).toThrow(RangeError);
  });
});
