/**
 * solveCoil: the engine's single entry point (ARCHITECTURE.md section 3). Traces the circuiting, and for a valid
 * drawing solves the hydraulics (flow split, ΔP, velocity, Re, regime) and the coil's thermal performance tube by
 * tube, then collects the warnings, the bill of materials, part-load (turndown) points and the methods used.
 * It never throws for a schema-valid document: impossible states (a temperature outside the property range,
 * for instance) come back as a critical warning with the thermal and hydraulic parts left out.
 */
import type { CircuitResult, CoilDocument, MethodNote, ResultWarning, SolveResult, TubeResult } from '@/lib/engine/types';
import { traceCircuits, type TracedCircuit } from '@/lib/engine/topology';
import { deriveGeometry } from '@/lib/engine/geometry';
import { freezingPoint_C, fluidProperties, type FluidProperties, type FluidSpec } from '@/lib/engine/properties/fluid';
import { circuitFlowFacts, type CircuitTemperatures } from '@/lib/engine/coil-hydraulics';
import type { HydraulicsResult } from '@/lib/engine/hydraulics';
import {
  DEFAULT_PRESSURE_DROP_LIMIT_PA,
  energyBalanceWarnings,
  freezeWarnings,
  partLoadWarnings,
  pressureDropWarnings,
  regimeWarnings,
  solverDefectWarnings,
  velocityWarnings,
  wetFaceVelocityWarnings,
} from '@/lib/engine/warnings';
import { circuitTurndown, crossingFraction, turndownFractions } from '@/lib/engine/turndown';
import { LAMINAR_UPPER_RE, TURBULENT_LOWER_RE } from '@/lib/engine/tube-side';
import { createThermalWorkspace, solveCoilThermal, WET_AIR_PRESSURE_DROP_FACTOR, type ThermalOptions } from '@/lib/engine/thermal';

/** Segments per tube when the document does not say (ENGINEERING.md 3.12 recommends 4–10). */
export const DEFAULT_SEGMENTS_PER_TUBE = 6;
import { billOfMaterials } from '@/lib/engine/bom';

/**
 * The fluid property provider of a solve: fluidProperties with a one-entry memo (the isothermal start and the
 * bends that share a tube's temperature ask for the same temperature repeatedly).
 */
export function cachedFluidProperties(fluid: FluidSpec): (t_C: number) => FluidProperties {
  let lastT = NaN;
  let last: FluidProperties | null = null;
  return (t) => {
    if (t !== lastT || last === null) {
      last = fluidProperties(fluid, t);
      lastT = t;
    }
    return last;
  };
}

function baseCircuit(c: TracedCircuit): CircuitResult {
  return {
    index: c.index,
    tubes: c.tubes,
    passes: c.passes,
    arrangement: c.arrangement,
    counterflowIndex: c.counterflowIndex,
    supply: c.supply,
    return: c.return,
    connectionsSameEnd: c.connectionsSameEnd,
    supplyAtBottom: c.supplyAtBottom,
    returnAtTop: c.returnAtTop,
  };
}

const HYDRAULIC_METHODS: MethodNote[] = [
  { topic: 'tube friction', method: 'Churchill (1977) Darcy friction factor over the finned length of each tube at its local temperature; drawn copper roughness 1.5 µm unless given', source: 'Churchill, S.W. (1977) Chem. Eng. 84(24):91–92' },
  { topic: 'return bends and hairpins', method: 'Rennels & Hudson K with the local Churchill f_D for every bend (Ito 1960 when chosen); sharp entry K 0.5, exit K 1.0', source: 'Rennels, D.C., Hudson, H.M. (2012) Pipe Flow, Wiley; Ito, H. (1960) J. Basic Eng. 82:131' },
  { topic: 'flow split', method: 'all circuits share one header-to-header pressure drop; bracketed log-log secant with bisection fallback, flows to 1e-12', source: 'Tubeloom method (parallel pipes share one pressure drop)' },
  { topic: 'coil water pressure drop', method: 'the common circuit pressure drop; nozzle and header losses are left out (the document has no connection size)', source: 'Tubeloom version 1 choice' },
  { topic: 'fluid properties', method: 'water: IAPWS-IF97 region 1, IAPWS 2008 viscosity, IAPWS 2011 conductivity at 0.3 MPa; glycols: Melinder polynomials', source: 'IAPWS R7-97, R12-08, R15-11; Melinder, Å. (2010) IIR' },
  { topic: 'erosion velocity limit', method: '"cold" water taken as up to 30 °C (2.4 m/s); 1.5 m/s up to 60 °C; 0.9 m/s above (our choice of the cold bound)', source: 'Common practice for copper tube; 30 °C bound is our choice' },
];

const THERMAL_METHODS = (segments: number, airMixing: 'strip' | 'staggered', fin: 'plain' | 'wavy'): MethodNote[] => [
  { topic: 'tube-by-tube solver', method: `${segments} segments per tube; water followed along each circuit; air ${airMixing === 'strip' ? 'in strips (each tube position keeps its own air)' : 'mixed half-and-half between the two upstream tubes (staggered, half-pitch bands)'}; Gauss–Seidel sweeps to 1e-5 K, outer iterations until the capacity changes < 0.01 %`, source: 'Tubeloom method on ε-NTU relations (Shah & Sekulić 2003)' },
  { topic: 'dry segments', method: 'water mixed, air unmixed segment effectiveness P_w = 1 − exp[−(C_a/C_w)(1 − e^(−UA/C_a))]', source: 'Incropera & DeWitt, Fundamentals of Heat and Mass Transfer' },
  { topic: 'wet segments', method: 'enthalpy-based ε-NTU (BKM) per segment, c_s between the segment water temperatures; wet when the surface temperature at the segment air inlet is below the local dew point; a segment flipping 5 times is frozen', source: 'Braun, Klein & Mitchell (1989) ASHRAE Trans. 95(2)' },
  { topic: 'saturation curve', method: 'ASHRAE psychrometric equations tabulated once per solve on a 0.1 K grid with cubic Hermite interpolation (our speed choice)', source: 'ASHRAE Handbook—Fundamentals 2017 ch. 1 (psychrolib)' },
  { topic: 'tube-side heat transfer', method: 'VDI / Gnielinski (2013) scheme per tube at its mean water temperature with the circuit Re; L = developed circuit length', source: 'Gnielinski, V. (2013) IJHMT 63:134; VDI Heat Atlas ch. G1' },
  {
    topic: 'air-side heat transfer and friction',
    method: fin === 'wavy' ? 'Wang, Hwang & Lin herringbone j and f (unverified transcription); rows above 6 computed as 6' : 'Wang, Chi & Chang plain-fin j and f; rows above 6 computed as 6',
    source: fin === 'wavy' ? 'Wang, C.C., Hwang, Y.M., Lin, Y.T. (2002) Int. J. Refrig. 25:673' : 'Wang, C.C., Chi, K.Y., Chang, C.J. (2000) IJHMT 43:2693',
  },
  { topic: 'fin efficiency', method: 'Schmidt equivalent circular fin; wet fins with the Threlkeld parameter, c_s,f taken between the mean water temperature and the entering dew point (our choice)', source: 'Schmidt, T.E. (1949) Refrig. Eng. 57:351; Threlkeld, J.L. (1970)' },
  { topic: 'air properties and flow', method: 'air mass flow = entering moist density × face velocity × face area; transport properties at the mean of entering and leaving air', source: 'ASHRAE Fundamentals 2017 ch. 1; US Standard Atmosphere 1976' },
  { topic: 'air pressure drop', method: 'Kays & London core equation with Wang f; condensing coils: dry value × 1.25 (an estimate)', source: 'Kays & London (1984) Compact Heat Exchangers; wet factor an estimate' },
  { topic: 'turndown', method: 'every flow fraction 0.1–1.0 and the minimum flow fraction solved in full (thermal and hydraulic) with the entering temperatures held; part-load points settled to 0.1 % capacity (design point 0.01 %)', source: 'Tubeloom method; regime bounds per Gnielinski (2013)' },
];

function emptyResult(valid: boolean, circuits: CircuitResult[], warnings: ResultWarning[]): SolveResult {
  return { valid, errors: [], warnings, circuits, totals: { circuitCount: circuits.length }, tubes: [] };
}

/**
 * Glycol derating (ENGINEERING.md section 5 item 2): the same coil with plain water at the same mass flow and
 * entering temperature, stated as an info note; empty when water cannot run at that temperature.
 */
function glycolDerating(
  doc: CoilDocument,
  derived: ReturnType<typeof deriveGeometry>,
  traced: TracedCircuit[],
  options: ThermalOptions,
  capacity_W: number,
  pressureDrop_Pa: number,
  slowCircuits: boolean,
): ResultWarning[] {
  const water = { ...doc.conditions.fluid, kind: 'water' as const, glycolMassFraction: 0 };
  if (water.inletTemperature_C < 1) return [];
  try {
    const waterDoc: CoilDocument = { ...doc, conditions: { ...doc.conditions, fluid: water } };
    const ref = solveCoilThermal(waterDoc, derived, traced, { fluid: cachedFluidProperties(water) }, options);
    if (!(ref.capacity_W > 0)) return [];
    const advice = slowCircuits ? ' Circuits run below Re 4000 with this glycol: fewer, longer circuits (higher velocity) recover much of the loss.' : '';
    return [
      {
        code: 'glycol-derating',
        severity: 'info',
        message: `with plain water at the same flow this coil would give ${(ref.capacity_W / 1000).toFixed(1)} kW at ${(ref.hydraulics.pressureDrop_Pa / 1000).toFixed(1)} kPa; the glycol gives ${Math.round((capacity_W / ref.capacity_W) * 100)} % of that capacity at ${(pressureDrop_Pa / ref.hydraulics.pressureDrop_Pa).toFixed(2)} × the pressure drop.${advice}`,
      },
    ];
  } catch (e) {
    if (e instanceof RangeError) return [];
    throw e;
  }
}

/** Engine-side switches of a solve (not part of the document). */
export interface SolveCoilSettings {
  /** Solve every turndown fraction thermally (default true); false reports only the design point's fraction. */
  turndown?: boolean;
}

/** Solve a (schema-valid) coil document. */
export function solveCoil(doc: CoilDocument, settings: SolveCoilSettings = {}): SolveResult {
  const started = typeof performance !== 'undefined' ? performance.now() : Date.now();
  const topology = traceCircuits(doc);
  const circuits = topology.circuits.map(baseCircuit);
  if (!topology.valid) {
    const r = emptyResult(false, circuits, topology.warnings);
    r.errors = topology.errors;
    return r;
  }
  const warnings: ResultWarning[] = [...topology.warnings];
  try {
    const g = doc.geometry;
    const derived = deriveGeometry(g);
    const fluid = doc.conditions.fluid;
    const props = cachedFluidProperties(fluid);
    const bendMethod = doc.options?.bendMethod ?? 'rennels';
    const traced = topology.circuits;

    const segmentsPerTube = doc.options?.segmentsPerTube ?? DEFAULT_SEGMENTS_PER_TUBE;
    const airMixing = doc.options?.airMixing ?? 'strip';
    const thermalOptions: ThermalOptions = { segmentsPerTube, airMixing, bendMethod };
    const workspace = createThermalWorkspace(doc, traced, thermalOptions);
    const thermal = solveCoilThermal(doc, derived, traced, { fluid: props }, thermalOptions, workspace);
    const hydraulics: HydraulicsResult = thermal.hydraulics;
    const temps: CircuitTemperatures[] = thermal.temperatures;

    circuits.forEach((c, i) => {
      const h = hydraulics.circuits[i];
      c.massFlow_kg_s = h.massFlow_kg_s;
      c.velocity_m_s = h.velocity_m_s;
      c.reynolds = h.reynolds;
      c.reynoldsMin = h.reynoldsMin;
      c.regime = h.regime;
      c.pressureDrop_Pa = h.pressureDrop_Pa;
      c.leavingTemperature_C = thermal.circuitLeaving_C[i];
      c.capacity_W = thermal.circuitCapacity_W[i];
    });

    // Turndown: each flow fraction solved thermally (warm-started from the design solution's workspace).
    const fractions = settings.turndown === false ? [...new Set([doc.conditions.minimumFlowFraction, 1])].sort((a, b) => a - b) : turndownFractions(doc.conditions.minimumFlowFraction);
    const failedFractions: number[] = [];
    const partLoad = fractions.flatMap((f) => {
      if (f === 1) return [{ flowFraction: f, thermal }];
      try {
        return [{ flowFraction: f, thermal: solveCoilThermal(doc, derived, traced, { fluid: props }, { ...thermalOptions, flowFraction: f, precision: 'part-load' }, workspace) }];
      } catch (e) {
        // A part-load point outside the property ranges is left out, not the whole result.
        if (!(e instanceof RangeError)) throw e;
        failedFractions.push(f);
        return [];
      }
    });
    // Where each circuit turns transitional and laminar: interpolated between the solved fractions, or (without
    // the turndown solves) estimated with Re proportional to flow.
    const estimates = circuitTurndown(traced, hydraulics);
    circuits.forEach((c, i) => {
      const points = partLoad.map((p) => ({ flowFraction: p.flowFraction, reynoldsMin: p.thermal.hydraulics.circuits[i].reynoldsMin }));
      const transitional = settings.turndown === false ? estimates[i].transitionalBelowFraction : crossingFraction(points, TURBULENT_LOWER_RE);
      const laminar = settings.turndown === false ? estimates[i].laminarBelowFraction : crossingFraction(points, LAMINAR_UPPER_RE);
      if (transitional !== null) c.transitionalBelowFlowFraction = transitional;
      if (laminar !== null) c.laminarBelowFlowFraction = laminar;
    });
    const minimum = partLoad.find((p) => p.flowFraction === doc.conditions.minimumFlowFraction) ?? null;
    const designFacts = circuitFlowFacts(g, traced, hydraulics, temps);
    const minimumFacts = minimum ? circuitFlowFacts(g, traced, minimum.thermal.hydraulics, minimum.thermal.temperatures) : null;
    const laminarAtMinimum = (minimumFacts ?? []).filter((c) => c.regime === 'laminar').map((c) => c.index);

    warnings.push(...regimeWarnings(designFacts, minimumFacts, doc.conditions.minimumFlowFraction));
    warnings.push(...velocityWarnings(designFacts));
    warnings.push(...pressureDropWarnings(hydraulics.pressureDrop_Pa, doc.options?.pressureDropLimit_Pa ?? DEFAULT_PRESSURE_DROP_LIMIT_PA));
    warnings.push(
      ...freezeWarnings({
        fluidKind: fluid.kind,
        freezingPoint_C: freezingPoint_C(fluid),
        minimumAirTemperature_C: doc.conditions.minimumAirTemperature_C,
        laminarAtMinimumFlow: laminarAtMinimum,
      }),
    );
    warnings.push(...partLoadWarnings(laminarAtMinimum, doc.conditions.minimumFlowFraction, minimum?.thermal.capacity_W, thermal.capacity_W));
    warnings.push(...thermal.warnings);
    warnings.push(...wetFaceVelocityWarnings(doc.conditions.air.faceVelocity_m_s, thermal.condensate_kg_s));
    warnings.push(...energyBalanceWarnings(thermal.energyBalanceError));
    if (fluid.kind !== 'water' && settings.turndown !== false) {
      warnings.push(...glycolDerating(doc, derived, traced, thermalOptions, thermal.capacity_W, hydraulics.pressureDrop_Pa, designFacts.some((c) => c.regime !== 'turbulent')));
    }
    warnings.push(...solverDefectWarnings(thermal, fluid.inletTemperature_C, doc.conditions.air.inletDryBulb_C));
    if (failedFractions.length > 0) {
      warnings.push({
        code: 'turndown-point-impossible',
        severity: 'warning',
        message: `part-load points at ${failedFractions.map((f) => `${Math.round(f * 100)} %`).join(', ')} flow could not be solved (a temperature leaves the fluid's property range) and are left out`,
      });
    }
    if (!thermal.converged) {
      warnings.push({ code: 'thermal-not-converged', severity: 'warning', message: `the thermal solution did not settle within ${thermal.iterations} outer iterations (${thermal.sweeps} sweeps); the capacity may be off by more than 0.01 %` });
    }
    if (hydraulics.itoOutOfRange) {
      warnings.push({ code: 'ito-out-of-range', severity: 'warning', message: "Ito's bend loss does not apply at this low Reynolds number for some bends; Rennels & Hudson was used for them." });
    }
    if (!hydraulics.converged) {
      warnings.push({ code: 'flow-split-not-converged', severity: 'warning', message: `the flow split did not reach its tolerance after ${hydraulics.iterations} iterations` });
    }
    warnings.push({ code: 'header-losses-left-out', severity: 'info', message: 'the water pressure drop is the circuit (header-to-header) pressure drop; nozzle and header losses are left out in this version' });
    if (thermal.airPressureDropIsWetEstimate) {
      warnings.push({ code: 'wet-air-pressure-drop-estimate', severity: 'info', message: `the air pressure drop of this condensing coil is the dry value × ${WET_AIR_PRESSURE_DROP_FACTOR}, an estimate: no validated wet-surface correlation is used` });
    }

    const tubes: TubeResult[] = [];
    traced.forEach((c, ci) =>
      c.tubes.forEach((t, k) => tubes.push({ row: t.row, tube: t.tube, circuit: c.index, waterIn_C: temps[ci].tubeIn_C[k], waterOut_C: temps[ci].tubeOut_C[k] })),
    );

    const result: SolveResult = {
      valid: true,
      errors: [],
      warnings,
      circuits,
      totals: {
        mode: thermal.mode,
        capacity_W: thermal.capacity_W,
        sensibleCapacity_W: thermal.sensibleCapacity_W,
        latentCapacity_W: thermal.latentCapacity_W,
        leavingAirDryBulb_C: thermal.leavingAirDryBulb_C,
        leavingAirWetBulb_C: thermal.leavingAirWetBulb_C,
        leavingAirHumidityRatio: thermal.leavingAirHumidityRatio,
        leavingWaterTemperature_C: thermal.leavingWaterTemperature_C,
        waterPressureDrop_Pa: hydraulics.pressureDrop_Pa,
        airPressureDrop_Pa: thermal.airPressureDrop_Pa,
        airPressureDropIsWetEstimate: thermal.airPressureDropIsWetEstimate,
        condensate_kg_s: thermal.condensate_kg_s,
        faceVelocity_m_s: doc.conditions.air.faceVelocity_m_s,
        airMassFlow_kg_s: thermal.airMassFlow_kg_s,
        circuitCount: circuits.length,
        maldistribution: hydraulics.maldistribution,
        energyBalanceError: thermal.energyBalanceError,
        iterations: thermal.iterations,
        converged: thermal.converged,
      },
      tubes,
      turndown: partLoad.map((p) => ({
        flowFraction: p.flowFraction,
        capacity_W: p.thermal.capacity_W,
        minReynolds: Math.min(...p.thermal.hydraulics.circuits.map((c) => c.reynoldsMin)),
        waterPressureDrop_Pa: p.thermal.hydraulics.pressureDrop_Pa,
      })),
      billOfMaterials: billOfMaterials(doc, props(fluid.inletTemperature_C).density_kg_m3),
      methods: [...HYDRAULIC_METHODS, ...THERMAL_METHODS(segmentsPerTube, airMixing, g.fin.type)],
    };
    result.solveTime_ms = (typeof performance !== 'undefined' ? performance.now() : Date.now()) - started;
    return result;
  } catch (e) {
    // Never throw for a schema-valid document: report why, with the thermal and hydraulic parts left out.
    const message = e instanceof Error ? e.message : String(e);
    const impossible = e instanceof RangeError;
    const kept = topology.warnings.slice();
    kept.push({
      code: impossible ? 'solve-impossible' : 'solver-error',
      severity: 'critical',
      message: impossible ? `the coil could not be solved: ${message}` : `the solver failed unexpectedly (${message}); please report this coil`,
    });
    return emptyResult(true, topology.circuits.map(baseCircuit), kept);
  }
}
