// Reference for the Braun–Klein–Mitchell wet-coil method: a numerical counterflow enthalpy-potential integration
// with the exact saturation curve (Lewis number 1), Threlkeld / Braun (1989) style (ENGINEERING.md 3.11, check K3).
// Not used by the solver; it measures how much BKM's linearised c_s under-predicts.
import {
  humidityRatioFromEnthalpy,
  moistAirState,
  saturationEnthalpy_J_kg,
} from '@/lib/engine/psychrometrics';
import { BKM_AIR_SPECIFIC_HEAT, type WetCoilInput } from '@/lib/engine/wet-coil';

/** Fixed-step schemes the integration offers. */
export type IntegrationScheme = 'rk4' | 'euler';

/** Step count of check K3. */
export const WET_COIL_INTEGRATION_DEFAULT_STEPS = 400;
/** Shooting on T_w,out: stop when the bracket is narrower than this or the residual below it [K]. */
const SHOOTING_TOL_K = 1e-10;
const SHOOTING_MAX_ITERATIONS = 200;
/** Local surface-temperature solve: bracket growth and stopping rules. */
const SURFACE_TOL_K = 1e-11;
const SURFACE_MAX_ITERATIONS = 200;
const SURFACE_FIRST_STEP_K = 0.5;
const SURFACE_MAX_EXPANSIONS = 12;

export interface WetCoilIntegrationResult {
  /** Heat from air to water Q = ṁ_a (h_a,in − h_a,out) [W]. */
  total_W: number;
  waterOutletTemperature_C: number;
  airOutletEnthalpy_J_kg: number;
  /** Leaving dry bulb from dT_a/da = −NTU_o (T_a − T_s) (Lewis 1, c_pa as in BKM's NTU_o) [°C]. */
  airOutletTemperature_C: number;
  /** W_out from (h_a,out, T_a,out), ASHRAE F-2017 ch. 1 eq. 32 [kg/kg]. */
  airOutletHumidityRatio: number;
  /** Water-temperature mismatch at the water inlet end after shooting [K]. */
  waterInletResidual_K: number;
  shootingIterations: number;
  steps: number;
  scheme: IntegrationScheme;
}

/**
 * Root of f inside a bracket [a, b] with f(a) f(b) ≤ 0 by the Illinois variant of regula falsi (the stale end's
 * value is halved when the same end is kept twice). Stops when the bracket is narrower than xTol, |f| ≤ fTol or after
 * maxIterations; always returns a point inside the bracket.
 */
function illinois(
  f: (x: number) => number,
  a0: number,
  fa0: number,
  b0: number,
  fb0: number,
  xTol: number,
  fTol: number,
  maxIterations: number,
): number {
  let a = a0;
  let fa = fa0;
  let b = b0;
  let fb = fb0;
  if (fa === 0) return a;
  for (let k = 0; k < maxIterations && Math.abs(b - a) > xTol && Math.abs(fb) > fTol; k++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (fc * fb < 0) {
      a = b;
      fa = fb;
    } else {
      fa /= 2;
    }
    b = c;
    fb = fc;
  }
  return b;
}

/**
 * Solves the local balance (UA_a/c_pa)(h_a − h_s(T_s)) = UA_w (T_s − T_w) for the surface temperature T_s.
 * The left side minus the right side decreases with T_s, so the root is bracketed by stepping away from T_w
 * (doubling steps) and then refined by the Illinois variant of regula falsi.
 */
function surfaceTemperature_C(ha: number, tw: number, gAir: number, uaw: number, p: number): number {
  const g = (ts: number): number => gAir * (ha - saturationEnthalpy_J_kg(ts, p)) - uaw * (ts - tw);
  const gw = g(tw);
  if (gw === 0) return tw;
  const dir = gw > 0 ? 1 : -1;
  let a = tw;
  let ga = gw;
  let step = SURFACE_FIRST_STEP_K;
  let b = tw + dir * step;
  let gb = g(b);
  for (let k = 0; gb * dir > 0; k++) {
    if (k >= SURFACE_MAX_EXPANSIONS) throw new RangeError(`no surface temperature found near ${tw} °C (h_a ${ha} J/kg)`);
    a = b;
    ga = gb;
    step *= 2;
    b = tw + dir * step;
    gb = g(b);
  }
  return illinois(g, a, ga, b, gb, SURFACE_TOL_K, 0, SURFACE_MAX_ITERATIONS);
}

interface MarchResult {
  airEnthalpy: number;
  airTemperature: number;
  waterTemperature: number;
}

/**
 * One pass from the air inlet (x = 0) to the water inlet (x = L) for a guessed water outlet temperature.
 * Per unit area fraction a = x/L: q(a) = (UA_a/c_pa)(h_a − h_s(T_s)); dh_a/da = −q/ṁ_a; dT_w/da = −q/(ṁ_w c_pw);
 * dT_a/da = −(UA_a/(ṁ_a c_pa))(T_a − T_s).
 */
function march(
  input: WetCoilInput,
  cpa: number,
  hai: number,
  twOut: number,
  steps: number,
  scheme: IntegrationScheme,
): MarchResult {
  const p = input.pressure_Pa;
  const ma = input.airMassFlowDry_kg_s;
  const cw = input.waterMassFlow_kg_s * input.waterSpecificHeat_J_kgK;
  const gAir = input.uaAir_W_K / cpa;
  const uaw = input.uaWater_W_K;
  const ntuO = input.uaAir_W_K / (ma * cpa);
  const out = [0, 0, 0];
  const rates = (ha: number, tw: number, ta: number, d: number[]): void => {
    const ts = surfaceTemperature_C(ha, tw, gAir, uaw, p);
    const q = gAir * (ha - saturationEnthalpy_J_kg(ts, p));
    d[0] = -q / ma;
    d[1] = -q / cw;
    d[2] = -ntuO * (ta - ts);
  };
  const h = 1 / steps;
  let ha = hai;
  let tw = twOut;
  let ta = input.airInletTemperature_C;
  if (scheme === 'euler') {
    for (let n = 0; n < steps; n++) {
      rates(ha, tw, ta, out);
      ha += h * out[0];
      tw += h * out[1];
      ta += h * out[2];
    }
  } else {
    const k1 = [0, 0, 0];
    const k2 = [0, 0, 0];
    const k3 = [0, 0, 0];
    const k4 = [0, 0, 0];
    for (let n = 0; n < steps; n++) {
      rates(ha, tw, ta, k1);
      rates(ha + 0.5 * h * k1[0], tw + 0.5 * h * k1[1], ta + 0.5 * h * k1[2], k2);
      rates(ha + 0.5 * h * k2[0], tw + 0.5 * h * k2[1], ta + 0.5 * h * k2[2], k3);
      rates(ha + h * k3[0], tw + h * k3[1], ta + h * k3[2], k4);
      ha += (h / 6) * (k1[0] + 2 * k2[0] + 2 * k3[0] + k4[0]);
      tw += (h / 6) * (k1[1] + 2 * k2[1] + 2 * k3[1] + k4[1]);
      ta += (h / 6) * (k1[2] + 2 * k2[2] + 2 * k3[2] + k4[2]);
    }
  }
  return { airEnthalpy: ha, airTemperature: ta, waterTemperature: tw };
}

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive and finite (got ${value})`);
}

/**
 * All-wet counterflow coil by numerical integration of the enthalpy-potential equations with the exact
 * saturation curve and Lewis number 1 (Threlkeld; Braun 1989 — ENGINEERING.md 3.11, check K3). The surface sits at
 * T_s, between the local water temperature and the air, through the water-side resistance. With a = x/L the
 * fraction of the coil area from the air inlet (air enters at a = 0, water at a = 1, flowing towards a = 0):
 *   local balance   (UA_a/c_pa)(h_a − h_s(T_s)) = UA_w (T_s − T_w)           → T_s (bracketed regula falsi)
 *   heat flux       dQ/da = (UA_a/c_pa)(h_a − h_s(T_s))
 *   air             dh_a/da = −(dQ/da)/ṁ_a,   dT_a/da = −(UA_a/(ṁ_a c_pa))(T_a − T_s)
 *   water           dT_w/da = −(dQ/da)/(ṁ_w c_pw)
 * Boundary conditions: h_a(0) = h_a,in, T_a(0) = T_a,in, T_w(1) = T_w,in. The two-point problem is solved by
 * shooting on T_w,out = T_w(0), bracketed between T_w,in and T_w,in + ṁ_a (h_a,in − h_s(T_w,in))/(ṁ_w c_pw)
 * (the largest possible duty) and refined by Illinois regula falsi until the residual T_w(1) − T_w,in is
 * below 1e−10 K.
 * Q = ṁ_a (h_a,in − h_a(1)); W_out from (h_a,out, T_a,out). h_s is ASHRAE F-2017 ch. 1 saturated-air enthalpy.
 * Units: kg/s, °C, kg/kg, Pa, J/(kg K), W/K. Validity: surface wet everywhere (no dry part is modelled); the
 * psychrometric range of 3.3.
 * @param input same inputs as wetCoilBraunKleinMitchell1989 (c_pa default 1006, v1 decision 13)
 * @param steps fixed steps over the coil (integer ≥ 1; check K3 uses 400)
 * @param scheme 'rk4' (classical Runge–Kutta, default) or 'euler' (explicit Euler)
 * Example (check K3, K1 inputs): RK4 400 steps → Q 26 638 W, t_w,out 12.285 °C; explicit Euler 400 steps →
 * 26 650 W, 12.288 °C. BKM gives 0.38 % less.
 */
export function wetCoilCounterflowEnthalpyIntegration(
  input: WetCoilInput,
  steps: number = WET_COIL_INTEGRATION_DEFAULT_STEPS,
  scheme: IntegrationScheme = 'rk4',
): WetCoilIntegrationResult {
  checkPositive('air mass flow', input.airMassFlowDry_kg_s);
  checkPositive('water mass flow', input.waterMassFlow_kg_s);
  checkPositive('water specific heat', input.waterSpecificHeat_J_kgK);
  checkPositive('air-side UA', input.uaAir_W_K);
  checkPositive('water-side UA', input.uaWater_W_K);
  const cpa = input.airSpecificHeat_J_kgK ?? BKM_AIR_SPECIFIC_HEAT;
  checkPositive('air specific heat', cpa);
  if (!(Number.isInteger(steps) && steps >= 1)) throw new RangeError(`steps must be a positive integer (got ${steps})`);
  const p = input.pressure_Pa;
  const ma = input.airMassFlowDry_kg_s;
  const cw = input.waterMassFlow_kg_s * input.waterSpecificHeat_J_kgK;
  const twi = input.waterInletTemperature_C;
  const hai = moistAirState({ dryBulb_C: input.airInletTemperature_C, humidityRatio: input.airInletHumidityRatio, pressure_Pa: p })
    .enthalpy_J_kg;
  const maxDuty = ma * (hai - saturationEnthalpy_J_kg(twi, p));

  const finish = (m: MarchResult, twOut: number, iterations: number): WetCoilIntegrationResult => ({
    total_W: ma * (hai - m.airEnthalpy),
    waterOutletTemperature_C: twOut,
    airOutletEnthalpy_J_kg: m.airEnthalpy,
    airOutletTemperature_C: m.airTemperature,
    airOutletHumidityRatio: humidityRatioFromEnthalpy(m.airEnthalpy, m.airTemperature),
    waterInletResidual_K: m.waterTemperature - twi,
    shootingIterations: iterations,
    steps,
    scheme,
  });
  if (maxDuty === 0) return finish(march(input, cpa, hai, twi, steps, scheme), twi, 0);

  // Residual r(T_w,out) = T_w(1) − T_w,in grows with the guess; the bracket ends have opposite signs.
  const residual = (twOut: number): { r: number; m: MarchResult } => {
    const m = march(input, cpa, hai, twOut, steps, scheme);
    return { r: m.waterTemperature - twi, m };
  };
  const lo = Math.min(twi, twi + maxDuty / cw);
  const hi = Math.max(twi, twi + maxDuty / cw);
  const rLo = residual(lo).r;
  const rHi = residual(hi).r;
  if (!(rLo <= 0 && rHi >= 0)) {
    throw new RangeError(`water outlet temperature not bracketed in [${lo}, ${hi}] °C (residuals ${rLo}, ${rHi} K)`);
  }
  let iterations = 2;
  const twOut = illinois(
    (x) => {
      iterations++;
      return residual(x).r;
    },
    lo,
    rLo,
    hi,
    rHi,
    SHOOTING_TOL_K,
    SHOOTING_TOL_K,
    SHOOTING_MAX_ITERATIONS,
  );
  return finish(residual(twOut).m, twOut, iterations);
}
