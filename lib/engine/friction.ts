// Darcy friction factors for the tube side (ENGINEERING.md 3.4).

function checkReynolds(re: number): void {
  if (!(re > 0) || !Number.isFinite(re)) throw new RangeError(`Reynolds number must be positive and finite (got ${re})`);
}

function checkRoughness(relativeRoughness: number): void {
  if (!(relativeRoughness >= 0 && relativeRoughness < 0.1)) {
    throw new RangeError(`relative roughness ε/D must be 0 ≤ ε/D < 0.1 (got ${relativeRoughness})`);
  }
}

/**
 * Darcy friction factor for all flow regimes, Churchill (1977), Chem. Eng. 84(24):91–92 (ENGINEERING.md 3.4).
 *
 * A = [2.457 ln(1 / ((7/Re)^0.9 + 0.27 ε/D))]^16, B = (37 530/Re)^16,
 * f_D = 8 [(8/Re)^12 + (A + B)^−1.5]^(1/12).
 *
 * @param re Reynolds number [-], > 0 (valid for every regime: laminar limit 64/Re, turbulent limit ≈ Colebrook)
 * @param relativeRoughness ε/D [-], 0 ≤ ε/D < 0.1
 * @returns f_D [-]
 * Example: Re 1e5, ε/D 1e−4 → 0.018462624566280075 (`fluids` docstring).
 */
export function frictionFactorChurchill1977(re: number, relativeRoughness: number): number {
  checkReynolds(re);
  checkRoughness(relativeRoughness);
  const A = Math.pow(2.457 * Math.log(1 / (Math.pow(7 / re, 0.9) + 0.27 * relativeRoughness)), 16);
  const B = Math.pow(37530 / re, 16);
  return 8 * Math.pow(Math.pow(8 / re, 12) + 1 / Math.pow(A + B, 1.5), 1 / 12);
}

/** Iteration cap and tolerance of the Colebrook solve. */
const COLEBROOK_MAX_ITERATIONS = 200;
const COLEBROOK_REL_TOL = 1e-15;

/**
 * Darcy friction factor from the Colebrook (1939) equation, J. Inst. Civ. Eng. 11:133–156 (ENGINEERING.md 3.4):
 * 1/sqrt(f) = −2 log10(ε/(3.7 D) + 2.51/(Re sqrt f)), solved for x = 1/sqrt f by bisection on [0.5, 50]
 * (the residual is monotonic in x), capped at 200 halvings.
 *
 * @param re Reynolds number [-], turbulent: Re ≥ 2300 (below that it throws: the equation does not apply)
 * @param relativeRoughness ε/D [-], 0 ≤ ε/D < 0.1
 * @returns f_D [-]
 * Example: Re 1e5, ε/D 1e−4 → 0.018513866077471 (`fluids` docstring).
 */
export function frictionFactorColebrook1939(re: number, relativeRoughness: number): number {
  checkReynolds(re);
  checkRoughness(relativeRoughness);
  if (re < 2300) throw new RangeError(`Colebrook applies to turbulent flow, Re ≥ 2300 (got ${re})`);
  const a = relativeRoughness / 3.7;
  const b = 2.51 / re;
  // residual(x) = x + 2 log10(a + b x): increasing in x.
  const residual = (x: number): number => x + 2 * Math.log10(a + b * x);
  let lo = 0.5;
  let hi = 50;
  for (let k = 0; k < COLEBROOK_MAX_ITERATIONS && hi - lo > COLEBROOK_REL_TOL * hi; k++) {
    const mid = 0.5 * (lo + hi);
    if (residual(mid) > 0) hi = mid;
    else lo = mid;
  }
  const x = 0.5 * (lo + hi);
  return 1 / (x * x);
}

/**
 * Smooth-tube Darcy friction factor, Filonenko (1954) as used with Gnielinski (1976) (ENGINEERING.md 3.4):
 * f_D = (0.79 ln Re − 1.64)^−2.
 *
 * @param re Reynolds number [-], > 0; stated range 1e4–5e6 (used down to 2300 inside Gnielinski 1976)
 * @returns f_D [-]
 * Example: Re 1e4 → 0.0314798.
 */
export function frictionFactorFilonenko1954(re: number): number {
  checkReynolds(re);
  if (re < 100) throw new RangeError(`Filonenko's turbulent friction factor needs Re ≥ 100 (got ${re})`);
  const d = 0.79 * Math.log(re) - 1.64;
  return 1 / (d * d);
}
