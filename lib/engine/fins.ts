// Fin efficiency of plate fins on round tubes and surface efficiency (ENGINEERING.md 3.8).

export type TubeLayout = 'staggered' | 'inline';

export interface SchmidtFinInput {
  /** Air-side film coefficient h_o [W/(m² K)]; for a wet fin pass h_o c_s,f / c_pa (gives m = m_w, Threlkeld). */
  h_W_m2K: number;
  finConductivity_W_mK: number;
  finThickness_m: number;
  collarDiameter_m: number;
  transversePitch_m: number;
  rowPitch_m: number;
  layout: TubeLayout;
}

export interface SchmidtFinResult {
  efficiency: number;
  /** R_eq / r [-]. */
  equivalentRadiusRatio: number;
  /** φ = (R_eq/r − 1)[1 + 0.35 ln(R_eq/r)] [-]. */
  phi: number;
}

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be positive and finite (got ${value})`);
}

/** Fin parameter m = sqrt(2 h / (k δ)) [1/m]. */
function finParameter(h: number, k: number, thickness: number): number {
  return Math.sqrt((2 * h) / (k * thickness));
}

/** tanh(x)/x with the x → 0 limit. */
function tanhOverX(x: number): number {
  return x < 1e-8 ? 1 : Math.tanh(x) / x;
}

/**
 * Plate-fin efficiency by Schmidt's (1949) equivalent circular fin, Refrig. Eng. 57:351, in the form of Wang et al.
 * (2000) part II (ENGINEERING.md 3.8): r = D_c/2, m = sqrt(2h/(k_f δ_f));
 * staggered: X_M = P_t/2, X_L = sqrt((P_t/2)² + P_l²)/2, R_eq/r = 1.27 ψ (β − 0.3)^½;
 * in-line: X_L = P_l/2, R_eq/r = 1.28 ψ (β − 0.2)^½; ψ = X_M/r, β = X_L/X_M;
 * φ = (R_eq/r − 1)[1 + 0.35 ln(R_eq/r)]; η_f = tanh(m r φ)/(m r φ).
 * @param input h [W/(m² K)] > 0, k_f [W/(m K)], δ_f [m], D_c [m], P_t [m] > D_c, P_l [m], layout
 * Validity: β ≥ 1 (hexagonal/rectangular fins of ordinary banks); accurate within ≈1–1.5 % of the exact annular fin.
 * Example: D_c 13.0 mm, P_t 31.75, P_l 27.5 mm, δ_f 0.15 mm, k_f 200, h 59.84, staggered → R_eq/r 2.5953,
 * φ 2.1278, η_f 0.8049.
 */
export function finEfficiencySchmidt1949(input: SchmidtFinInput): SchmidtFinResult {
  const { h_W_m2K: h, finConductivity_W_mK: k, finThickness_m: t, collarDiameter_m: dc, transversePitch_m: pt, rowPitch_m: pl } = input;
  if (!(h >= 0) || !Number.isFinite(h)) throw new RangeError(`film coefficient must be ≥ 0 (got ${h})`);
  checkPositive('fin conductivity', k);
  checkPositive('fin thickness', t);
  checkPositive('collar diameter', dc);
  checkPositive('transverse pitch', pt);
  checkPositive('row pitch', pl);
  if (pt <= dc) throw new RangeError(`transverse pitch ${pt} m must exceed the collar diameter ${dc} m`);
  const r = dc / 2;
  const xm = pt / 2;
  let ratio: number;
  if (input.layout === 'staggered') {
    const xl = Math.sqrt(xm * xm + pl * pl) / 2;
    ratio = 1.27 * (xm / r) * Math.sqrt(xl / xm - 0.3);
  } else {
    const xl = pl / 2;
    const beta = xl / xm;
    if (!(beta > 0.2)) throw new RangeError(`in-line fin needs P_l/P_t > 0.2 (got ${beta})`);
    ratio = 1.28 * (xm / r) * Math.sqrt(beta - 0.2);
  }
  if (!(ratio > 1)) throw new RangeError(`equivalent fin radius must exceed the collar radius (R_eq/r = ${ratio})`);
  const phi = (ratio - 1) * (1 + 0.35 * Math.log(ratio));
  const x = finParameter(h, k, t) * r * phi;
  return { efficiency: tanhOverX(x), equivalentRadiusRatio: ratio, phi };
}

export interface WetFinInput {
  h_W_m2K: number;
  /** c_s,f = d h_s/dT between fin-base and fin-tip (≈ mean surface) temperature [J/(kg K)]. */
  saturationSpecificHeat_J_kgK: number;
  /** c_pa of the air [J/(kg K)] (1006 in the BKM formulas, v1 decision 13). */
  airSpecificHeat_J_kgK: number;
  finConductivity_W_mK: number;
  finThickness_m: number;
}

/**
 * Wet-fin parameter, Threlkeld (1970) (equivalent to McQuiston's m sqrt(1 + C h_fg/c_pa)) (ENGINEERING.md 3.8):
 * m_w = sqrt(2 h_o c_s,f / (c_pa k_f δ_f)).
 * @returns m_w [1/m]
 * Example: h 60, c_s 2300, c_pa 1006, k_f 200, δ_f 0.15 mm → 95.630 1/m.
 */
export function wetFinParameterThrelkeld(input: WetFinInput): number {
  if (!(input.h_W_m2K >= 0)) throw new RangeError(`film coefficient must be ≥ 0 (got ${input.h_W_m2K})`);
  checkPositive('saturation specific heat', input.saturationSpecificHeat_J_kgK);
  checkPositive('air specific heat', input.airSpecificHeat_J_kgK);
  checkPositive('fin conductivity', input.finConductivity_W_mK);
  checkPositive('fin thickness', input.finThickness_m);
  return Math.sqrt(
    (2 * input.h_W_m2K * input.saturationSpecificHeat_J_kgK) /
      (input.airSpecificHeat_J_kgK * input.finConductivity_W_mK * input.finThickness_m),
  );
}

// Modified Bessel functions, Abramowitz & Stegun (1964) polynomial approximations 9.8.1–9.8.8
// (|relative error| ≲ 2e−7).
function besselI0(x: number): number {
  if (x < 3.75) {
    const t = (x / 3.75) ** 2;
    return 1 + t * (3.5156229 + t * (3.0899424 + t * (1.2067492 + t * (0.2659732 + t * (0.0360768 + t * 0.0045813)))));
  }
  const t = 3.75 / x;
  return (
    (Math.exp(x) / Math.sqrt(x)) *
    (0.39894228 + t * (0.01328592 + t * (0.00225319 + t * (-0.00157565 + t * (0.00916281 + t * (-0.02057706 + t * (0.02635537 + t * (-0.01647633 + t * 0.00392377))))))))
  );
}

function besselI1(x: number): number {
  if (x < 3.75) {
    const t = (x / 3.75) ** 2;
    return x * (0.5 + t * (0.87890594 + t * (0.51498869 + t * (0.15084934 + t * (0.02658733 + t * (0.00301532 + t * 0.00032411))))));
  }
  const t = 3.75 / x;
  return (
    (Math.exp(x) / Math.sqrt(x)) *
    (0.39894228 + t * (-0.03988024 + t * (-0.00362018 + t * (0.00163801 + t * (-0.01031555 + t * (0.02282967 + t * (-0.02895312 + t * (0.01787654 - t * 0.00420059))))))))
  );
}

function besselK0(x: number): number {
  if (x <= 2) {
    const t = (x * x) / 4;
    return (
      -Math.log(x / 2) * besselI0(x) +
      (-0.57721566 + t * (0.4227842 + t * (0.23069756 + t * (0.0348859 + t * (0.00262698 + t * (0.0001075 + t * 0.0000074))))))
    );
  }
  const t = 2 / x;
  return (
    (Math.exp(-x) / Math.sqrt(x)) *
    (1.25331414 + t * (-0.07832358 + t * (0.02189568 + t * (-0.01062446 + t * (0.00587872 + t * (-0.0025154 + t * 0.00053208))))))
  );
}

function besselK1(x: number): number {
  if (x <= 2) {
    const t = (x * x) / 4;
    return (
      Math.log(x / 2) * besselI1(x) +
      (1 / x) * (1 + t * (0.15443144 + t * (-0.67278579 + t * (-0.18156897 + t * (-0.01919402 + t * (-0.00110404 - t * 0.00004686))))))
    );
  }
  const t = 2 / x;
  return (
    (Math.exp(-x) / Math.sqrt(x)) *
    (1.25331414 + t * (0.23498619 + t * (-0.0365562 + t * (0.01504268 + t * (-0.00780353 + t * (0.00325614 - t * 0.00068245))))))
  );
}

/** Modified Bessel functions I0, I1, K0, K1 (A&S 9.8.1–9.8.8), exported for tests. Example: I0(1) = 1.2660659. */
export const modifiedBessel = { i0: besselI0, i1: besselI1, k0: besselK0, k1: besselK1 } as const;

export interface AnnularFinInput {
  h_W_m2K: number;
  finConductivity_W_mK: number;
  finThickness_m: number;
  /** Fin root radius r1 [m]. */
  innerRadius_m: number;
  /** Fin tip radius r2 [m]; the tip is accounted for by r2c = r2 + δ/2. */
  outerRadius_m: number;
}

/**
 * Exact efficiency of an annular fin of uniform thickness with a corrected-length adiabatic tip, Gardner (1945),
 * Trans. ASME 67:621 / Incropera table 3.5 (ENGINEERING.md 3.8): r2c = r2 + δ/2, m = sqrt(2h/(kδ)),
 * η = (2 r1/(m (r2c² − r1²))) [K1(m r1) I1(m r2c) − I1(m r1) K1(m r2c)] / [I0(m r1) K1(m r2c) + K0(m r1) I1(m r2c)].
 * Bessel functions by Abramowitz & Stegun 9.8 polynomials (accuracy ≈ 2e−7 relative).
 * @param input h [W/(m² K)] > 0, k [W/(m K)], δ [m], r1 [m], r2 [m] > r1
 * Example: h 50, k 200, δ 0.15 mm, r1 6.5 mm, r2 16.5 mm → 0.84952.
 */
export function annularFinEfficiencyExact(input: AnnularFinInput): number {
  checkPositive('film coefficient', input.h_W_m2K);
  checkPositive('fin conductivity', input.finConductivity_W_mK);
  checkPositive('fin thickness', input.finThickness_m);
  checkPositive('inner radius', input.innerRadius_m);
  if (!(input.outerRadius_m > input.innerRadius_m)) throw new RangeError('outer fin radius must exceed the inner radius');
  const m = finParameter(input.h_W_m2K, input.finConductivity_W_mK, input.finThickness_m);
  const r1 = input.innerRadius_m;
  const r2c = input.outerRadius_m + input.finThickness_m / 2;
  const a = m * r1;
  const b = m * r2c;
  if (b > 600) throw new RangeError(`m r2c = ${b} is too large for the Bessel evaluation`);
  const num = besselK1(a) * besselI1(b) - besselI1(a) * besselK1(b);
  const den = besselI0(a) * besselK1(b) + besselK0(a) * besselI1(b);
  return ((2 * r1) / (m * (r2c * r2c - r1 * r1))) * (num / den);
}

/**
 * Surface (overall fin) efficiency η_o = 1 − (A_f/A_o)(1 − η_f) (ENGINEERING.md 3.8).
 * @param finEfficiency η_f [-], 0–1
 * @param finAreaFraction A_f/A_o [-], 0–1
 * Example: η_f 0.80495, A_f/A_o 0.93816 → 0.81701.
 */
export function surfaceEfficiency(finEfficiency: number, finAreaFraction: number): number {
  if (!(finEfficiency >= 0 && finEfficiency <= 1)) throw new RangeError(`fin efficiency must be within 0–1 (got ${finEfficiency})`);
  if (!(finAreaFraction >= 0 && finAreaFraction <= 1)) throw new RangeError(`fin area fraction must be within 0–1 (got ${finAreaFraction})`);
  return 1 - finAreaFraction * (1 - finEfficiency);
}
