/**
 * Hydraulics of a traced coil: builds the per-circuit specs (tubes, bends and their water temperatures) from the
 * topology and runs the flow split of hydraulics.ts. Used by the solver (with the thermal solution's
 * temperatures) and by turndown (at other flows).
 */
import type { DerivedGeometry } from '@/lib/engine/geometry';
import { tubeCentre } from '@/lib/engine/geometry';
import type { TracedCircuit } from '@/lib/engine/topology';
import type { Geometry } from '@/lib/engine/types';
import {
  DEFAULT_TUBE_ROUGHNESS_M,
  solveCircuitHydraulics,
  type BendMethod,
  type CircuitHydraulicSpec,
  type HydraulicPropertyProvider,
  type HydraulicsResult,
} from '@/lib/engine/hydraulics';
import type { CircuitFlowFacts } from '@/lib/engine/warnings';

/** Water temperatures along each circuit in water order: tube inlets and outlets. */
export interface CircuitTemperatures {
  tubeIn_C: number[];
  tubeOut_C: number[];
}

/** Isothermal temperatures (every point at the entering water temperature). */
export function isothermalTemperatures(circuits: TracedCircuit[], t_C: number): CircuitTemperatures[] {
  return circuits.map((c) => ({ tubeIn_C: new Array(c.passes).fill(t_C), tubeOut_C: new Array(c.passes).fill(t_C) }));
}

export function circuitSpecs(g: Geometry, derived: DerivedGeometry, circuits: TracedCircuit[], temps: CircuitTemperatures[]): CircuitHydraulicSpec[] {
  return circuits.map((c, ci) => {
    const t = temps[ci];
    const tubeMean = Array.from({ length: c.passes }, (_, i) => 0.5 * (t.tubeIn_C[i] + t.tubeOut_C[i]));
    // The bend after tube i carries the water leaving tube i.
    const bendT = c.bends.map((_, i) => t.tubeOut_C[i]);
    return {
      innerDiameter_m: derived.insideDiameter_m,
      tubeLength_m: g.finnedLength_m,
      roughness_m: g.tubeRoughness_m ?? DEFAULT_TUBE_ROUGHNESS_M,
      bendRadii_m: c.bends.map((b) => b.radius_m),
      tubeTemperatures_C: tubeMean,
      bendTemperatures_C: bendT,
      inletTemperature_C: t.tubeIn_C[0],
      outletTemperature_C: t.tubeOut_C[c.passes - 1],
    };
  });
}

/** Mean water temperature of each circuit (mean of its tube means). */
export function circuitMeanTemperatures(circuits: TracedCircuit[], temps: CircuitTemperatures[]): number[] {
  return circuits.map((c, ci) => {
    let s = 0;
    for (let i = 0; i < c.passes; i++) s += 0.5 * (temps[ci].tubeIn_C[i] + temps[ci].tubeOut_C[i]);
    return s / c.passes;
  });
}

export function solveCoilHydraulics(
  g: Geometry,
  derived: DerivedGeometry,
  circuits: TracedCircuit[],
  temps: CircuitTemperatures[],
  totalMassFlow_kg_s: number,
  properties: HydraulicPropertyProvider,
  bendMethod: BendMethod,
  warm?: HydraulicsResult,
): HydraulicsResult {
  return solveCircuitHydraulics(
    circuitSpecs(g, derived, circuits, temps),
    circuitMeanTemperatures(circuits, temps),
    totalMassFlow_kg_s,
    properties,
    bendMethod,
    warm ? { massFlows_kg_s: warm.massFlows_kg_s, pressureDrop_Pa: warm.pressureDrop_Pa } : undefined,
  );
}

/** Whether a circuit has a leg where the water runs downward (a bend to a lower tube centre). */
export function circuitRunsDownward(g: Geometry, c: TracedCircuit): boolean {
  return c.bends.some((b) => tubeCentre(g, b.b).y_m > tubeCentre(g, b.a).y_m + 1e-12);
}

/** The facts the velocity and regime warnings need, per circuit. */
export function circuitFlowFacts(g: Geometry, circuits: TracedCircuit[], h: HydraulicsResult, temps: CircuitTemperatures[]): CircuitFlowFacts[] {
  return circuits.map((c, ci) => {
    let maxT = -Infinity;
    for (let i = 0; i < c.passes; i++) maxT = Math.max(maxT, temps[ci].tubeIn_C[i], temps[ci].tubeOut_C[i]);
    const r = h.circuits[ci];
    return {
      index: c.index,
      velocity_m_s: r.velocity_m_s,
      velocityMax_m_s: r.velocityMax_m_s,
      reynoldsMin: r.reynoldsMin,
      regime: r.regime,
      maxTemperature_C: maxT,
      runsDownward: circuitRunsDownward(g, c),
    };
  });
}
