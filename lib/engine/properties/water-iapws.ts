// Liquid water properties: IAPWS-IF97 region 1, IF97 saturation pressure, IAPWS 2008 viscosity and
// IAPWS 2011 thermal conductivity (critical enhancement omitted). Coefficients as listed in ENGINEERING.md 3.1.
// The sums use module-level power tables filled by repeated multiplication: no allocation per call.

/** Specific gas constant of water used by IF97 [J/(kg K)]. */
const R_IF97 = 461.526;
const P_STAR_REGION1 = 16.53e6; // Pa
const T_STAR_REGION1 = 1386; // K

/** Lower and upper temperature bounds of IF97 region 1 [K]. */
export const IF97_REGION1_T_MIN_K = 273.15;
export const IF97_REGION1_T_MAX_K = 623.15;
/** Upper pressure bound of IF97 region 1 [Pa]. */
export const IF97_REGION1_P_MAX_PA = 100e6;

// IF97 region 1 coefficients (IAPWS R7-97, table 2): I_i, J_i, n_i.
const R1_I = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32];
const R1_J = [-2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31, -38, -39, -40, -41];
const R1_N = [
  1.4632971213167e-1, -8.4548187169114e-1, -3.756360367204, 3.3855169168385, -9.5791963387872e-1, 1.5772038513228e-1,
  -1.6616417199501e-2, 8.1214629983568e-4, 2.8319080123804e-4, -6.0706301565874e-4, -1.8990068218419e-2,
  -3.2529748770505e-2, -2.1841717175414e-2, -5.283835796993e-5, -4.7184321073267e-4, -3.0001780793026e-4,
  4.7661393906987e-5, -4.4141845330846e-6, -7.2694996297594e-16, -3.1679644845054e-5, -2.8270797985312e-6,
  -8.5205128120103e-10, -2.2425281908e-6, -6.5171222895601e-7, -1.4341729937924e-13, -4.0516996860117e-7,
  -1.2734301741641e-9, -1.7424871230634e-10, -6.8762131295531e-19, 1.4478307828521e-20, 2.6335781662795e-23,
  -1.1947622640071e-23, 1.8228094581404e-24, -9.3537087292458e-26,
];
const R1_COUNT = R1_N.length;
const I_MAX = 32;
const J_MIN = -41;
const J_MAX = 17;
// piPow[k] = (7.1 - pi)^(k - 2) for k = 0..I_MAX+2 (exponents -2..I_MAX); tauPow[k] = (tau - 1.222)^(k + J_MIN - 2).
const piPow = new Float64Array(I_MAX + 3);
const tauPow = new Float64Array(J_MAX - J_MIN + 3);

function fillPowers(table: Float64Array, base: number, lowestExponent: number): void {
  const zeroAt = -lowestExponent;
  table[zeroAt] = 1;
  for (let k = zeroAt + 1; k < table.length; k++) table[k] = table[k - 1] * base;
  const inv = 1 / base;
  for (let k = zeroAt - 1; k >= 0; k--) table[k] = table[k + 1] * inv;
}

// Scratch result of the region-1 Gibbs sums (reused by every call).
const gibbs = { g: 0, gPi: 0, gPiPi: 0, gTau: 0, gTauTau: 0, gPiTau: 0, pi: 0, tau: 0 };

function computeGibbs(temperature_K: number, pressure_Pa: number): void {
  const pSat = saturationPressureIf97_Pa(temperature_K);
  if (pressure_Pa < pSat) {
    throw new RangeError(
      `IF97 region 1 is liquid only: p = ${pressure_Pa} Pa is below the saturation pressure ${pSat.toFixed(0)} Pa at ${temperature_K} K`,
    );
  }
  const pi = pressure_Pa / P_STAR_REGION1;
  const tau = T_STAR_REGION1 / temperature_K;
  fillPowers(piPow, 7.1 - pi, -2);
  fillPowers(tauPow, tau - 1.222, J_MIN - 2);
  let g = 0;
  let gPi = 0;
  let gPiPi = 0;
  let gTau = 0;
  let gTauTau = 0;
  let gPiTau = 0;
  for (let i = 0; i < R1_COUNT; i++) {
    const I = R1_I[i];
    const J = R1_J[i];
    const n = R1_N[i];
    const pI = piPow[I + 2];
    const pIm1 = piPow[I + 1];
    const tJ = tauPow[J - J_MIN + 2];
    const tJm1 = tauPow[J - J_MIN + 1];
    g += n * pI * tJ;
    gPi -= n * I * pIm1 * tJ;
    gPiPi += n * I * (I - 1) * piPow[I] * tJ;
    gTau += n * pI * J * tJm1;
    gTauTau += n * pI * J * (J - 1) * tauPow[J - J_MIN];
    gPiTau -= n * I * pIm1 * J * tJm1;
  }
  gibbs.g = g;
  gibbs.gPi = gPi;
  gibbs.gPiPi = gPiPi;
  gibbs.gTau = gTau;
  gibbs.gTauTau = gTauTau;
  gibbs.gPiTau = gPiTau;
  gibbs.pi = pi;
  gibbs.tau = tau;
}

function checkRegion1(temperature_K: number, pressure_Pa: number): void {
  if (!(temperature_K >= IF97_REGION1_T_MIN_K && temperature_K <= IF97_REGION1_T_MAX_K)) {
    throw new RangeError(`IF97 region 1 needs 273.15 K ≤ T ≤ 623.15 K (got ${temperature_K} K)`);
  }
  if (!(pressure_Pa > 0 && pressure_Pa <= IF97_REGION1_P_MAX_PA)) {
    throw new RangeError(`IF97 region 1 needs 0 < p ≤ 100 MPa (got ${pressure_Pa} Pa)`);
  }
}

/** Thermodynamic state of liquid water from IF97 region 1. */
export interface WaterStateIf97 {
  specificVolume_m3_kg: number;
  density_kg_m3: number;
  enthalpy_J_kg: number;
  internalEnergy_J_kg: number;
  entropy_J_kgK: number;
  isobaricHeatCapacity_J_kgK: number;
  isochoricHeatCapacity_J_kgK: number;
  speedOfSound_m_s: number;
}

/**
 * Liquid water state from IAPWS-IF97 region 1 (IAPWS R7-97, eq. 7 and table 3; coefficients table 2).
 *
 * Dimensionless Gibbs energy γ(π, τ) = Σ n_i (7.1 − π)^I_i (τ − 1.222)^J_i with π = p / 16.53 MPa,
 * τ = 1386 K / T; v = π γ_π R T / p, h = τ γ_τ R T, u = R T (τ γ_τ − π γ_π), s = R (τ γ_τ − γ),
 * c_p = −τ² γ_ττ R, c_v = R[−τ² γ_ττ + (γ_π − τ γ_πτ)² / γ_ππ],
 * w = sqrt(R T γ_π² / [(γ_π − τ γ_πτ)² / (τ² γ_ττ) − γ_ππ]).
 *
 * @param temperature_K T [K], 273.15 ≤ T ≤ 623.15
 * @param pressure_Pa p [Pa], p_sat(T) ≤ p ≤ 100 MPa (liquid)
 * Example: T = 300 K, p = 3 MPa → v = 1.00215168e−3 m³/kg, h = 115.331273 kJ/kg (IF97 verification table).
 */
export function waterStateIf97Region1(temperature_K: number, pressure_Pa: number): WaterStateIf97 {
  checkRegion1(temperature_K, pressure_Pa);
  computeGibbs(temperature_K, pressure_Pa);
  const { g, gPi, gPiPi, gTau, gTauTau, gPiTau, pi, tau } = gibbs;
  const RT = R_IF97 * temperature_K;
  const v = (pi * gPi * RT) / pressure_Pa;
  const cp = -tau * tau * gTauTau * R_IF97;
  const a = gPi - tau * gPiTau;
  return {
    specificVolume_m3_kg: v,
    density_kg_m3: 1 / v,
    enthalpy_J_kg: tau * gTau * RT,
    internalEnergy_J_kg: RT * (tau * gTau - pi * gPi),
    entropy_J_kgK: R_IF97 * (tau * gTau - g),
    isobaricHeatCapacity_J_kgK: cp,
    isochoricHeatCapacity_J_kgK: R_IF97 * (-tau * tau * gTauTau + (a * a) / gPiPi),
    speedOfSound_m_s: Math.sqrt((RT * gPi * gPi) / ((a * a) / (tau * tau * gTauTau) - gPiPi)),
  };
}

const SAT_N = [
  1167.0521452767, -724213.16703206, -17.073846940092, 12020.82470247, -3232555.0322333, 14.91510861353,
  -4823.2657361591, 405113.40542057, -0.23855557567849, 650.17534844798,
];

/**
 * Saturation pressure of water, IAPWS-IF97 eq. 30 (region 4 saturation-pressure equation).
 *
 * ϑ = T + n9/(T − n10); A = ϑ² + n1 ϑ + n2; B = n3 ϑ² + n4 ϑ + n5; C = n6 ϑ² + n7 ϑ + n8;
 * p_sat = [2C / (−B + sqrt(B² − 4AC))]⁴ MPa.
 *
 * @param temperature_K T [K], 273.15 ≤ T ≤ 647.096 (critical point)
 * @returns p_sat [Pa]
 * Example: T = 500 K → 2.63889776 MPa (IF97 verification table for eq. 30).
 */
export function saturationPressureIf97_Pa(temperature_K: number): number {
  if (!(temperature_K >= 273.15 && temperature_K <= 647.096)) {
    throw new RangeError(`IF97 saturation pressure needs 273.15 K ≤ T ≤ 647.096 K (got ${temperature_K} K)`);
  }
  const n = SAT_N;
  const theta = temperature_K + n[8] / (temperature_K - n[9]);
  const A = theta * theta + n[0] * theta + n[1];
  const B = n[2] * theta * theta + n[3] * theta + n[4];
  const C = n[5] * theta * theta + n[6] * theta + n[7];
  const ratio = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  const r2 = ratio * ratio;
  return r2 * r2 * 1e6;
}

const T_CRIT_K = 647.096;
const RHO_CRIT = 322;

const VISC_H0 = [1.67752, 2.20462, 0.6366564, -0.241605];
// Dense 6 × 7 table H_ij (i = 0..5, j = 0..6) of IAPWS 2008 eq. 12; zeros where the release has no term.
const VISC_H1: readonly (readonly number[])[] = [
  [0.520094, 0.222531, -0.281378, 0.161913, -0.0325372, 0, 0],
  [0.0850895, 0.999115, -0.906851, 0.257399, 0, 0, 0],
  [-1.08374, 1.88797, -0.772479, 0, 0, 0, 0],
  [-0.289555, 1.26613, -0.489837, 0, 0.0698452, 0, -0.00435673],
  [0, 0, -0.25704, 0, 0, 0.00872102, 0],
  [0, 0.120573, 0, 0, 0, 0, -0.000593264],
];

/**
 * Viscosity of water, IAPWS 2008 formulation (IAPWS R12-08, eqs. 10–12, tables 1–2), critical enhancement μ̄2 = 1.
 *
 * T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³; μ̄0 = 100 sqrt(T̄) / Σ H_i/T̄^i;
 * μ̄1 = exp[ρ̄ Σ H_ij (1/T̄ − 1)^i (ρ̄ − 1)^j]; μ = μ̄0 μ̄1 × 10⁻⁶ Pa s.
 *
 * @param temperature_K T [K], > 0 (release range 253.15–1173.15 K; μ̄2 = 1 is exact to 1e−8 away from the critical point)
 * @param density_kg_m3 ρ [kg/m³], ≥ 0
 * @returns μ [Pa s]
 * Example: T = 298.15 K, ρ = 998 kg/m³ → 889.735100 µPa s (IAPWS 2008 verification table).
 */
export function viscosityIapws2008_Pa_s(temperature_K: number, density_kg_m3: number): number {
  if (!(temperature_K > 0)) throw new RangeError(`viscosity needs T > 0 K (got ${temperature_K} K)`);
  if (!(density_kg_m3 >= 0)) throw new RangeError(`viscosity needs ρ ≥ 0 (got ${density_kg_m3} kg/m³)`);
  const tr = temperature_K / T_CRIT_K;
  const dr = density_kg_m3 / RHO_CRIT;
  const invT = 1 / tr;
  const mu0 = (100 * Math.sqrt(tr)) / (VISC_H0[0] + invT * (VISC_H0[1] + invT * (VISC_H0[2] + invT * VISC_H0[3])));
  const x = invT - 1;
  const y = dr - 1;
  let sum = 0;
  let xi = 1;
  for (let i = 0; i < 6; i++) {
    const row = VISC_H1[i];
    // Horner in (ρ̄ − 1) for row i.
    let inner = 0;
    for (let j = 6; j >= 0; j--) inner = inner * y + row[j];
    sum += xi * inner;
    xi *= x;
  }
  const mu1 = Math.exp(dr * sum);
  return mu0 * mu1 * 1e-6;
}

const COND_L0 = [2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4];
const COND_L1: readonly (readonly number[])[] = [
  [1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634, 0.00609859258],
  [2.33771842, -2.78843778, 1.53616167, -0.463045512, 0.0832827019, -0.00719201245],
  [2.19650529, -4.54580785, 3.55777244, -1.40944978, 0.275418278, -0.0205938816],
  [-1.21051378, 1.60812989, -0.621178141, 0.0716373224, 0, 0],
  [-2.720337, 4.57586331, -3.18369245, 1.1168348, -0.19268305, 0.012913842],
];

/**
 * Thermal conductivity of water, IAPWS 2011 formulation (IAPWS R15-11, eqs. 10–16, tables 1–2) without the
 * critical enhancement λ̄2 (λ = λ̄0 λ̄1 × 10⁻³ W/(m K)).
 *
 * λ̄0 = sqrt(T̄) / Σ_{k=0..4} L_k/T̄^k; λ̄1 = exp[ρ̄ Σ_{i=0..4} Σ_{j=0..5} L_ij (1/T̄ − 1)^i (ρ̄ − 1)^j].
 *
 * @param temperature_K T [K], > 0 (release range 273.15–1173.15 K; λ̄2 matters only near the critical point)
 * @param density_kg_m3 ρ [kg/m³], ≥ 0
 * @returns λ [W/(m K)]
 * Example: T = 298.15 K, ρ = 998 kg/m³ → 607.712868 mW/(m K) (IAPWS 2011 verification table, λ̄2 = 0).
 */
export function conductivityIapws2011_W_mK(temperature_K: number, density_kg_m3: number): number {
  if (!(temperature_K > 0)) throw new RangeError(`conductivity needs T > 0 K (got ${temperature_K} K)`);
  if (!(density_kg_m3 >= 0)) throw new RangeError(`conductivity needs ρ ≥ 0 (got ${density_kg_m3} kg/m³)`);
  const tr = temperature_K / T_CRIT_K;
  const dr = density_kg_m3 / RHO_CRIT;
  const invT = 1 / tr;
  let denom = 0;
  for (let k = 4; k >= 0; k--) denom = denom * invT + COND_L0[k];
  const lambda0 = Math.sqrt(tr) / denom;
  const x = invT - 1;
  const y = dr - 1;
  let sum = 0;
  let xi = 1;
  for (let i = 0; i < 5; i++) {
    const row = COND_L1[i];
    let inner = 0;
    for (let j = 5; j >= 0; j--) inner = inner * y + row[j];
    sum += xi * inner;
    xi *= x;
  }
  return lambda0 * Math.exp(dr * sum) * 1e-3;
}

/** Transport and caloric properties of liquid water that the solver needs (SI). */
export interface WaterTransportProperties {
  density_kg_m3: number;
  specificHeat_J_kgK: number;
  viscosity_Pa_s: number;
  conductivity_W_mK: number;
}

/**
 * Liquid water ρ and c_p from IF97 region 1, μ from IAPWS 2008 (μ̄2 = 1) and λ from IAPWS 2011 (λ̄0 λ̄1),
 * written into `out` so that hot loops allocate nothing (ENGINEERING.md 3.1).
 *
 * @param temperature_K T [K], 273.15 ≤ T ≤ 623.15
 * @param pressure_Pa p [Pa], p_sat(T) ≤ p ≤ 100 MPa
 * @param out object receiving the four properties; returned for convenience
 * Example: 7 °C, 0.3 MPa → ρ 1000.00052 kg/m³, c_p 4199.863 J/(kg K), μ 1.426806e−3 Pa s, k 0.572449 W/(m K)
 * (ENGINEERING.md check W7).
 */
export function waterPropertiesIapwsInto<T extends WaterTransportProperties>(temperature_K: number, pressure_Pa: number, out: T): T {
  checkRegion1(temperature_K, pressure_Pa);
  computeGibbs(temperature_K, pressure_Pa);
  const rho = pressure_Pa / (gibbs.pi * gibbs.gPi * R_IF97 * temperature_K);
  out.density_kg_m3 = rho;
  out.specificHeat_J_kgK = -gibbs.tau * gibbs.tau * gibbs.gTauTau * R_IF97;
  out.viscosity_Pa_s = viscosityIapws2008_Pa_s(temperature_K, rho);
  out.conductivity_W_mK = conductivityIapws2011_W_mK(temperature_K, rho);
  return out;
}
