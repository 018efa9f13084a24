// Simple polynomial fits of liquid-water properties at 0.3 MPa, 0.01–100 °C (ENGINEERING.md 3.1 "Simple fallback
// fits", check W13). They are a cross-check and a fallback for quick estimates only: the solver does NOT use them,
// it uses the IAPWS formulations of water-iapws.ts through fluidProperties (v1 decision 10).

/** Lower and upper temperature bounds of the fits [°C]. */
export const WATER_FIT_T_MIN_C = 0.01;
export const WATER_FIT_T_MAX_C = 100;

// Coefficients a0…an (ascending powers of t in °C), ENGINEERING.md 3.1 table "Simple fallback fits".
const DENSITY_COEFFS = [1.000002113e3, 4.701522821e-2, -7.367154941e-3, 3.97444247e-5, -1.236176417e-7];
const SPECIFIC_HEAT_COEFFS = [4.217409676e3, -3.026962705, 9.232547996e-2, -1.465399436e-3, 1.256072054e-5, -4.129608523e-8];
const CONDUCTIVITY_COEFFS = [5.560684201e-1, 2.465672088e-3, -2.038994717e-5, 1.190819353e-7, -4.063661093e-10];
const LN_VISCOSITY_COEFFS = [-6.325456307, -3.45253335e-2, 3.283308641e-4, -3.082129504e-6, 1.941027926e-8, -5.395095693e-11];

function checkTemperature(t_C: number): void {
  if (!(t_C >= WATER_FIT_T_MIN_C && t_C <= WATER_FIT_T_MAX_C)) {
    throw new RangeError(`the water fallback fits are valid for ${WATER_FIT_T_MIN_C}–${WATER_FIT_T_MAX_C} °C (got ${t_C} °C)`);
  }
}

/** Σ a_k t^k by Horner's rule. */
function polynomial(coeffs: readonly number[], t: number): number {
  let sum = 0;
  for (let k = coeffs.length - 1; k >= 0; k--) sum = sum * t + coeffs[k];
  return sum;
}

/**
 * Density of liquid water at 0.3 MPa, quartic fit ρ = Σ_{k=0..4} a_k t^k computed by the ENGINEERING.md author
 * against IAPWS-IF97 region 1 (ENGINEERING.md 3.1 fallback fits [C]); max relative error 5.7e−5 over 0–100 °C.
 * Not used by the solver (it uses IAPWS-IF97 via fluidProperties).
 * @param temperature_C t [°C], 0.01–100; RangeError outside
 * @returns ρ [kg/m³]
 * Example: 7 °C → 1000.0 kg/m³ (within 6e−5 of IAPWS 1000.00052, check W13).
 */
export function waterDensityFit_kg_m3(temperature_C: number): number {
  checkTemperature(temperature_C);
  return polynomial(DENSITY_COEFFS, temperature_C);
}

/**
 * Isobaric specific heat of liquid water at 0.3 MPa, quintic fit c_p = Σ_{k=0..5} a_k t^k computed against
 * IAPWS-IF97 region 1 (ENGINEERING.md 3.1 fallback fits [C]); max relative error 2.4e−4 over 0–100 °C.
 * Not used by the solver (it uses IAPWS-IF97 via fluidProperties).
 * @param temperature_C t [°C], 0.01–100; RangeError outside
 * @returns c_p [J/(kg K)]
 * Example: 7 °C → ≈ 4199.9 J/(kg K) (within 2.4e−4 of IAPWS 4199.863, check W13).
 */
export function waterSpecificHeatFit_J_kgK(temperature_C: number): number {
  checkTemperature(temperature_C);
  return polynomial(SPECIFIC_HEAT_COEFFS, temperature_C);
}

/**
 * Thermal conductivity of liquid water at 0.3 MPa, quartic fit k = Σ_{k=0..4} a_k t^k computed against IAPWS 2011
 * (λ̄0 λ̄1, density from IF97) (ENGINEERING.md 3.1 fallback fits [C]); max relative error 4.8e−4 over 0–100 °C.
 * Not used by the solver (it uses IAPWS 2011 via fluidProperties).
 * @param temperature_C t [°C], 0.01–100; RangeError outside
 * @returns k [W/(m K)]
 * Example: 7 °C → ≈ 0.5725 W/(m K) (within 4.8e−4 of IAPWS 0.572449, check W13).
 */
export function waterConductivityFit_W_mK(temperature_C: number): number {
  checkTemperature(temperature_C);
  return polynomial(CONDUCTIVITY_COEFFS, temperature_C);
}

/**
 * Dynamic viscosity of liquid water at 0.3 MPa, μ = exp(Σ_{k=0..5} a_k t^k) computed against IAPWS 2008
 * (μ̄2 = 1, density from IF97) (ENGINEERING.md 3.1 fallback fits [C]); max relative error 6.4e−4 over 0–100 °C.
 * Not used by the solver (it uses IAPWS 2008 via fluidProperties).
 * @param temperature_C t [°C], 0.01–100; RangeError outside
 * @returns μ [Pa s]
 * Example: 7 °C → ≈ 1.4268e−3 Pa s (within 6.4e−4 of IAPWS 1.426806e−3, check W13).
 */
export function waterViscosityFit_Pa_s(temperature_C: number): number {
  checkTemperature(temperature_C);
  return Math.exp(polynomial(LN_VISCOSITY_COEFFS, temperature_C));
}
