// Wet (dehumidifying) coil by the enthalpy-based ε-NTU method of Braun, Klein & Mitchell (1989), ASHRAE Trans.
// 95(2), in the form of ENGINEERING.md 3.11 (as in the LBL Modelica Buildings WetCalcs; Mitchell & Braun 2012).
import {
  humidityRatioFromEnthalpy,
  moistAirSpecificHeat_J_kgK,
  saturationEnthalpy_J_kg,
  saturationSpecificHeat_J_kgK,
  saturationTemperatureFromEnthalpy_C,
} from '@/lib/engine/psychrometrics';

/** c_pa of dry air inside the BKM formulas (v1 decision 13) [J/(kg K)]. */
export const BKM_AIR_SPECIFIC_HEAT = 1006;
/** Controls of the c_s fixed-point iteration on the water outlet temperature. */
const CS_MAX_ITERATIONS = 30;
const CS_TOL_K = 1e-7;

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive and finite (got ${value})`);
}

/** Counterflow effectiveness written on the air side, valid for any R = C_a/C_w (also R > 1). */
function counterflowAirSide(ntu: number, r: number): number {
  if (Math.abs(1 - r) < 1e-9) return ntu / (1 + ntu);
  const e = Math.exp(-ntu * (1 - r));
  return (1 - e) / (1 - r * e);
}

/** Leaving-air temperature and humidity from the effective-surface construction of ENGINEERING.md 3.11. */
function leavingAir(
  hIn: number,
  hOut: number,
  tIn: number,
  uaAir: number,
  mAir: number,
  cpa: number,
  p: number,
): { temperature_C: number; humidityRatio: number; effectiveSurfaceTemperature_C: number } {
  const ntuO = uaAir / (mAir * cpa);
  const decay = Math.exp(-ntuO);
  const hsEff = hIn - (hIn - hOut) / (1 - decay);
  const tsEff = saturationTemperatureFromEnthalpy_C(hsEff, p);
  const tOut = tsEff + (tIn - tsEff) * decay;
  return { temperature_C: tOut, humidityRatio: humidityRatioFromEnthalpy(hOut, tOut), effectiveSurfaceTemperature_C: tsEff };
}

/** Inputs of the whole-coil BKM calculation (counterflow). */
export interface WetCoilInput {
  /** Dry-air mass flow ṁ_a [kg/s]. */
  airMassFlowDry_kg_s: number;
  airInletTemperature_C: number;
  airInletHumidityRatio: number;
  pressure_Pa: number;
  waterMassFlow_kg_s: number;
  waterSpecificHeat_J_kgK: number;
  waterInletTemperature_C: number;
  /** UA_a = η_o,w h_o A_o [W/K] (wet fin efficiency). */
  uaAir_W_K: number;
  /** UA_w = [1/(h_i A_i) + wall + fouling]^−1 [W/K]. */
  uaWater_W_K: number;
  /** c_pa in UA* and NTU_o [J/(kg K)]; default 1006 (v1 decision 13). */
  airSpecificHeat_J_kgK?: number;
}

/** Result of one operating assumption (all wet or all dry). */
export interface CoilPerformance {
  total_W: number;
  sensible_W: number;
  latent_W: number;
  waterOutletTemperature_C: number;
  airOutletTemperature_C: number;
  airOutletHumidityRatio: number;
  airOutletEnthalpy_J_kg: number;
  condensate_kg_s: number;
}

export interface WetCoilDetails extends CoilPerformance {
  saturationSpecificHeat_J_kgK: number;
  ntuStar: number;
  mStar: number;
  effectivenessStar: number;
}

export interface WetCoilResult extends CoilPerformance {
  /** Which assumption the dry/wet rule chose. */
  surface: 'wet' | 'dry';
  wet: WetCoilDetails;
  dry: CoilPerformance;
}

/**
 * Whole-coil counterflow cooling coil by Braun, Klein & Mitchell (1989) with the dry/wet rule (ENGINEERING.md 3.11):
 *  wet: c_s = [h_s(T_w,out) − h_s(T_w,in)]/(T_w,out − T_w,in) (iterated from T_w,in + 5 K), m* = ṁ_a c_s/(ṁ_w c_pw),
 *       UA* = (UA_a/c_pa)/(1 + c_s UA_a/(c_pa UA_w)), NTU* = UA* / ṁ_a, ε* counterflow (air side),
 *       Q = ε* ṁ_a (h_a,in − h_s(T_w,in)); leaving air from h_s,eff = h_a,in − (h_a,in − h_a,out)/(1 − e^{−NTU_o}),
 *       NTU_o = UA_a/(ṁ_a c_pa), T_a,out = T_s,eff + (T_a,in − T_s,eff) e^{−NTU_o}, W_out from (h_a,out, T_a,out);
 *  dry: ε-NTU counterflow with UA = (1/UA_a + 1/UA_w)^−1, C_a = ṁ_a (1006 + 1860 W_in);
 *  rule: dry if the wet result has W_out ≥ W_in or Q_wet < Q_dry, else wet.
 * Units: kg/s, °C, kg/kg, Pa, J/(kg K), W/K. Validity: psychrometric range of 3.3; coil fully counterflow.
 * Example (check K1): ṁ_a 1.0, 27 °C, W 0.0112, 101 325 Pa, ṁ_w 1.2, c_pw 4200, 7 °C, UA_a 3000, UA_w 17 500 →
 * wet, Q 26 536 W, t_w,out 12.265 °C, t_a,out 10.241 °C, W_out 0.00750.
 */
export function wetCoilBraunKleinMitchell1989(input: WetCoilInput): WetCoilResult {
  const ma = input.airMassFlowDry_kg_s;
  const mw = input.waterMassFlow_kg_s;
  const cpw = input.waterSpecificHeat_J_kgK;
  const cpa = input.airSpecificHeat_J_kgK ?? BKM_AIR_SPECIFIC_HEAT;
  const p = input.pressure_Pa;
  const tai = input.airInletTemperature_C;
  const wi = input.airInletHumidityRatio;
  const twi = input.waterInletTemperature_C;
  checkPositive('air mass flow', ma);
  checkPositive('water mass flow', mw);
  checkPositive('water specific heat', cpw);
  checkPositive('air specific heat', cpa);
  checkPositive('air-side UA', input.uaAir_W_K);
  checkPositive('water-side UA', input.uaWater_W_K);
  const cpm = moistAirSpecificHeat_J_kgK(wi);
  const hai = 1006 * tai + wi * (2_501_000 + 1860 * tai); // ASHRAE F-2017 ch. 1 eq. 32
  const cw = mw * cpw;

  // All wet.
  const hswi = saturationEnthalpy_J_kg(twi, p);
  let two = twi + 5;
  let cs = 0;
  let ntuStar = 0;
  let mStar = 0;
  let epsStar = 0;
  let qWet = 0;
  for (let k = 0; k < CS_MAX_ITERATIONS; k++) {
    cs = saturationSpecificHeat_J_kgK(twi, two, p);
    mStar = (ma * cs) / cw;
    ntuStar = input.uaAir_W_K / cpa / (1 + (cs * input.uaAir_W_K) / (cpa * input.uaWater_W_K)) / ma;
    epsStar = counterflowAirSide(ntuStar, mStar);
    qWet = epsStar * ma * (hai - hswi);
    const next = twi + qWet / cw;
    const done = Math.abs(next - two) < CS_TOL_K;
    two = next;
    if (done) break;
  }
  const haoWet = hai - qWet / ma;
  const airWet = leavingAir(hai, haoWet, tai, input.uaAir_W_K, ma, cpa, p);
  const sensibleWet = ma * cpm * (tai - airWet.temperature_C);
  const wet: WetCoilDetails = {
    total_W: qWet,
    sensible_W: sensibleWet,
    latent_W: qWet - sensibleWet,
    waterOutletTemperature_C: two,
    airOutletTemperature_C: airWet.temperature_C,
    airOutletHumidityRatio: airWet.humidityRatio,
    airOutletEnthalpy_J_kg: haoWet,
    condensate_kg_s: ma * (wi - airWet.humidityRatio),
    saturationSpecificHeat_J_kgK: cs,
    ntuStar,
    mStar,
    effectivenessStar: epsStar,
  };

  // All dry.
  const ua = 1 / (1 / input.uaAir_W_K + 1 / input.uaWater_W_K);
  const ca = ma * cpm;
  const epsAir = counterflowAirSide(ua / ca, ca / cw);
  const qDry = epsAir * ca * (tai - twi);
  const taoDry = tai - qDry / ca;
  const dry: CoilPerformance = {
    total_W: qDry,
    sensible_W: qDry,
    latent_W: 0,
    waterOutletTemperature_C: twi + qDry / cw,
    airOutletTemperature_C: taoDry,
    airOutletHumidityRatio: wi,
    airOutletEnthalpy_J_kg: 1006 * taoDry + wi * (2_501_000 + 1860 * taoDry),
    condensate_kg_s: 0,
  };

  const useDry = wet.airOutletHumidityRatio >= wi || Math.abs(qWet) < Math.abs(qDry);
  const chosen: CoilPerformance = useDry ? dry : wet;
  return {
    total_W: chosen.total_W,
    sensible_W: chosen.sensible_W,
    latent_W: chosen.latent_W,
    waterOutletTemperature_C: chosen.waterOutletTemperature_C,
    airOutletTemperature_C: chosen.airOutletTemperature_C,
    airOutletHumidityRatio: chosen.airOutletHumidityRatio,
    airOutletEnthalpy_J_kg: chosen.airOutletEnthalpy_J_kg,
    condensate_kg_s: chosen.condensate_kg_s,
    surface: useDry ? 'dry' : 'wet',
    wet,
    dry,
  };
}

/** Inputs of one wet segment of the tube-by-tube solver. */
export interface WetSegmentInput {
  /** UA_a,s = η_o,w h_o A_o,s [W/K]. */
  uaAir_W_K: number;
  /** UA_w,s [W/K]. */
  uaWater_W_K: number;
  /** Dry-air mass flow crossing the segment ṁ_a,s [kg/s]. */
  airMassFlowDry_kg_s: number;
  airInletEnthalpy_J_kg: number;
  airInletTemperature_C: number;
  waterInletTemperature_C: number;
  /** ṁ_w c_pw [W/K]. */
  waterCapacityRate_W_K: number;
  pressure_Pa: number;
  /** c_pa [J/(kg K)]; default 1006 (v1 decision 13). */
  airSpecificHeat_J_kgK?: number;
}

export interface WetSegmentResult {
  /** Heat from air to water [W] (positive when the air is cooled). */
  heat_W: number;
  waterOutletTemperature_C: number;
  airOutletEnthalpy_J_kg: number;
  airOutletTemperature_C: number;
  airOutletHumidityRatio: number;
  /** c_s used (chord between the segment's water inlet and outlet temperatures) [J/(kg K)]. */
  saturationSpecificHeat_J_kgK: number;
}

/**
 * One wet segment (water mixed, air unmixed), Braun, Klein & Mitchell (1989) applied to the segment formula of
 * ENGINEERING.md 3.10/3.11: c_s chord between T_w,in and T_w,out (fixed point, ≤ 30 iterations, 1e−7 K),
 * C_w* = ṁ_w c_pw / c_s, UA_s* = (UA_a,s/c_pa)/(1 + c_s UA_a,s/(c_pa UA_w,s)), NTU_s* = UA_s* / ṁ_a,s,
 * P* = 1 − exp[−(ṁ_a,s/C_w*)(1 − e^{−NTU_s*})], Q_s = P* C_w* (h_a,in − h_s(T_w,in)),
 * T_w,out = T_w,in + Q_s/(ṁ_w c_pw), h_a,out = h_a,in − Q_s/ṁ_a,s, leaving T and W from the h_s,eff construction
 * with NTU_o,s = UA_a,s/(ṁ_a,s c_pa).
 * Units: W/K, kg/s, J/kg, °C, Pa. Validity: a wet surface (the caller decides, v1 decision 11).
 * Example: UA_a 30, UA_w 175 W/K, ṁ_a 0.01 kg/s, air 27 °C / W 0.0112 (h 55 735.664 J/kg), water 7 °C,
 * C_w 210 W/K, 101 325 Pa → Q 280.589 W, t_w,out 8.33614 °C, t_a,out 9.5627 °C, W_out 0.0071688.
 */
export function wetSegmentBraunKleinMitchell1989(input: WetSegmentInput): WetSegmentResult {
  const ma = input.airMassFlowDry_kg_s;
  const cw = input.waterCapacityRate_W_K;
  const cpa = input.airSpecificHeat_J_kgK ?? BKM_AIR_SPECIFIC_HEAT;
  const p = input.pressure_Pa;
  checkPositive('air mass flow', ma);
  checkPositive('water capacity rate', cw);
  checkPositive('air specific heat', cpa);
  checkPositive('air-side UA', input.uaAir_W_K);
  checkPositive('water-side UA', input.uaWater_W_K);
  const twi = input.waterInletTemperature_C;
  const hai = input.airInletEnthalpy_J_kg;
  const hswi = saturationEnthalpy_J_kg(twi, p);
  const uaStarBase = input.uaAir_W_K / cpa;
  const expAir = (cs: number): number => 1 - Math.exp(-uaStarBase / (1 + (cs * input.uaAir_W_K) / (cpa * input.uaWater_W_K)) / ma);
  let two = twi;
  let cs = 0;
  let q = 0;
  for (let k = 0; k < CS_MAX_ITERATIONS; k++) {
    cs = saturationSpecificHeat_J_kgK(twi, two, p);
    const cwStar = cw / cs;
    const pStar = 1 - Math.exp(-(ma / cwStar) * expAir(cs));
    q = pStar * cwStar * (hai - hswi);
    const next = twi + q / cw;
    const done = Math.abs(next - two) < CS_TOL_K;
    two = next;
    if (done) break;
  }
  const hao = hai - q / ma;
  const air = leavingAir(hai, hao, input.airInletTemperature_C, input.uaAir_W_K, ma, cpa, p);
  return {
    heat_W: q,
    waterOutletTemperature_C: two,
    airOutletEnthalpy_J_kg: hao,
    airOutletTemperature_C: air.temperature_C,
    airOutletHumidityRatio: air.humidityRatio,
    saturationSpecificHeat_J_kgK: cs,
  };
}
