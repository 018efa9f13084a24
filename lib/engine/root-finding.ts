/**
 * Bracketed inversion of monotonically increasing functions (ENGINEERING.md Appendix C: every inverse is
 * solved with a bracketed method first; faster steps only inside the bracket).
 *
 * The functions this solves (circuit pressure drop against mass flow, total flow against header pressure
 * drop) are close to power laws, so the fast step is a secant step in log-log space; whenever that step
 * leaves the bracket or fails to shrink it enough, a bisection step is taken instead. The iteration count is
 * capped, so the solver always returns.
 */

/** Relative tolerance on the function value used when none is given. */
export const DEFAULT_RELATIVE_TOLERANCE = 1e-12;
/** Iteration cap used when none is given: far above what a bracketed secant/bisection needs. */
export const DEFAULT_MAX_ITERATIONS = 200;

export interface InversionResult {
  x: number;
  value: number;
  iterations: number;
  converged: boolean;
}

export interface InversionOptions {
  /** Stop when |f(x) − target| <= relativeTolerance·target. */
  relativeTolerance?: number;
  maxIterations?: number;
  /** A first guess strictly inside the bracket (optional). */
  guess?: number;
  /** Expected log-log slope d ln f / d ln x used for the first step (default 1.8). */
  slope?: number;
  /**
   * The caller guarantees f(lo) <= target <= f(hi): the ends are not evaluated up front (saves two calls when a
   * good guess is given). If the guarantee is wrong the result comes back with converged = false.
   */
  assumeBracket?: boolean;
}

/**
 * Solve f(x) = target for x in [lo, hi] where f is increasing, f(lo) <= target <= f(hi).
 * lo may be 0 (with f(0) = 0). Throws RangeError when the target is not bracketed.
 *
 * Example: invertIncreasing((x) => x * x, 2, 0, 2).x ≈ 1.414213562373.
 */
export function invertIncreasing(
  f: (x: number) => number,
  target: number,
  lo: number,
  hi: number,
  options: InversionOptions = {},
): InversionResult {
  const tol = options.relativeTolerance ?? DEFAULT_RELATIVE_TOLERANCE;
  const maxIterations = options.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  if (!(hi > lo) || !(target >= 0) || !Number.isFinite(target)) {
    throw new RangeError(`invertIncreasing: bad bracket [${lo}, ${hi}] or target ${target}`);
  }
  if (target === 0) return { x: lo, value: f(lo), iterations: 0, converged: true };
  const absTol = tol * target;
  let fLo = lo > 0 && !options.assumeBracket ? f(lo) : 0;
  let fHi = options.assumeBracket ? NaN : f(hi);
  if (!options.assumeBracket) {
    if (fLo > target + absTol || fHi < target - absTol) {
      throw new RangeError(`invertIncreasing: target ${target} not inside [${fLo}, ${fHi}]`);
    }
    if (Math.abs(fHi - target) <= absTol) return { x: hi, value: fHi, iterations: 0, converged: true };
  }

  // Previous point for the log-log secant.
  let xPrev = NaN;
  let fPrev = NaN;
  let x = options.guess !== undefined && options.guess > lo && options.guess < hi ? options.guess : NaN;
  const slope0 = options.slope ?? 1.8;
  if (Number.isNaN(x)) {
    // Power-law guess from the upper end.
    x = fHi > 0 ? hi * Math.pow(target / fHi, 1 / slope0) : NaN;
    if (!(x > lo && x < hi)) x = 0.5 * (lo + hi);
  }
  let lastResidual = Infinity;
  let slowSteps = 0;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const fx = f(x);
    if (Math.abs(fx - target) <= absTol) return { x, value: fx, iterations: iteration, converged: true };
    if (fx < target) {
      lo = x;
      fLo = fx;
    } else {
      hi = x;
      fHi = fx;
    }
    if (hi - lo <= 1e-15 * hi) return { x, value: fx, iterations: iteration, converged: true };
    // Candidate: log-log secant through the last two points, else through the bracket ends.
    let next = NaN;
    if (fx > 0 && x > 0) {
      const s =
        fPrev > 0 && xPrev > 0 && xPrev !== x
          ? Math.log(fx / fPrev) / Math.log(x / xPrev)
          : fLo > 0 && lo > 0 && fHi > 0 && hi > lo
            ? Math.log(fHi / fLo) / Math.log(hi / lo)
            : slope0;
      if (Number.isFinite(s) && s > 0) next = x * Math.exp(Math.log(target / fx) / s);
    }
    // Bisect when the fast step leaves the bracket or the residual has not halved over two steps.
    const residual = Math.abs(fx - target);
    slowSteps = residual > 0.5 * lastResidual ? slowSteps + 1 : 0;
    if (!(next > lo && next < hi) || slowSteps >= 2) {
      next = lo > 0 && hi / lo < 1e6 ? Math.sqrt(lo * hi) : 0.5 * (lo + hi);
      slowSteps = 0;
    }
    lastResidual = residual;
    xPrev = x;
    fPrev = fx;
    x = next;
  }
  const fx = f(x);
  return { x, value: fx, iterations: maxIterations, converged: Math.abs(fx - target) <= absTol };
}
