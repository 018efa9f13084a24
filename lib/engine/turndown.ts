/**
 * Part-load (turndown) behaviour with variable flow (ENGINEERING.md section 5 item 1): the flow split, lowest Re
 * and pressure drop at flow fractions 0.1…1.0 (step 0.1) plus the document's minimum flow fraction, and the flow
 * fraction at which each circuit turns transitional (Re < 4000) and laminar (Re < 2300). Capacity at each
 * fraction is added by the solver when the thermal solution is available.
 */
import type { DerivedGeometry } from '@/lib/engine/geometry';
import type { TracedCircuit } from '@/lib/engine/topology';
import type { Geometry } from '@/lib/engine/types';
import type { BendMethod, HydraulicPropertyProvider, HydraulicsResult } from '@/lib/engine/hydraulics';
import { solveCoilHydraulics, type CircuitTemperatures } from '@/lib/engine/coil-hydraulics';
import { LAMINAR_UPPER_RE, TURBULENT_LOWER_RE } from '@/lib/engine/tube-side';

/** The standard flow fractions 0.1 … 1.0. */
export const TURNDOWN_FRACTIONS = [0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1.0];

/** The standard fractions plus the minimum flow fraction, sorted, without duplicates. */
export function turndownFractions(minimumFlowFraction: number): number[] {
  const all = [...TURNDOWN_FRACTIONS];
  if (!all.some((f) => Math.abs(f - minimumFlowFraction) < 1e-9)) all.push(minimumFlowFraction);
  return all.sort((a, b) => a - b);
}

export interface HydraulicTurndownPoint {
  flowFraction: number;
  minReynolds: number;
  waterPressureDrop_Pa: number;
  hydraulics: HydraulicsResult;
}

/**
 * Hydraulics at each turndown fraction, with the given water temperatures (the design solution's, or the
 * entering temperature everywhere). The standard fraction equal to the minimum is reported with the minimum's
 * exact value.
 */
export function hydraulicTurndown(
  g: Geometry,
  derived: DerivedGeometry,
  circuits: TracedCircuit[],
  temps: CircuitTemperatures[] | ((fraction: number) => CircuitTemperatures[]),
  designMassFlow_kg_s: number,
  properties: HydraulicPropertyProvider,
  bendMethod: BendMethod,
  minimumFlowFraction: number,
): HydraulicTurndownPoint[] {
  return turndownFractions(minimumFlowFraction).map((f) => {
    const t = typeof temps === 'function' ? temps(f) : temps;
    const h = solveCoilHydraulics(g, derived, circuits, t, designMassFlow_kg_s * f, properties, bendMethod);
    return {
      flowFraction: f,
      minReynolds: Math.min(...h.circuits.map((c) => c.reynoldsMin)),
      waterPressureDrop_Pa: h.pressureDrop_Pa,
      hydraulics: h,
    };
  });
}

/**
 * Flow fraction at which a circuit's lowest Re falls to a threshold, estimated from its Re at design flow with the
 * circuit's share of the flow held (Re ∝ ṁ at fixed temperatures); null when it stays above the threshold down to
 * the smallest fraction reported (0.1) — a circuit never drops below a threshold when its design Re is under it
 * (then 1 is returned).
 */
export function fractionAtReynolds(designReynoldsMin: number, threshold: number): number | null {
  if (designReynoldsMin <= threshold) return 1;
  const f = threshold / designReynoldsMin;
  return f >= TURNDOWN_FRACTIONS[0] ? f : null;
}

export interface CircuitTurndown {
  index: number;
  transitionalBelowFraction: number | null;
  laminarBelowFraction: number | null;
}

/** Per circuit: the flow fraction below which it turns transitional and laminar. */
export function circuitTurndown(circuits: TracedCircuit[], design: HydraulicsResult): CircuitTurndown[] {
  return circuits.map((c, i) => ({
    index: c.index,
    transitionalBelowFraction: fractionAtReynolds(design.circuits[i].reynoldsMin, TURBULENT_LOWER_RE),
    laminarBelowFraction: fractionAtReynolds(design.circuits[i].reynoldsMin, LAMINAR_UPPER_RE),
  }));
}

/**
 * Flow fraction at which a circuit's lowest Re crosses a threshold, interpolated linearly between solved
 * turndown points (fractions ascending, each with that circuit's lowest Re). 1 when the design point is already
 * below the threshold; null when the circuit stays above it down to the smallest fraction solved.
 */
export function crossingFraction(points: { flowFraction: number; reynoldsMin: number }[], threshold: number): number | null {
  const sorted = [...points].sort((a, b) => a.flowFraction - b.flowFraction);
  const last = sorted[sorted.length - 1];
  if (last.reynoldsMin < threshold) return 1;
  for (let k = sorted.length - 2; k >= 0; k--) {
    const lo = sorted[k];
    const hi = sorted[k + 1];
    if (lo.reynoldsMin < threshold) {
      return lo.flowFraction + ((threshold - lo.reynoldsMin) / (hi.reynoldsMin - lo.reynoldsMin)) * (hi.flowFraction - lo.flowFraction);
    }
  }
  return null;
}
