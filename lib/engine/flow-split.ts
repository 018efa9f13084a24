/**
 * Flow split between parallel circuits that share one header-to-header pressure drop (ENGINEERING.md 3.6).
 *
 * Each circuit is given as a pressure-drop function ΔP_c(ṁ_c) (Pa, increasing, ΔP_c(0) = 0). The common
 * pressure drop ΔP* is found such that Σ_c ṁ_c(ΔP*) = ṁ_total, where ṁ_c(ΔP) inverts ΔP_c. Both levels are
 * bracketed (ΔP* in [0, min_c ΔP_c(ṁ_total)], ṁ_c in [0, ṁ_total]) with log-log secant steps and bisection
 * fallback (root-finding.ts), so the split always returns; `converged` says whether the tolerance was met.
 */
import { invertIncreasing } from '@/lib/engine/root-finding';

/** Relative tolerance on Σ ṁ_c against ṁ_total for the outer solve. */
export const FLOW_SPLIT_TOTAL_TOLERANCE = 1e-12;
/** Relative tolerance on ΔP_c(ṁ_c) against ΔP* for each circuit inversion. */
export const FLOW_SPLIT_CIRCUIT_TOLERANCE = 1e-11;
/** Iteration caps (each level); far above the 4–10 steps a typical split needs. */
export const FLOW_SPLIT_MAX_OUTER_ITERATIONS = 200;
export const FLOW_SPLIT_MAX_INNER_ITERATIONS = 200;

export type PressureDropFunction = (massFlow_kg_s: number) => number;

/** A previous split of the same circuits (flows and ΔP*) to start from, e.g. the last outer iteration's. */
export interface WarmStart {
  massFlows_kg_s: ArrayLike<number>;
  pressureDrop_Pa: number;
}

export interface FlowSplit {
  /** Mass flow per circuit, kg/s; sums to the total. */
  massFlows_kg_s: Float64Array;
  /** The common header-to-header pressure drop ΔP*, Pa. */
  pressureDrop_Pa: number;
  /** Iterations used (quasi-Newton steps, or outer bracketed steps when it fell back). */
  iterations: number;
  converged: boolean;
}

/** Joint quasi-Newton steps tried before falling back to the bracketed solve. */
export const FLOW_SPLIT_NEWTON_MAX_ITERATIONS = 40;

/**
 * Joint quasi-Newton split (the fast path; ENGINEERING.md 3.6 step 1, "Newton on the vector with Jacobian
 * diag(dΔP_c/dṁ_c)"), in logarithms: with n_c = d ln ΔP_c / d ln ṁ_c (secant estimate, 1.8 to start), the common
 * ln ΔP* that makes the linearised flows add up to the total is
 *   ln ΔP* = [ṁ_total − Σ ṁ_c + Σ ṁ_c ln ΔP_c / n_c] / Σ (ṁ_c / n_c),
 * and each flow moves by ṁ_c ← ṁ_c exp[(ln ΔP* − ln ΔP_c)/n_c]. One pressure-drop call per circuit per step.
 * Returns null when it has not settled within the step cap (the caller then runs the bracketed solve).
 */
function newtonSplit(dropFunctions: PressureDropFunction[], total: number, start: ArrayLike<number>): FlowSplit | null {
  const n = dropFunctions.length;
  const flows = new Float64Array(n);
  let startSum = 0;
  for (let c = 0; c < n; c++) startSum += start[c];
  if (!(startSum > 0)) return null;
  for (let c = 0; c < n; c++) {
    flows[c] = (start[c] * total) / startSum;
    if (!(flows[c] > 0)) return null;
  }
  const lnDrop = new Float64Array(n);
  const slope = new Float64Array(n).fill(1.8);
  const prevLnFlow = new Float64Array(n).fill(NaN);
  const prevLnDrop = new Float64Array(n).fill(NaN);
  for (let it = 1; it <= FLOW_SPLIT_NEWTON_MAX_ITERATIONS; it++) {
    let sum = 0;
    let lnMin = Infinity;
    let lnMax = -Infinity;
    for (let c = 0; c < n; c++) {
      const d = dropFunctions[c](flows[c]);
      if (!(d > 0) || !Number.isFinite(d)) return null;
      const ld = Math.log(d);
      const lm = Math.log(flows[c]);
      if (it > 1 && lm !== prevLnFlow[c]) {
        const sl = (ld - prevLnDrop[c]) / (lm - prevLnFlow[c]);
        if (sl > 0.5 && sl < 3) slope[c] = sl;
      }
      prevLnDrop[c] = ld;
      prevLnFlow[c] = lm;
      lnDrop[c] = ld;
      sum += flows[c];
      if (ld < lnMin) lnMin = ld;
      if (ld > lnMax) lnMax = ld;
    }
    if (lnMax - lnMin <= FLOW_SPLIT_CIRCUIT_TOLERANCE && Math.abs(sum - total) <= FLOW_SPLIT_TOTAL_TOLERANCE * total) {
      const scale = total / sum;
      for (let c = 0; c < n; c++) flows[c] *= scale;
      return { massFlows_kg_s: flows, pressureDrop_Pa: Math.exp(0.5 * (lnMin + lnMax)), iterations: it, converged: true };
    }
    let num = total - sum;
    let den = 0;
    for (let c = 0; c < n; c++) {
      num += (flows[c] * lnDrop[c]) / slope[c];
      den += flows[c] / slope[c];
    }
    const lnTarget = num / den;
    for (let c = 0; c < n; c++) {
      const step = (lnTarget - lnDrop[c]) / slope[c];
      flows[c] *= Math.exp(Math.max(-2, Math.min(2, step)));
    }
  }
  return null;
}

/**
 * Split `total_kg_s` between circuits given by their pressure-drop functions.
 * Example: two circuits ΔP = m² and ΔP = 4m², total 3 kg/s → flows 2 and 1 kg/s, ΔP* = 4 Pa.
 */
export function splitFlowBetweenCircuits(dropFunctions: PressureDropFunction[], total_kg_s: number, warm?: WarmStart): FlowSplit {
  const n = dropFunctions.length;
  if (n === 0) throw new RangeError('splitFlowBetweenCircuits: no circuits');
  if (!(total_kg_s > 0) || !Number.isFinite(total_kg_s)) throw new RangeError(`splitFlowBetweenCircuits: total flow ${total_kg_s} must be positive`);
  if (n > 1) {
    const fast = newtonSplit(dropFunctions, total_kg_s, warm && warm.massFlows_kg_s.length === n ? warm.massFlows_kg_s : new Float64Array(n).fill(1));
    if (fast) return fast;
  }
  const flows = new Float64Array(n);
  if (n === 1) {
    flows[0] = total_kg_s;
    return { massFlows_kg_s: flows, pressureDrop_Pa: dropFunctions[0](total_kg_s), iterations: 0, converged: true };
  }
  // Start: equal shares. Their pressure drops give the first guess of ΔP* and each circuit's power-law slope.
  const share = total_kg_s / n;
  const slopes = new Float64Array(n);
  let upper = Infinity;
  let guessSum = 0;
  for (let c = 0; c < n; c++) {
    const atShare = dropFunctions[c](share);
    const atTotal = dropFunctions[c](total_kg_s);
    if (!(atShare > 0) || !(atTotal > atShare)) throw new RangeError(`splitFlowBetweenCircuits: circuit ${c + 1} pressure drop is not increasing with flow`);
    slopes[c] = Math.log(atTotal / atShare) / Math.log(n);
    upper = Math.min(upper, atTotal);
    guessSum += atShare;
    flows[c] = share;
  }
  const dropGuess = guessSum / n;
  let innerFailures = 0;
  // Σ ṁ_c(ΔP): each circuit warm-started from its last flow, moved along its power law.
  let lastDrop = dropGuess;
  const totalFlowAt = (drop: number): number => {
    let sum = 0;
    innerFailures = 0;
    for (let c = 0; c < n; c++) {
      const guess = flows[c] * Math.pow(drop / lastDrop, 1 / slopes[c]);
      const inverted = invertIncreasing(dropFunctions[c], drop, 0, total_kg_s, {
        relativeTolerance: FLOW_SPLIT_CIRCUIT_TOLERANCE,
        maxIterations: FLOW_SPLIT_MAX_INNER_ITERATIONS,
        guess: Math.min(guess, total_kg_s * (1 - 1e-9)),
        slope: slopes[c],
      });
      if (!inverted.converged) innerFailures++;
      flows[c] = inverted.x;
      sum += inverted.x;
    }
    lastDrop = drop;
    return sum;
  };
  const meanSlope = slopes.reduce((a, b) => a + b, 0) / n;
  const outer = invertIncreasing(totalFlowAt, total_kg_s, 0, upper, {
    relativeTolerance: FLOW_SPLIT_TOTAL_TOLERANCE,
    maxIterations: FLOW_SPLIT_MAX_OUTER_ITERATIONS,
    guess: dropGuess < upper ? dropGuess : undefined,
    slope: 1 / meanSlope,
  });
  // The last evaluation may not have been at the returned ΔP*; make the flows belong to it.
  if (lastDrop !== outer.x) totalFlowAt(outer.x);
  // Remove the last rounding so the flows sum to the total.
  let sum = 0;
  for (let c = 0; c < n; c++) sum += flows[c];
  const scale = total_kg_s / sum;
  for (let c = 0; c < n; c++) flows[c] *= scale;
  return {
    massFlows_kg_s: flows,
    pressureDrop_Pa: outer.x,
    iterations: outer.iterations,
    converged: outer.converged && innerFailures === 0,
  };
}

/** Maldistribution index: largest circuit flow over the mean circuit flow (ENGINEERING.md 3.6 step 3). */
export function maldistributionIndex(flows: ArrayLike<number>): number {
  let max = 0;
  let sum = 0;
  for (let i = 0; i < flows.length; i++) {
    max = Math.max(max, flows[i]);
    sum += flows[i];
  }
  return sum > 0 ? max / (sum / flows.length) : 1;
}
