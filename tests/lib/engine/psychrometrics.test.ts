import { describe, expect, it } from 'vitest';
import {
  airConductivity_W_mK,
  airViscositySutherland_Pa_s,
  dewPointFromHumidityRatio_C,
  humidityRatioFromEnthalpy,
  moistAirSpecificHeat_J_kgK,
  moistAirState,
  saturationEnthalpy_J_kg,
  saturationSpecificHeat_J_kgK,
  saturationTemperatureFromEnthalpy_C,
  saturationVapourPressure_Pa,
  standardPressure_Pa,
  wetBulbFromHumidityRatio_C,
} from '@/lib/engine/psychrometrics';
import { expectAbs, expectRel } from '@/tests/lib/engine/expect-close';

const P0 = 101325;

describe('ASHRAE F-2017 ch. 1 values', () => {
  it.each([
    [-20, 103.24],
    [-5, 401.74],
    [5, 872.6],
    [25, 3169.7],
    [50, 12351.3],
    [100, 101418],
    [150, 476101.4],
  ])('P1: p_ws at %f °C (source: ASHRAE F-2017 ch. 1 table 3 via psychrolib tests)', (t, p) => {
    expectRel(saturationVapourPressure_Pa(t), p, 3e-4, 'p_ws');
  });
  it('P2/P3: W_s and h_s at 101 325 Pa (source: ASHRAE table 2 via psychrolib tests)', () => {
    for (const [t, ws, tol, hs] of [
      [5, 0.005425, 0.005, 18639],
      [25, 0.020173, 0.005, 76504],
      [50, 0.086863, 0.01, 275353],
    ]) {
      const st = moistAirState({ dryBulb_C: t, relativeHumidity: 1, pressure_Pa: P0 });
      expectRel(st.humidityRatio, ws, tol, `W_s ${t}`);
      expectRel(saturationEnthalpy_J_kg(t, P0), hs, 0.01, `h_s ${t}`);
    }
    // The formula value at 25 °C quoted in ENGINEERING.md P3 ([C]).
    expectRel(saturationEnthalpy_J_kg(25, P0), 76306.7, 2e-6, 'h_s formula');
  });
  it('P4: ASHRAE Example 1, 40 °C db / 20 °C wb (source: ASHRAE F-2017 ch. 1 Example 1 via psychrolib tests; exact outputs psychrolib 1.1.1 [C])', () => {
    const st = moistAirState({ dryBulb_C: 40, wetBulb_C: 20, pressure_Pa: P0 });
    expectAbs(st.humidityRatio, 0.0065, 0.0001, 'W (handbook)');
    expectAbs(st.enthalpy_J_kg / 1000, 56.7, 0.1, 'h (handbook)');
    expectAbs(st.relativeHumidity, 0.14, 0.01, 'RH (handbook)');
    expectRel(st.specificVolume_m3_kg, 0.896, 0.01, 'v (handbook)');
    expectRel(st.humidityRatio, 0.00640079, 1e-6, 'W');
    expectRel(st.dewPoint_C, 7.4336, 1e-5, 't_dp');
    expectRel(st.relativeHumidity, 0.139795, 1e-5, 'RH');
    expectRel(st.enthalpy_J_kg, 56724.6, 1e-6, 'h');
    expectRel(st.specificVolume_m3_kg, 0.896248, 1e-6, 'v');
  });
  it.each([
    [500, 95461],
    [1000, 89875],
    [4000, 61640],
  ])('P5: standard pressure at %f m (source: ASHRAE table 1 via psychrolib tests)', (z, p) => {
    expectAbs(standardPressure_Pa(z), p, 1, 'p');
  });
  it('P6: 30 °C, W 0.02, 95 461 Pa (source: psychrolib tests)', () => {
    const st = moistAirState({ dryBulb_C: 30, humidityRatio: 0.02, pressure_Pa: 95461 });
    expectRel(st.enthalpy_J_kg, 81316, 3e-4, 'h');
    expectRel(st.specificVolume_m3_kg, 0.940855, 3e-4, 'v');
    expectRel(st.moistDensity_kg_m3, 1.08412, 3e-4, 'rho');
  });
  it('P7: coil inlet 27 °C, W 0.0112 (source: psychrolib [C])', () => {
    const st = moistAirState({ dryBulb_C: 27, humidityRatio: 0.0112, pressure_Pa: P0 });
    expectRel(st.wetBulb_C, 19.576, 1e-4, 't*');
    expectRel(st.dewPoint_C, 15.774, 1e-4, 't_dp');
    expectRel(st.relativeHumidity, 0.50245, 1e-4, 'RH');
    expectRel(st.moistDensity_kg_m3, 1.1682, 1e-4, 'rho');
    expectRel(wetBulbFromHumidityRatio_C(27, 0.0112, P0), 19.576, 1e-4, 't* direct');
    expectRel(dewPointFromHumidityRatio_C(0.0112, P0), 15.774, 1e-4, 't_dp direct');
  });
});

describe('inverses and helpers (source: [C] consistency with the formulas of ENGINEERING.md 3.3)', () => {
  it('saturation temperature inverts saturation enthalpy', () => {
    for (const t of [-10, 2, 7, 12.5, 25, 45]) {
      expectAbs(saturationTemperatureFromEnthalpy_C(saturationEnthalpy_J_kg(t, P0), P0), t, 1e-7, `t ${t}`);
    }
    expect(() => saturationTemperatureFromEnthalpy_C(1e7, P0)).toThrow(RangeError);
  });
  it('humidity ratio from enthalpy inverts eq. 32', () => {
    expectRel(humidityRatioFromEnthalpy(56724.6, 40), 0.00640079, 1e-5, 'W');
    expect(() => humidityRatioFromEnthalpy(1000, 40)).toThrow(RangeError);
  });
  it('c_s chord slope, and the derivative at equal temperatures', () => {
    const chord = saturationSpecificHeat_J_kgK(7, 12.265, P0);
    expectRel(chord, 2299.6, 1e-3, 'c_s (K1 value)');
    const d = saturationSpecificHeat_J_kgK(10, 10, P0);
    expectRel(d, (saturationEnthalpy_J_kg(10.5, P0) - saturationEnthalpy_J_kg(9.5, P0)) / 1, 1e-3, 'derivative');
  });
  it('c_pm = 1006 + 1860 W', () => {
    expect(moistAirSpecificHeat_J_kgK(0.01)).toBeCloseTo(1024.6, 10);
  });
  it('air transport at 25 °C (source: US Standard Atmosphere 1976 forms, values [C] in ENGINEERING.md 3.3)', () => {
    expectRel(airViscositySutherland_Pa_s(298.15), 1.837e-5, 5e-4, 'mu');
    expectRel(airConductivity_W_mK(298.15), 0.02611, 5e-4, 'k');
  });
  it('refuses impossible states', () => {
    expect(() => moistAirState({ dryBulb_C: 20, wetBulb_C: 25, pressure_Pa: P0 })).toThrow(RangeError);
    expect(() => moistAirState({ dryBulb_C: 20, pressure_Pa: P0 })).toThrow(RangeError);
    expect(() => moistAirState({ dryBulb_C: 20, humidityRatio: 0.05, pressure_Pa: P0 })).toThrow(/saturation/);
    expect(() => standardPressure_Pa(20000)).toThrow(RangeError);
  });
});
