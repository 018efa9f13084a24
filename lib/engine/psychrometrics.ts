// Moist-air psychrometrics for the solver, all SI (°C, Pa, kg/kg dry air, J/kg dry air): thin wrappers over the
// npm package `psychrolib`, which implements ASHRAE Handbook—Fundamentals 2017 ch. 1 (ENGINEERING.md 3.3), plus
// the bracketed inverses the wet-coil method needs and the dry-air transport properties of 3.3.
import psychrolib from 'psychrolib';

psychrolib.SetUnitSystem(psychrolib.SI);

/** Temperature bounds of the ASHRAE saturation-pressure equations used by psychrolib [°C]. */
const T_MIN_C = -100;
const T_MAX_C = 200;
/** Bisection controls for the inverses below. */
const BISECTION_MAX_ITERATIONS = 200;
const BISECTION_TOL_K = 1e-9;

/** Runs a psychrolib call and turns its plain Errors (invalid input, no convergence) into RangeErrors. */
function guarded<T>(what: string, fn: () => T): T {
  try {
    return fn();
  } catch (e) {
    if (e instanceof RangeError) throw e;
    throw new RangeError(`${what}: ${e instanceof Error ? e.message : String(e)}`, { cause: e });
  }
}

function checkTemperature(name: string, t_C: number): void {
  if (!(t_C >= T_MIN_C && t_C <= T_MAX_C)) throw new RangeError(`${name} must be within ${T_MIN_C}–${T_MAX_C} °C (got ${t_C} °C)`);
}

function checkPressure(p: number): void {
  if (!(p >= 10_000 && p <= 200_000)) throw new RangeError(`air pressure must be within 10–200 kPa (got ${p} Pa)`);
}

function checkHumidityRatio(w: number): void {
  if (!(w >= 0 && w < 1)) throw new RangeError(`humidity ratio must be within [0, 1) kg/kg (got ${w})`);
}

/** Increasing function bisection on [lo, hi] for f(x) = target. */
function bisectIncreasing(f: (x: number) => number, target: number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let k = 0; k < BISECTION_MAX_ITERATIONS && b - a > BISECTION_TOL_K; k++) {
    const mid = 0.5 * (a + b);
    if (f(mid) < target) a = mid;
    else b = mid;
  }
  return 0.5 * (a + b);
}

/**
 * Standard barometric pressure at an altitude, ASHRAE F-2017 ch. 1 eq. 3: p = 101 325 (1 − 2.25577e−5 Z)^5.2559.
 * @param altitude_m Z [m], −500 to 11 000
 * @returns p [Pa]
 * Example: 1000 m → 89 875 Pa (ASHRAE table 1).
 */
export function standardPressure_Pa(altitude_m: number): number {
  if (!(altitude_m >= -500 && altitude_m <= 11_000)) throw new RangeError(`altitude must be within −500–11 000 m (got ${altitude_m} m)`);
  return psychrolib.GetStandardAtmPressure(altitude_m);
}

/**
 * Saturation vapour pressure over water (t > 0.01 °C) or ice, Hyland–Wexler, ASHRAE F-2017 ch. 1 eqs. 5–6.
 * @param t_C temperature [°C], −100 to 200
 * @returns p_ws [Pa]
 * Example: 25 °C → 3169.7 Pa (ASHRAE table 3).
 */
export function saturationVapourPressure_Pa(t_C: number): number {
  checkTemperature('temperature', t_C);
  return psychrolib.GetSatVapPres(t_C);
}

/** A complete moist-air state (per kg of dry air where specific). */
export interface MoistAirState {
  dryBulb_C: number;
  wetBulb_C: number;
  dewPoint_C: number;
  humidityRatio: number;
  relativeHumidity: number;
  enthalpy_J_kg: number;
  moistDensity_kg_m3: number;
  specificVolume_m3_kg: number;
}

/** Inputs of moistAirState: dry bulb and pressure plus exactly one of wet bulb, relative humidity, humidity ratio. */
export interface MoistAirInput {
  dryBulb_C: number;
  wetBulb_C?: number;
  relativeHumidity?: number;
  humidityRatio?: number;
  pressure_Pa: number;
}

/**
 * Moist-air state from dry bulb and one humidity measure, ASHRAE F-2017 ch. 1 (via psychrolib): W from the wet bulb
 * (eqs. 33/35) or from RH (eqs. 20, 22); dew point by inverting eqs. 5–6; h = 1006 t + W(2 501 000 + 1860 t) (eq. 32);
 * v = 287.042 (t + 273.15)(1 + 1.607858 W)/p (eq. 26); ρ = (1 + W)/v.
 * @param input dry bulb [°C] −100–200, pressure [Pa] 10–200 kPa, and exactly one of wet bulb [°C] (≤ dry bulb),
 *   relative humidity [-] 0–1, humidity ratio [kg/kg]
 * Example: 40 °C db, 20 °C wb, 101 325 Pa → W 0.00640079, h 56 724.6 J/kg (ASHRAE Example 1).
 */
export function moistAirState(input: MoistAirInput): MoistAirState {
  const { dryBulb_C: t, pressure_Pa: p } = input;
  checkTemperature('dry bulb', t);
  checkPressure(p);
  const given = [input.wetBulb_C, input.relativeHumidity, input.humidityRatio].filter((v) => v !== undefined).length;
  if (given !== 1) throw new RangeError('give exactly one of wet bulb, relative humidity or humidity ratio');
  let w: number;
  if (input.wetBulb_C !== undefined) {
    const twb = input.wetBulb_C;
    checkTemperature('wet bulb', twb);
    if (twb > t) throw new RangeError(`wet bulb ${twb} °C cannot exceed dry bulb ${t} °C`);
    w = guarded('humidity ratio from wet bulb', () => psychrolib.GetHumRatioFromTWetBulb(t, twb, p));
  } else if (input.relativeHumidity !== undefined) {
    const rh = input.relativeHumidity;
    if (!(rh >= 0 && rh <= 1)) throw new RangeError(`relative humidity must be within 0–1 (got ${rh})`);
    w = guarded('humidity ratio from relative humidity', () => psychrolib.GetHumRatioFromRelHum(t, rh, p));
  } else {
    w = input.humidityRatio as number;
    checkHumidityRatio(w);
  }
  const rh = guarded('relative humidity', () => psychrolib.GetRelHumFromHumRatio(t, w, p));
  if (rh > 1 + 1e-9) throw new RangeError(`humidity ratio ${w} exceeds saturation at ${t} °C (RH ${rh.toFixed(3)})`);
  const v = psychrolib.GetMoistAirVolume(t, w, p);
  return {
    dryBulb_C: t,
    wetBulb_C: guarded('wet bulb', () => psychrolib.GetTWetBulbFromHumRatio(t, w, p)),
    dewPoint_C: dewPointFromHumidityRatio_C(w, p),
    humidityRatio: w,
    relativeHumidity: rh,
    enthalpy_J_kg: psychrolib.GetMoistAirEnthalpy(t, w),
    moistDensity_kg_m3: (1 + w) / v,
    specificVolume_m3_kg: v,
  };
}

/**
 * Enthalpy of saturated moist air, ASHRAE F-2017 ch. 1 eqs. 5–6, 23, 32 (psychrolib GetSatAirEnthalpy).
 * @param t_C temperature [°C], −100 to 200, with p_ws(t) < p
 * @param pressure_Pa p [Pa], 10–200 kPa
 * @returns h_s [J/kg dry air]
 * Example: 25 °C, 101 325 Pa → 76 306.7 J/kg ([C]; ASHRAE table 2 gives 76 504).
 */
export function saturationEnthalpy_J_kg(t_C: number, pressure_Pa: number): number {
  checkTemperature('temperature', t_C);
  checkPressure(pressure_Pa);
  if (psychrolib.GetSatVapPres(t_C) >= pressure_Pa) throw new RangeError(`no saturated air at ${t_C} °C and ${pressure_Pa} Pa (boiling)`);
  return psychrolib.GetSatAirEnthalpy(t_C, pressure_Pa);
}

/** Temperature at which the saturation vapour pressure equals p_w [°C], by bisection on [−100, 200] °C. */
function saturationTemperatureFromVapourPressure_C(pw: number): number {
  return bisectIncreasing((x) => psychrolib.GetSatVapPres(x), pw, T_MIN_C, T_MAX_C);
}

// Upper bracket of the inverse below depends only on the pressure, which is constant within a solve.
let cachedBracketPressure = Number.NaN;
let cachedBracketTop = Number.NaN;

/**
 * Temperature of saturated air with a given enthalpy, the inverse of saturationEnthalpy_J_kg (ENGINEERING.md 3.11:
 * T_s,eff = h_s^−1(h_s,eff)), by bisection between −60 °C and the temperature at which p_ws = p/2
 * (h_s is increasing there), tolerance 1e−9 K, at most 200 halvings.
 * @param h_J_kg saturated-air enthalpy [J/kg dry air] within the bracket
 * @param pressure_Pa p [Pa], 10–200 kPa
 * Example: 76 306.7 J/kg at 101 325 Pa → 25.000 °C.
 */
export function saturationTemperatureFromEnthalpy_C(h_J_kg: number, pressure_Pa: number): number {
  checkPressure(pressure_Pa);
  const lo = -60;
  if (pressure_Pa !== cachedBracketPressure) {
    cachedBracketTop = saturationTemperatureFromVapourPressure_C(pressure_Pa / 2);
    cachedBracketPressure = pressure_Pa;
  }
  const hi = cachedBracketTop;
  const hs = (x: number): number => psychrolib.GetSatAirEnthalpy(x, pressure_Pa);
  if (!(h_J_kg >= hs(lo) && h_J_kg <= hs(hi))) {
    throw new RangeError(`saturated-air enthalpy ${h_J_kg} J/kg is outside ${hs(lo).toFixed(0)}–${hs(hi).toFixed(0)} J/kg`);
  }
  return bisectIncreasing(hs, h_J_kg, lo, hi);
}

/**
 * Humidity ratio from enthalpy and dry bulb, ASHRAE F-2017 ch. 1 eq. 32 solved for W:
 * W = (h − 1006 t)/(2 501 000 + 1860 t).
 * @param h_J_kg moist-air enthalpy [J/kg dry air]
 * @param t_C dry bulb [°C], −100 to 200
 * @returns W [kg/kg]; RangeError when h is below the dry-air enthalpy at t (W would be negative)
 * Example: 56 724.6 J/kg, 40 °C → 0.0064008.
 */
export function humidityRatioFromEnthalpy(h_J_kg: number, t_C: number): number {
  checkTemperature('dry bulb', t_C);
  const w = (h_J_kg - 1006 * t_C) / (2_501_000 + 1860 * t_C);
  if (w < 0) throw new RangeError(`enthalpy ${h_J_kg} J/kg is below that of dry air at ${t_C} °C`);
  return w;
}

/**
 * Wet-bulb temperature from dry bulb and humidity ratio, ASHRAE F-2017 ch. 1 eqs. 33/35 solved by psychrolib's
 * bisection (tolerance 0.001 K).
 * @param t_C dry bulb [°C], −100 to 200
 * @param w humidity ratio [kg/kg], 0 to saturation
 * @param pressure_Pa p [Pa], 10–200 kPa
 * Example: 27 °C, 0.0112, 101 325 Pa → 19.576 °C.
 */
export function wetBulbFromHumidityRatio_C(t_C: number, w: number, pressure_Pa: number): number {
  checkTemperature('dry bulb', t_C);
  checkHumidityRatio(w);
  checkPressure(pressure_Pa);
  return guarded('wet bulb', () => psychrolib.GetTWetBulbFromHumRatio(t_C, w, pressure_Pa));
}

/**
 * Dew-point temperature from the humidity ratio: p_w = p W/(0.621945 + W) (ASHRAE F-2017 ch. 1 eq. 20 inverted),
 * then the saturation equations 5–6 inverted by bisection (tolerance 1e−9 K).
 * @param w humidity ratio [kg/kg], > 0
 * @param pressure_Pa p [Pa], 10–200 kPa
 * Example: 0.0112 at 101 325 Pa → 15.774 °C.
 */
export function dewPointFromHumidityRatio_C(w: number, pressure_Pa: number): number {
  checkHumidityRatio(w);
  checkPressure(pressure_Pa);
  const wBounded = Math.max(w, 1e-7); // psychrolib's minimum humidity ratio
  const pw = (pressure_Pa * wBounded) / (0.621945 + wBounded);
  return saturationTemperatureFromVapourPressure_C(pw);
}

/**
 * "Saturation specific heat" of the wet-coil methods, c_s = [h_s(T2) − h_s(T1)]/(T2 − T1) (chord slope,
 * ENGINEERING.md 3.3/3.11); when |T2 − T1| < 1e−3 K the central difference over ±0.01 K about the mean is used.
 * @param t1_C, t2_C temperatures [°C]
 * @param pressure_Pa p [Pa]
 * @returns c_s [J/(kg K)]
 * Example: 7 → 12.265 °C at 101 325 Pa → ≈ 2300 J/(kg K).
 */
export function saturationSpecificHeat_J_kgK(t1_C: number, t2_C: number, pressure_Pa: number): number {
  let a = t1_C;
  let b = t2_C;
  if (Math.abs(b - a) < 1e-3) {
    const m = 0.5 * (a + b);
    a = m - 0.01;
    b = m + 0.01;
  }
  return (saturationEnthalpy_J_kg(b, pressure_Pa) - saturationEnthalpy_J_kg(a, pressure_Pa)) / (b - a);
}

/**
 * Specific heat of moist air per kg of dry air for sensible balances, c_pm = 1006 + 1860 W (ENGINEERING.md 3.3).
 * @param w humidity ratio [kg/kg], ≥ 0
 * Example: W 0.01 → 1024.6 J/(kg K).
 */
export function moistAirSpecificHeat_J_kgK(w: number): number {
  checkHumidityRatio(w);
  return 1006 + 1860 * w;
}

/**
 * Dry-air viscosity, Sutherland form of the US Standard Atmosphere 1976: μ = 1.458e−6 T^1.5/(T + 110.4)
 * (ENGINEERING.md 3.3).
 * @param temperature_K T [K], 150–1000
 * Example: 298.15 K → 1.837e−5 Pa s.
 */
export function airViscositySutherland_Pa_s(temperature_K: number): number {
  if (!(temperature_K >= 150 && temperature_K <= 1000)) throw new RangeError(`air temperature must be within 150–1000 K (got ${temperature_K} K)`);
  return (1.458e-6 * Math.pow(temperature_K, 1.5)) / (temperature_K + 110.4);
}

/**
 * Dry-air thermal conductivity, US Standard Atmosphere 1976 form: k = 2.64638e−3 T^1.5/(T + 245.4·10^(−12/T))
 * (ENGINEERING.md 3.3).
 * @param temperature_K T [K], 150–1000
 * Example: 298.15 K → 0.02611 W/(m K).
 */
export function airConductivity_W_mK(temperature_K: number): number {
  if (!(temperature_K >= 150 && temperature_K <= 1000)) throw new RangeError(`air temperature must be within 150–1000 K (got ${temperature_K} K)`);
  return (2.64638e-3 * Math.pow(temperature_K, 1.5)) / (temperature_K + 245.4 * Math.pow(10, -12 / temperature_K));
}
