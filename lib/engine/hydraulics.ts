/**
 * Water-side hydraulics of a coil (ENGINEERING.md 3.4–3.6, v1 decisions 2–6): each circuit's header-to-header
 * pressure drop at a given flow, the flow split between circuits sharing one pressure drop, and what is reported
 * per circuit (flow, velocity and Re at the circuit's mean temperature, lowest Re along it, regime, ΔP).
 *
 * ΔP_c(ṁ) = Σ_tubes f_D(Re_t) (L_f/D_i) ρ_t V_t²/2 + Σ_bends K_b ρ_b V_b²/2 + (K_in ρ_in V_in² + K_out ρ_out V_out²)/2
 * with Churchill (1977) f_D at each tube's own temperature, K_b by Rennels & Hudson (2012) with the Churchill f_D
 * at the bend's Re (or Ito 1960 when chosen), K_in = 0.5, K_out = 1.0. Nozzle and header losses are left out.
 * Fluid properties come from an injected provider so tests can fix them (checks F5, F6).
 */
import { frictionFactorChurchill1977 } from '@/lib/engine/friction';
import { bendLossIto1960, bendLossRennelsHudson2012, ENTRANCE_LOSS_SHARP, EXIT_LOSS } from '@/lib/engine/bends';
import { flowRegime } from '@/lib/engine/tube-side';
import { maldistributionIndex, splitFlowBetweenCircuits, type WarmStart } from '@/lib/engine/flow-split';
import type { Regime } from '@/lib/engine/types';

/** Drawn copper roughness used when the document gives none, m (ENGINEERING.md 3.4 [M]). */
export const DEFAULT_TUBE_ROUGHNESS_M = 1.5e-6;

export type BendMethod = 'rennels' | 'ito';

/** Density and viscosity at a temperature (the part of the fluid properties hydraulics needs). */
export interface HydraulicProperties {
  density_kg_m3: number;
  viscosity_Pa_s: number;
}
export type HydraulicPropertyProvider = (temperature_C: number) => HydraulicProperties;

/** One circuit as hydraulics sees it: straight tubes and bends in water order with their temperatures. */
export interface CircuitHydraulicSpec {
  innerDiameter_m: number;
  tubeLength_m: number;
  roughness_m: number;
  /** Bend centre-line radius of each bend in water order, m. */
  bendRadii_m: number[];
  /** Mean water temperature of each tube (water order), °C. */
  tubeTemperatures_C: ArrayLike<number>;
  /** Water temperature at each bend (the junction between tube i and i+1), °C. */
  bendTemperatures_C: ArrayLike<number>;
  inletTemperature_C: number;
  outletTemperature_C: number;
}

/** Pre-evaluated circuit: properties looked up once, so ΔP(ṁ) costs only friction-factor evaluations. */
export interface CircuitPressureModel {
  innerDiameter_m: number;
  lengthOverDiameter: number;
  relativeRoughness: number;
  tubeDensity: Float64Array;
  tubeViscosity: Float64Array;
  bendRadiusOverDiameter: Float64Array;
  bendDensity: Float64Array;
  bendViscosity: Float64Array;
  inlet: HydraulicProperties;
  outlet: HydraulicProperties;
  bendMethod: BendMethod;
  /** Set when Ito's turbulent form was out of range for some bend and Rennels was used for it. */
  itoOutOfRange: boolean;
}

export function buildCircuitPressureModel(spec: CircuitHydraulicSpec, properties: HydraulicPropertyProvider, bendMethod: BendMethod = 'rennels'): CircuitPressureModel {
  const d = spec.innerDiameter_m;
  const nT = spec.tubeTemperatures_C.length;
  const nB = spec.bendRadii_m.length;
  const tubeDensity = new Float64Array(nT);
  const tubeViscosity = new Float64Array(nT);
  for (let i = 0; i < nT; i++) {
    const p = properties(spec.tubeTemperatures_C[i]);
    tubeDensity[i] = p.density_kg_m3;
    tubeViscosity[i] = p.viscosity_Pa_s;
  }
  const bendDensity = new Float64Array(nB);
  const bendViscosity = new Float64Array(nB);
  const bendRadiusOverDiameter = new Float64Array(nB);
  for (let i = 0; i < nB; i++) {
    const p = properties(spec.bendTemperatures_C[i]);
    bendDensity[i] = p.density_kg_m3;
    bendViscosity[i] = p.viscosity_Pa_s;
    bendRadiusOverDiameter[i] = spec.bendRadii_m[i] / d;
  }
  return {
    innerDiameter_m: d,
    lengthOverDiameter: spec.tubeLength_m / d,
    relativeRoughness: spec.roughness_m / d,
    tubeDensity,
    tubeViscosity,
    bendRadiusOverDiameter,
    bendDensity,
    bendViscosity,
    inlet: properties(spec.inletTemperature_C),
    outlet: properties(spec.outletTemperature_C),
    bendMethod,
    itoOutOfRange: false,
  };
}

/** Lowest Re at which Ito's turbulent form applies: Re (D/R)² > 364 (ENGINEERING.md 3.5). */
const ITO_DEAN_LIMIT = 364;

/**
 * Header-to-header pressure drop of one circuit at mass flow ṁ (kg/s), Pa (ENGINEERING.md 3.6).
 * Example (check F5/F6): D_i 11.88 mm, 6 tubes of 1.2192 m, 5 bends R 15.875 mm, water ρ 1000.001, μ 1.42681e−3,
 * ṁ 0.2 kg/s → 33 843.8 Pa.
 */
export function circuitPressureDrop_Pa(model: CircuitPressureModel, massFlow_kg_s: number): number {
  const d = model.innerDiameter_m;
  const area = (Math.PI * d * d) / 4;
  const g = massFlow_kg_s / area; // mass velocity, kg/(m² s); ρV²/2 = G²/(2ρ)
  const reFactor = g * d;
  const g2half = 0.5 * g * g;
  let dp = 0;
  // Tubes and bends at the same viscosity share Re and f_D: evaluate Churchill once per distinct viscosity run.
  let lastMu = NaN;
  let lastF = NaN;
  const friction = (mu: number): number => {
    if (mu !== lastMu) {
      lastMu = mu;
      lastF = frictionFactorChurchill1977(reFactor / mu, model.relativeRoughness);
    }
    return lastF;
  };
  for (let i = 0; i < model.tubeDensity.length; i++) {
    dp += (friction(model.tubeViscosity[i]) * model.lengthOverDiameter * g2half) / model.tubeDensity[i];
  }
  let kF0 = NaN, kRd0 = NaN, kK0 = NaN, kF1 = NaN, kRd1 = NaN, kK1 = NaN;
  for (let i = 0; i < model.bendDensity.length; i++) {
    const mu = model.bendViscosity[i];
    const re = reFactor / mu;
    const rd = model.bendRadiusOverDiameter[i];
    let k: number;
    if (model.bendMethod === 'ito' && re / (rd * rd) > ITO_DEAN_LIMIT) k = bendLossIto1960(re, rd, 180);
    else {
      if (model.bendMethod === 'ito') model.itoOutOfRange = true;
      const f = friction(mu);
      // Two-slot memo: a circuit's bends come in few radii (same-row and next-row spans).
      if (f === kF0 && rd === kRd0) k = kK0;
      else if (f === kF1 && rd === kRd1) k = kK1;
      else {
        k = bendLossRennelsHudson2012(f, Math.PI, rd);
        kF1 = kF0;
        kRd1 = kRd0;
        kK1 = kK0;
        kF0 = f;
        kRd0 = rd;
        kK0 = k;
      }
    }
    dp += (k * g2half) / model.bendDensity[i];
  }
  dp += (ENTRANCE_LOSS_SHARP * g2half) / model.inlet.density_kg_m3 + (EXIT_LOSS * g2half) / model.outlet.density_kg_m3;
  return dp;
}

export interface CircuitHydraulics {
  massFlow_kg_s: number;
  /** At the circuit's mean water temperature (v1 decision 5). */
  velocity_m_s: number;
  reynolds: number;
  /** Lowest Re along the circuit (tubes and bends). */
  reynoldsMin: number;
  /** Highest velocity along the circuit, m/s (for the erosion check). */
  velocityMax_m_s: number;
  regime: Regime;
  pressureDrop_Pa: number;
}

export interface HydraulicsResult {
  circuits: CircuitHydraulics[];
  /** The split's flows, kg/s (a warm start for the next split of the same circuits). */
  massFlows_kg_s: Float64Array;
  /** Coil water pressure drop = the common header-to-header ΔP (v1 decision 4), Pa. */
  pressureDrop_Pa: number;
  maldistribution: number;
  converged: boolean;
  iterations: number;
  /** Ito was chosen but out of range for some bends; Rennels was used there. */
  itoOutOfRange: boolean;
}

/**
 * Flow split and per-circuit hydraulics for circuits given as specs (ENGINEERING.md 3.6).
 * `meanTemperatures_C[c]` is the circuit's mean water temperature for the reported velocity and Re.
 */
export function solveCircuitHydraulics(
  specs: CircuitHydraulicSpec[],
  meanTemperatures_C: ArrayLike<number>,
  totalMassFlow_kg_s: number,
  properties: HydraulicPropertyProvider,
  bendMethod: BendMethod = 'rennels',
  warm?: WarmStart,
): HydraulicsResult {
  const models = specs.map((s) => buildCircuitPressureModel(s, properties, bendMethod));
  // Circuits with identical tubes, bends and temperatures share one pressure-drop curve: split between groups
  // (a group of k carries k times the flow of one member at the same ΔP), then share equally inside a group.
  const groupOf = new Int32Array(models.length);
  const groups: { model: CircuitPressureModel; count: number }[] = [];
  const keyIndex = new Map<string, number>();
  models.forEach((m, c) => {
    const key = [
      m.bendMethod,
      m.inlet.density_kg_m3,
      m.inlet.viscosity_Pa_s,
      m.outlet.density_kg_m3,
      m.outlet.viscosity_Pa_s,
      m.tubeDensity.join(','),
      m.tubeViscosity.join(','),
      m.bendRadiusOverDiameter.join(','),
      m.bendDensity.join(','),
      m.bendViscosity.join(','),
    ].join('|');
    let g = keyIndex.get(key);
    if (g === undefined) {
      g = groups.length;
      keyIndex.set(key, g);
      groups.push({ model: m, count: 0 });
    }
    groups[g].count++;
    groupOf[c] = g;
  });
  let groupWarm: { massFlows_kg_s: Float64Array; pressureDrop_Pa: number } | undefined;
  if (warm && warm.massFlows_kg_s.length === models.length) {
    const flows = new Float64Array(groups.length);
    for (let c = 0; c < models.length; c++) flows[groupOf[c]] += warm.massFlows_kg_s[c];
    groupWarm = { massFlows_kg_s: flows, pressureDrop_Pa: warm.pressureDrop_Pa };
  }
  const groupSplit = splitFlowBetweenCircuits(
    groups.map((g) => (flow: number) => circuitPressureDrop_Pa(g.model, flow / g.count)),
    totalMassFlow_kg_s,
    groupWarm,
  );
  const perCircuit = new Float64Array(models.length);
  for (let c = 0; c < models.length; c++) perCircuit[c] = groupSplit.massFlows_kg_s[groupOf[c]] / groups[groupOf[c]].count;
  const split = { ...groupSplit, massFlows_kg_s: perCircuit };
  const circuits = models.map((model, c): CircuitHydraulics => {
    const m = split.massFlows_kg_s[c];
    const d = model.innerDiameter_m;
    const area = (Math.PI * d * d) / 4;
    const mean = properties(meanTemperatures_C[c]);
    const reynolds = (4 * m) / (Math.PI * d * mean.viscosity_Pa_s);
    let maxViscosity = Math.max(model.inlet.viscosity_Pa_s, model.outlet.viscosity_Pa_s);
    let minDensity = Math.min(model.inlet.density_kg_m3, model.outlet.density_kg_m3);
    for (let i = 0; i < model.tubeViscosity.length; i++) {
      maxViscosity = Math.max(maxViscosity, model.tubeViscosity[i]);
      minDensity = Math.min(minDensity, model.tubeDensity[i]);
    }
    for (let i = 0; i < model.bendViscosity.length; i++) maxViscosity = Math.max(maxViscosity, model.bendViscosity[i]);
    model.itoOutOfRange = false; // judged at the final flow only
    const reynoldsMin = (4 * m) / (Math.PI * d * maxViscosity);
    return {
      massFlow_kg_s: m,
      velocity_m_s: m / (mean.density_kg_m3 * area),
      reynolds,
      reynoldsMin,
      velocityMax_m_s: m / (minDensity * area),
      regime: flowRegime(reynoldsMin),
      pressureDrop_Pa: circuitPressureDrop_Pa(model, m),
    };
  });
  return {
    circuits,
    massFlows_kg_s: split.massFlows_kg_s,
    pressureDrop_Pa: split.pressureDrop_Pa,
    maldistribution: maldistributionIndex(split.massFlows_kg_s),
    converged: split.converged,
    iterations: split.iterations,
    itoOutOfRange: models.some((m) => m.itoOutOfRange),
  };
}
