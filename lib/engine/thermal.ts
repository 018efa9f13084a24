/**
 * Coil thermal solution, tube by tube (ENGINEERING.md 3.12): the outer loop around the segment sweep of
 * thermal-sweep.ts. Each outer iteration
 *   1. evaluates the air side at the mean of entering and leaving air (v1 decision 13): h_o, dry and wet surface
 *      efficiency (thermal-air-side.ts);
 *   2. evaluates the water side per tube at its mean water temperature: properties, h_i by the VDI/Gnielinski 2013
 *      scheme with the circuit's Re and L = developed circuit length, wall and optional fouling (3.9);
 *   3. sweeps water and air until the temperatures stop moving;
 *   4. re-splits the water flow with the new temperatures (viscosity) and repeats
 * until the capacity changes less than 0.01 %, or the iteration cap is hit (then `converged` is false and the
 * caller warns with the iteration count). Property providers are injectable so checks with fixed properties
 * (E1) can be run through the same code.
 */
import type { DerivedGeometry } from '@/lib/engine/geometry';
import type { TracedCircuit } from '@/lib/engine/topology';
import type { CoilDocument, ResultWarning } from '@/lib/engine/types';
import type { FluidProperties } from '@/lib/engine/properties/fluid';
import { nusseltGnielinski2013Vdi } from '@/lib/engine/tube-side';
import { moistAirState, standardPressure_Pa, wetBulbFromHumidityRatio_C, saturationSpecificHeat_J_kgK } from '@/lib/engine/psychrometrics';
import {
  buildSweepNetwork,
  createSweepState,
  mixedLeavingAir,
  moistAirEnthalpy_J_kg,
  runSweeps,
  CP_DRY_AIR_BKM,
  type SweepNetwork,
  type SweepState,
  type SaturationCurve,
} from '@/lib/engine/thermal-sweep';
import { tabulatedSaturationCurve } from '@/lib/engine/saturation-table';
import { solveCoilHydraulics, type CircuitTemperatures } from '@/lib/engine/coil-hydraulics';
import type { BendMethod, HydraulicsResult } from '@/lib/engine/hydraulics';
import { airPressureDrop_Pa, airSideCoefficients, airTransportAt, type AirTransport } from '@/lib/engine/thermal-air-side';

/** Outer loop stops when the capacity changes less than this (relative) between iterations (3.12 step 8). */
export const OUTER_CAPACITY_TOLERANCE = 1e-4;
/** Cap on outer iterations. */
export const OUTER_MAX_ITERATIONS = 25;
/** Sweep tolerance inside the coil solve, K (first outer iteration: the loose one, properties still move). */
export const COIL_SWEEP_TOLERANCE_K = 1e-5;
export const COIL_FIRST_SWEEP_TOLERANCE_K = 1e-3;
/** Looser tolerances for turndown points (ThermalOptions.precision 'part-load'). */
export const PART_LOAD_SWEEP_TOLERANCE_K = 1e-4;
export const PART_LOAD_CAPACITY_TOLERANCE = 1e-3;
/** Sweep cap per outer iteration. */
export const COIL_MAX_SWEEPS = 300;
/** Wet air pressure drop factor (v1 decision 9). */
export const WET_AIR_PRESSURE_DROP_FACTOR = 1.25;

export type FluidPropertyProvider = (t_C: number) => FluidProperties;

export interface ThermalProviders {
  fluid: FluidPropertyProvider;
  /** Fixed air transport properties (tests only, e.g. check E1); normally evaluated at the mean air temperature. */
  fixedAir?: AirTransport;
}

export interface ThermalOptions {
  segmentsPerTube: number;
  airMixing: 'strip' | 'staggered';
  bendMethod: BendMethod;
  /** Fraction of the document's water flow (turndown). */
  flowFraction?: number;
  /**
   * 'design' (default): sweeps to 1e-6 K, capacity settled to 0.01 %. 'part-load': sweeps to 1e-4 K and capacity
   * to 0.1 %, enough for the turndown curve at a fraction of the cost.
   */
  precision?: 'design' | 'part-load';
}

export interface CoilThermalResult {
  mode: 'heating' | 'cooling';
  /** Total heat exchanged, positive magnitude, W. */
  capacity_W: number;
  sensibleCapacity_W: number;
  latentCapacity_W: number;
  leavingAirDryBulb_C: number;
  leavingAirWetBulb_C: number;
  leavingAirHumidityRatio: number;
  leavingWaterTemperature_C: number;
  condensate_kg_s: number;
  airMassFlow_kg_s: number;
  airPressureDrop_Pa: number;
  airPressureDropIsWetEstimate: boolean;
  energyBalanceError: number;
  iterations: number;
  sweeps: number;
  converged: boolean;
  hydraulics: HydraulicsResult;
  temperatures: CircuitTemperatures[];
  /** Heat per circuit, positive magnitude, W. */
  circuitCapacity_W: number[];
  circuitLeaving_C: number[];
  /** Per tube in circuit order: water in/out. */
  warnings: ResultWarning[];
  /** Number of wet segments at the end. */
  wetSegments: number;
}

/** Entering air as the solver needs it. */
export interface EnteringAir {
  pressure_Pa: number;
  dryBulb_C: number;
  humidityRatio: number;
  moistDensity_kg_m3: number;
  dewPoint_C: number;
}

export function enteringAir(doc: CoilDocument): EnteringAir {
  const a = doc.conditions.air;
  const p = standardPressure_Pa(a.altitude_m);
  const s = moistAirState(
    a.inletWetBulb_C !== undefined
      ? { dryBulb_C: a.inletDryBulb_C, wetBulb_C: a.inletWetBulb_C, pressure_Pa: p }
      : { dryBulb_C: a.inletDryBulb_C, relativeHumidity: a.inletRelativeHumidity ?? 0, pressure_Pa: p },
  );
  return { pressure_Pa: p, dryBulb_C: a.inletDryBulb_C, humidityRatio: s.humidityRatio, moistDensity_kg_m3: s.moistDensity_kg_m3, dewPoint_C: s.dewPoint_C };
}

/** Moist-air density from dry bulb, W and pressure (ASHRAE F-2017 ch. 1 eq. 26), kg/m³. */
function moistDensity_kg_m3(t_C: number, w: number, p: number): number {
  return (1 + w) / ((287.042 * (t_C + 273.15) * (1 + 1.607858 * w)) / p);
}

/** Reusable solver workspace (network and sweep state) so turndown points warm-start from the design point. */
export interface ThermalWorkspace {
  network: SweepNetwork;
  state: SweepState;
}

export function createThermalWorkspace(doc: CoilDocument, circuits: TracedCircuit[], options: ThermalOptions): ThermalWorkspace {
  const g = doc.geometry;
  const network = buildSweepNetwork(
    g.rows,
    g.tubesPerRow,
    options.segmentsPerTube,
    circuits.map((c) => ({
      tubes: c.tubes.map((t) => (t.row - 1) * g.tubesPerRow + (t.tube - 1)),
      firstEntersAtConnection: c.supply.end === 'connection',
    })),
    options.airMixing,
  );
  return { network, state: createSweepState(network) };
}

export function solveCoilThermal(
  doc: CoilDocument,
  derived: DerivedGeometry,
  circuits: TracedCircuit[],
  providers: ThermalProviders,
  options: ThermalOptions,
  workspace: ThermalWorkspace = createThermalWorkspace(doc, circuits, options),
): CoilThermalResult {
  const g = doc.geometry;
  const fluid = doc.conditions.fluid;
  const flowFraction = options.flowFraction ?? 1;
  const totalWater = fluid.massFlow_kg_s * flowFraction;
  const twIn = fluid.inletTemperature_C;
  const air = enteringAir(doc);
  const taIn = air.dryBulb_C;
  const wIn = air.humidityRatio;
  const p = air.pressure_Pa;
  const mode: 'heating' | 'cooling' = twIn >= taIn ? 'heating' : 'cooling';

  // Air mass flow (v1 decision 1): entering moist density × face velocity × face area.
  const densityIn = providers.fixedAir?.density_kg_m3 ?? air.moistDensity_kg_m3;
  const airMoist = densityIn * doc.conditions.air.faceVelocity_m_s * derived.faceArea_m2;
  const airDry = airMoist / (1 + wIn);

  const { network, state } = workspace;
  const ns = network.segments;
  const tubeCount = network.tubeCount;
  const cooling = mode === 'cooling';
  const saturation: SaturationCurve | undefined = cooling && twIn < air.dewPoint_C ? tabulatedSaturationCurve(p, twIn - 2, taIn + 2) : undefined;

  // Per-segment areas and the wall resistance of one segment.
  const segLength = g.finnedLength_m / ns;
  const aoSeg = derived.outsideAreaPerTube_m2 / ns;
  const aiSeg = derived.insideAreaPerTube_m2 / ns;
  const di = derived.insideDiameter_m;
  const wallSeg = Math.log(g.tubeOuterDiameter_m / di) / (2 * Math.PI * g.tubeConductivity_W_mK * segLength);
  const foulingSeg = (g.insideFouling_m2K_W ?? 0) / aiSeg;

  const uaAirDry = new Float64Array(tubeCount);
  const uaAirWet = new Float64Array(tubeCount);
  const uaWater = new Float64Array(tubeCount);
  const cpWater = new Float64Array(tubeCount);
  const circuitMassFlow = new Float64Array(circuits.length);
  const circuitLength = circuits.map((c) => c.passes * g.finnedLength_m);
  const tubeIdsByCircuit = network.circuits;

  // Start: isothermal water at the entering temperature (or the previous solution in the workspace).
  const temps: CircuitTemperatures[] = circuits.map((c, ci) => {
    const ids = tubeIdsByCircuit[ci];
    const warm = state.initialised;
    return {
      tubeIn_C: Array.from({ length: c.passes }, (_, k) => (warm ? state.tubeWaterIn[ids[k]] : twIn)),
      tubeOut_C: Array.from({ length: c.passes }, (_, k) => (warm ? state.tubeWaterOut[ids[k]] : twIn)),
    };
  });
  let hydraulics = solveCoilHydraulics(g, derived, circuits, temps, totalWater, providers.fluid, options.bendMethod);

  const warmStart = state.initialised;
  const partLoad = options.precision === 'part-load';
  const sweepTolerance = partLoad ? PART_LOAD_SWEEP_TOLERANCE_K : COIL_SWEEP_TOLERANCE_K;
  const capacityTolerance = partLoad ? PART_LOAD_CAPACITY_TOLERANCE : OUTER_CAPACITY_TOLERANCE;
  let leavingGuess = state.initialised ? mixedLeavingAir(network, state).dryBulb_C : taIn + 0.5 * (twIn - taIn);
  let capacityPrev = NaN;
  let capacity = 0;
  let converged = false;
  let iterations: number;
  let sweeps = 0;
  const airWarnings: ResultWarning[] = [];
  let fanning = 0;
  let meanWater = twIn;

  for (iterations = 1; iterations <= OUTER_MAX_ITERATIONS; iterations++) {
    // 1. Air side at the mean air temperature.
    const transport = providers.fixedAir ?? airTransportAt(0.5 * (taIn + leavingGuess), wIn);
    // Wet fin: c_s over the span from the mean water temperature to the entering dew point (our choice).
    const csRatio = saturation && meanWater < air.dewPoint_C ? saturationSpecificHeat_J_kgK(meanWater, air.dewPoint_C, p) / CP_DRY_AIR_BKM : 1;
    const coeff = airSideCoefficients(g, derived, airMoist, transport, csRatio);
    fanning = coeff.fanning;
    if (iterations === 1) airWarnings.push(...coeff.warnings);
    const uaA = coeff.surfaceEfficiencyDry * coeff.h_o * aoSeg;
    const uaAW = coeff.surfaceEfficiencyWet * coeff.h_o * aoSeg;

    // 2. Water side per tube.
    for (let c = 0; c < circuits.length; c++) {
      const m = hydraulics.circuits[c].massFlow_kg_s;
      circuitMassFlow[c] = m;
      const ids = tubeIdsByCircuit[c];
      for (let k = 0; k < ids.length; k++) {
        const t = ids[k];
        const tm = 0.5 * (temps[c].tubeIn_C[k] + temps[c].tubeOut_C[k]);
        const fp = providers.fluid(tm);
        const re = (4 * m) / (Math.PI * di * fp.viscosity_Pa_s);
        const hi = (nusseltGnielinski2013Vdi(re, fp.prandtl, di / circuitLength[c]) * fp.conductivity_W_mK) / di;
        uaWater[t] = 1 / (1 / (hi * aiSeg) + foulingSeg + wallSeg);
        uaAirDry[t] = uaA;
        uaAirWet[t] = uaAW;
        cpWater[t] = fp.specificHeat_J_kgK;
      }
    }

    // 3. Sweep.
    const outcome = runSweeps(
      network,
      { airInletDryBulb_C: taIn, airInletHumidityRatio: wIn, airMassFlowDry_kg_s: airDry, uaAirDry, uaAirWet, uaWater, cpWater, circuitMassFlow, waterInlet_C: twIn, airInletDewPoint_C: air.dewPoint_C, saturation },
      state,
      { tolerance_K: iterations === 1 && !warmStart ? COIL_FIRST_SWEEP_TOLERANCE_K : sweepTolerance, maxSweeps: COIL_MAX_SWEEPS },
    );
    sweeps += outcome.sweeps;

    // Capacity (water side) and the new temperatures.
    capacity = 0;
    let waterSum = 0;
    for (let c = 0; c < circuits.length; c++) {
      const ids = tubeIdsByCircuit[c];
      for (let k = 0; k < ids.length; k++) {
        const t = ids[k];
        temps[c].tubeIn_C[k] = state.tubeWaterIn[t];
        temps[c].tubeOut_C[k] = state.tubeWaterOut[t];
        capacity += circuitMassFlow[c] * cpWater[t] * (state.tubeWaterIn[t] - state.tubeWaterOut[t]);
      }
      waterSum += circuitMassFlow[c] * state.circuitWaterOut[c];
    }
    meanWater = 0.5 * (twIn + waterSum / totalWater);
    leavingGuess = mixedLeavingAir(network, state).dryBulb_C;

    const change = Math.abs(capacity - capacityPrev) / Math.max(Math.abs(capacity), 1e-12);
    capacityPrev = capacity;
    if (outcome.converged && change < capacityTolerance && iterations > 1) {
      converged = true;
      break;
    }
    // 4. Re-split the water with the new temperatures.
    hydraulics = solveCoilHydraulics(g, derived, circuits, temps, totalWater, providers.fluid, options.bendMethod, hydraulics);
  }
  if (iterations > OUTER_MAX_ITERATIONS) {
    iterations = OUTER_MAX_ITERATIONS;
    // Not settled: report hydraulics at the last temperatures rather than the previous iteration's.
    hydraulics = solveCoilHydraulics(g, derived, circuits, temps, totalWater, providers.fluid, options.bendMethod, hydraulics);
  }
  // When converged, the hydraulics of the last iteration were split at temperatures that agree with the final
  // ones to within the outer tolerance, so they are reported as they are.

  // Leaving air, balances, condensate.
  const leaving = mixedLeavingAir(network, state);
  const hIn = moistAirEnthalpy_J_kg(taIn, wIn);
  const airHeat = airDry * (hIn - leaving.enthalpy_J_kg); // > 0 when the air is cooled
  const waterHeat = -capacity; // capacity above = heat given by the water; heat taken by water = −capacity
  const energyBalanceError = Math.abs(airHeat - waterHeat) / Math.max(Math.abs(waterHeat), Math.abs(airHeat), 1e-9);
  let wetSegments = 0;
  for (let i = 0; i < state.wet.length; i++) wetSegments += state.wet[i];
  const condensate = wetSegments > 0 ? Math.max(0, airDry * (wIn - leaving.humidityRatio)) : 0;
  const sensible = Math.abs(airDry * (1006 + 1860 * wIn) * (taIn - leaving.dryBulb_C));
  const total = Math.abs(airHeat);
  const isWet = wetSegments > 0 && condensate > 0;
  const densityOut = providers.fixedAir?.density_kg_m3 ?? moistDensity_kg_m3(leaving.dryBulb_C, leaving.humidityRatio, p);
  const dryAirDrop = airPressureDrop_Pa(derived, airMoist, fanning, densityIn, densityOut);
  // Wet bulb of the mixed leaving air (its W is held at or below saturation for the look-up).
  let leavingWetBulb: number;
  try {
    leavingWetBulb = wetBulbFromHumidityRatio_C(leaving.dryBulb_C, Math.max(leaving.humidityRatio, 1e-7), p);
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    leavingWetBulb = leaving.dryBulb_C;
  }

  const circuitCapacity_W = circuits.map((_, c) => {
    const ids = tubeIdsByCircuit[c];
    let q = 0;
    for (let k = 0; k < ids.length; k++) q += circuitMassFlow[c] * cpWater[ids[k]] * (state.tubeWaterIn[ids[k]] - state.tubeWaterOut[ids[k]]);
    return Math.abs(q);
  });
  let mixedOut = 0;
  for (let c = 0; c < circuits.length; c++) mixedOut += circuitMassFlow[c] * state.circuitWaterOut[c];
  mixedOut /= totalWater;

  return {
    mode,
    capacity_W: total,
    // A coil that condenses nothing exchanges sensible heat only (the two balances differ by rounding).
    sensibleCapacity_W: isWet ? Math.min(sensible, total) : total,
    latentCapacity_W: isWet ? Math.max(0, total - sensible) : 0,
    leavingAirDryBulb_C: leaving.dryBulb_C,
    leavingAirWetBulb_C: leavingWetBulb,
    leavingAirHumidityRatio: leaving.humidityRatio,
    leavingWaterTemperature_C: mixedOut,
    condensate_kg_s: condensate,
    airMassFlow_kg_s: airMoist,
    airPressureDrop_Pa: isWet ? dryAirDrop * WET_AIR_PRESSURE_DROP_FACTOR : dryAirDrop,
    airPressureDropIsWetEstimate: isWet,
    energyBalanceError,
    iterations,
    sweeps,
    converged,
    hydraulics,
    temperatures: temps,
    circuitCapacity_W,
    circuitLeaving_C: circuits.map((_, c) => state.circuitWaterOut[c]),
    warnings: airWarnings,
    wetSegments,
  };
}
