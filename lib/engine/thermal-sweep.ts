/**
 * Tube-by-tube (segment) sweep of ENGINEERING.md 3.12, steps 2 and 5–7.
 *
 * Every tube is cut into n_s segments along its length. The water is followed along each circuit in flow
 * order (the direction alternates from pass to pass); the air crossing a segment comes from the segment at
 * the same length position in the row upstream: its own strip (option A, "strip") or, for "staggered" mixing
 * (option B), the half-pitch bands the tube sits across. A segment is dry (ENGINEERING.md 3.10 segment
 * formula, water mixed, air unmixed) or wet (the BKM segment form of 3.11), decided locally by v1 decision 11.
 *
 * The sweep is Gauss–Seidel: a segment reads the latest leaving-air state of its upstream segments. It
 * repeats until no water or air temperature moves more than the tolerance, with a hard cap on sweeps.
 * All state lives in typed arrays allocated once per network (no allocation inside the sweep).
 *
 * The per-tube conductances, water specific heats and circuit flows are inputs, so the outer loop (thermal.ts)
 * can update them between calls, and tests can inject a constant conductance (checks N6–N13).
 */
import { segmentEffectivenessWaterMixed } from '@/lib/engine/effectiveness';

/** Specific heat of dry air inside the BKM wet formulas, J/(kg K) (v1 decision 13). */
export const CP_DRY_AIR_BKM = 1006;
/** Moist-air enthalpy constants, J/kg (ENGINEERING.md 3.3: h = 1006 t + W (2 501 000 + 1860 t)). */
const H_DRY = 1006;
const H_FG0 = 2501000;
const H_VAP = 1860;

/** Default convergence tolerance of the sweep: the largest temperature change between sweeps, K. */
export const SWEEP_TOLERANCE_K = 1e-8;
/** Default cap on sweeps per call. */
export const SWEEP_MAX_SWEEPS = 400;
/** A segment whose dry/wet state has flipped this many times is frozen (v1 decision 11). */
export const WET_STATE_FREEZE_FLIPS = 5;

/** Saturation-curve functions at the coil's barometric pressure (injected; see thermal.ts). */
export interface SaturationCurve {
  /** Enthalpy of saturated air at t, J/kg dry air. */
  enthalpy_J_kg(t_C: number): number;
  /** Temperature of saturated air with enthalpy h, °C; `near` (optional, may be NaN) is a starting guess. */
  temperatureFromEnthalpy_C(h_J_kg: number, near?: number): number;
  /** Saturation humidity ratio at t, kg/kg. */
  humidityRatio(t_C: number): number;
}

export interface SweepCircuit {
  /** Tube ids in water order; id = (row − 1)·tubesPerRow + (tube − 1). */
  tubes: number[];
  /** Whether the water enters the first tube at the connection end. Later passes alternate. */
  firstEntersAtConnection: boolean;
}

export interface SweepNetwork {
  rows: number;
  tubesPerRow: number;
  segments: number;
  tubeCount: number;
  circuits: Int32Array[];
  /** Per tube: 1 when the water runs from the connection end (segment 0) to the opposite end. */
  forward: Uint8Array;
  /** Per tube: upstream tubes (row before) and their mixing weights; empty for row 1. */
  upstreamStart: Int32Array;
  upstreamTube: Int32Array;
  upstreamWeight: Float64Array;
  /** Per tube: fraction of the coil's air flow crossing that tube. */
  airShare: Float64Array;
  /** Per tube: the circuit it belongs to. */
  circuitOfTube: Int32Array;
  /** Per tube: the tube before it in its circuit, −1 for the first. */
  previousTube: Int32Array;
}

/** Build the sweep network: water order per circuit and the air path between rows. */
export function buildSweepNetwork(
  rows: number,
  tubesPerRow: number,
  segments: number,
  circuits: SweepCircuit[],
  airMixing: 'strip' | 'staggered' = 'strip',
): SweepNetwork {
  const tubeCount = rows * tubesPerRow;
  const forward = new Uint8Array(tubeCount);
  const circuitOfTube = new Int32Array(tubeCount).fill(-1);
  const previousTube = new Int32Array(tubeCount).fill(-1);
  const circuitArrays = circuits.map((c, ci) => {
    c.tubes.forEach((t, k) => {
      if (k > 0) previousTube[t] = c.tubes[k - 1];
      if (t < 0 || t >= tubeCount || circuitOfTube[t] !== -1) throw new RangeError(`sweep network: tube id ${t} is outside the coil or used twice`);
      circuitOfTube[t] = ci;
      // Pass k enters at the connection end when k is even and the first pass does (passes alternate ends).
      forward[t] = (k % 2 === 0) === c.firstEntersAtConnection ? 1 : 0;
    });
    return Int32Array.from(c.tubes);
  });
  for (let t = 0; t < tubeCount; t++) if (circuitOfTube[t] === -1) throw new RangeError(`sweep network: tube id ${t} belongs to no circuit`);

  // Air bands: strip mode = one band per tube position; staggered = half-pitch bands, odd rows cover bands
  // 2k, 2k+1 (k from 0), even rows (shifted half a pitch down) cover 2k+1, 2k+2; the first tube of an even row
  // also takes band 0 and the last one only band 2N−1, so every band is crossed by exactly one tube per row.
  const bandsOf = (row: number, k: number): number[] => {
    if (airMixing === 'strip') return [k];
    if (row % 2 === 1) return [2 * k, 2 * k + 1];
    const bands: number[] = k === 0 ? [0] : [];
    bands.push(2 * k + 1);
    if (2 * k + 2 < 2 * tubesPerRow) bands.push(2 * k + 2);
    return bands;
  };
  const bandCount = airMixing === 'strip' ? tubesPerRow : 2 * tubesPerRow;
  const airShare = new Float64Array(tubeCount);
  const bandOwner: Int32Array[] = [];
  for (let r = 1; r <= rows; r++) {
    const owner = new Int32Array(bandCount).fill(-1);
    for (let k = 0; k < tubesPerRow; k++) {
      const t = (r - 1) * tubesPerRow + k;
      const bands = bandsOf(r, k);
      airShare[t] = bands.length / bandCount;
      for (const b of bands) owner[b] = t;
    }
    bandOwner.push(owner);
  }
  const upstreamStart = new Int32Array(tubeCount + 1);
  const upstreamTube: number[] = [];
  const upstreamWeight: number[] = [];
  for (let r = 1; r <= rows; r++) {
    for (let k = 0; k < tubesPerRow; k++) {
      const t = (r - 1) * tubesPerRow + k;
      upstreamStart[t] = upstreamTube.length;
      if (r === 1) continue;
      const bands = bandsOf(r, k);
      const weights = new Map<number, number>();
      for (const b of bands) {
        const u = bandOwner[r - 2][b];
        weights.set(u, (weights.get(u) ?? 0) + 1 / bands.length);
      }
      for (const [u, w] of weights) {
        upstreamTube.push(u);
        upstreamWeight.push(w);
      }
    }
  }
  upstreamStart[tubeCount] = upstreamTube.length;
  return {
    rows,
    tubesPerRow,
    segments,
    tubeCount,
    circuits: circuitArrays,
    forward,
    upstreamStart,
    upstreamTube: Int32Array.from(upstreamTube),
    upstreamWeight: Float64Array.from(upstreamWeight),
    airShare,
    circuitOfTube,
    previousTube,
  };
}

/** Inputs the outer loop sets before each call of runSweeps. Per-tube arrays are indexed by tube id. */
export interface SweepInputs {
  airInletDryBulb_C: number;
  airInletHumidityRatio: number;
  /** Dry-air mass flow of the whole coil, kg/s. */
  airMassFlowDry_kg_s: number;
  /** Air-side conductance of one segment with dry fins, η_o h_o A_o,s, W/K. */
  uaAirDry: Float64Array;
  /** Air-side conductance of one segment with wet fins, η_o,w h_o A_o,s, W/K (ignored when no curve). */
  uaAirWet: Float64Array;
  /** Water-side conductance of one segment (film, fouling and wall in series), W/K. */
  uaWater: Float64Array;
  /** Water specific heat in each tube, J/(kg K). */
  cpWater: Float64Array;
  /** Mass flow per circuit, kg/s. */
  circuitMassFlow: Float64Array;
  waterInlet_C: number;
  /** Dew point of the entering air, °C (lets dry segments skip the saturation look-up). */
  airInletDewPoint_C?: number;
  /** Saturation curve; without it every segment is dry. */
  saturation?: SaturationCurve;
}

export interface SweepState {
  /** Per segment (tube·n_s + j, j from the connection end): leaving air and heat to the air. */
  airOutT: Float64Array;
  airOutW: Float64Array;
  heatToAir: Float64Array;
  wet: Uint8Array;
  flips: Uint16Array;
  frozen: Uint8Array;
  /** Water temperature leaving each segment (used for the wet c_s estimate). */
  segmentWaterOut: Float64Array;
  /** Effective surface temperature of wet segments (a warm start for the saturation inverse). */
  surfaceT: Float64Array;
  tubeWaterIn: Float64Array;
  tubeWaterOut: Float64Array;
  circuitWaterOut: Float64Array;
  initialised: boolean;
}

export function createSweepState(network: SweepNetwork): SweepState {
  const n = network.tubeCount * network.segments;
  return {
    airOutT: new Float64Array(n),
    airOutW: new Float64Array(n),
    heatToAir: new Float64Array(n),
    wet: new Uint8Array(n),
    flips: new Uint16Array(n),
    frozen: new Uint8Array(n),
    segmentWaterOut: new Float64Array(n),
    surfaceT: new Float64Array(n).fill(NaN),
    tubeWaterIn: new Float64Array(network.tubeCount),
    tubeWaterOut: new Float64Array(network.tubeCount),
    circuitWaterOut: new Float64Array(network.circuits.length),
    initialised: false,
  };
}

export interface SweepOptions {
  tolerance_K?: number;
  maxSweeps?: number;
  /** Under-relaxation of the leaving-air temperatures (1 = none). */
  relaxation?: number;
}

export interface SweepOutcome {
  sweeps: number;
  converged: boolean;
  maxChange_K: number;
}

/** Moist-air enthalpy, J/kg dry air (ENGINEERING.md 3.3). */
export function moistAirEnthalpy_J_kg(t_C: number, w: number): number {
  return H_DRY * t_C + w * (H_FG0 + H_VAP * t_C);
}
/** Dry bulb from enthalpy and humidity ratio, °C (inverse of moistAirEnthalpy_J_kg). */
export function dryBulbFromEnthalpy_C(h: number, w: number): number {
  return (h - H_FG0 * w) / (H_DRY + H_VAP * w);
}

/**
 * Run sweeps until the largest change of any segment's leaving water or air temperature is below the
 * tolerance, or the sweep cap is reached. Warm-starts from the state of the previous call.
 */
export function runSweeps(network: SweepNetwork, inputs: SweepInputs, state: SweepState, options: SweepOptions = {}): SweepOutcome {
  const tolerance = options.tolerance_K ?? SWEEP_TOLERANCE_K;
  const maxSweeps = options.maxSweeps ?? SWEEP_MAX_SWEEPS;
  const relaxation = options.relaxation ?? 1;
  const ns = network.segments;
  const tIn = inputs.airInletDryBulb_C;
  const wIn = inputs.airInletHumidityRatio;
  const { airOutT, airOutW, heatToAir, wet, flips, frozen, segmentWaterOut, surfaceT, tubeWaterIn, tubeWaterOut, circuitWaterOut } = state;
  const { forward, upstreamStart, upstreamTube, upstreamWeight, airShare, circuits } = network;
  const { uaAirDry, uaAirWet, uaWater, cpWater, circuitMassFlow } = inputs;
  const curve = inputs.saturation;
  const airPerColumn = inputs.airMassFlowDry_kg_s / ns;
  // Dew point test is only needed when the surface can be colder than the entering dew point; the dew point
  // is approached from the saturation humidity ratio (W_in > W_s(T_s) <=> T_s below the dew point).
  const coolingPossible = curve !== undefined && inputs.waterInlet_C < tIn;

  if (!state.initialised) {
    airOutT.fill(tIn);
    airOutW.fill(wIn);
    segmentWaterOut.fill(inputs.waterInlet_C);
    surfaceT.fill(NaN);
    state.initialised = true;
  }

  const prevTube = network.previousTube;
  const dewPointIn = inputs.airInletDewPoint_C ?? Infinity;
  // The largest change of this sweep lives in a typed array: a number captured and rewritten by the closure
  // below would be boxed on every write.
  const sweepChange = new Float64Array(1);

  // One tube: march its segments in the water direction from water inlet temperature tw; returns the outlet.
  const processTube = (t: number, mw: number, twIn: number): number => {
    let tw = twIn;
    tubeWaterIn[t] = tw;
    const cw = mw * cpWater[t];
    const uaA = uaAirDry[t];
    const uaAW = uaAirWet[t];
    const uaW = uaWater[t];
    const uaDry = 1 / (1 / uaA + 1 / uaW);
    const ma = airPerColumn * airShare[t];
    // Per-tube constants of the wet segment: air-side decay e^(−NTU_o,s) and UA_a,s/c_pa.
    const wetDecay = Math.exp(-uaAW / (ma * CP_DRY_AIR_BKM));
    const uaAWOverCpa = uaAW / CP_DRY_AIR_BKM;
    const uStart = upstreamStart[t];
    const uEnd = upstreamStart[t + 1];
    const isForward = forward[t] === 1;
    for (let s = 0; s < ns; s++) {
      const j = isForward ? s : ns - 1 - s;
      const seg = t * ns + j;
      // Air entering this segment.
      let ta = tIn;
      let wa = wIn;
      if (uEnd - uStart === 1) {
        const up = upstreamTube[uStart] * ns + j;
        ta = airOutT[up];
        wa = airOutW[up];
      } else if (uEnd > uStart) {
        let h = 0;
        wa = 0;
        for (let u = uStart; u < uEnd; u++) {
          const up = upstreamTube[u] * ns + j;
          const wu = upstreamWeight[u];
          h += wu * moistAirEnthalpy_J_kg(airOutT[up], airOutW[up]);
          wa += wu * airOutW[up];
        }
        ta = dryBulbFromEnthalpy_C(h, wa);
      }
      // Local dry/wet test (v1 decision 11), unless this segment's state is frozen. The air only dries along
      // its path, so a surface at or above the entering dew point is dry without looking the curve up.
      let isWet = wet[seg] === 1;
      if (frozen[seg] === 0) {
        let nowWet = false;
        if (coolingPossible && tw < ta) {
          const ts = (uaA * ta + uaW * tw) / (uaA + uaW);
          nowWet = ts < dewPointIn && wa > curve!.humidityRatio(ts);
        }
        if (nowWet !== isWet) {
          flips[seg]++;
          if (flips[seg] >= WET_STATE_FREEZE_FLIPS) frozen[seg] = 1;
          wet[seg] = nowWet ? 1 : 0;
          isWet = nowWet;
        }
      }
      let twOut: number;
      let taOut: number;
      let waOut: number;
      let q: number;
      if (!isWet || curve === undefined) {
        const ca = ma * (H_DRY + H_VAP * wa);
        const pw = segmentEffectivenessWaterMixed(uaDry, ca, cw);
        q = pw * cw * (tw - ta);
        twOut = tw - q / cw;
        taOut = ta + q / ca;
        waOut = wa;
      } else {
        // BKM wet segment (ENGINEERING.md 3.11). c_s is the chord of h_s between the segment's water inlet and
        // its outlet from the previous sweep; at convergence that is the segment's own outlet.
        const hAin = moistAirEnthalpy_J_kg(ta, wa);
        const hsIn = curve.enthalpy_J_kg(tw);
        let twGuess = segmentWaterOut[seg];
        if (!(Math.abs(twGuess - tw) > 1e-6)) twGuess = tw + 0.05;
        const cs = (curve.enthalpy_J_kg(twGuess) - hsIn) / (twGuess - tw);
        const cwStar = cw / cs;
        const uaStar = uaAWOverCpa / (1 + (cs * uaAWOverCpa) / uaW);
        const pStar = segmentEffectivenessWaterMixed(uaStar, ma, cwStar);
        const qWet = pStar * cwStar * (hAin - hsIn);
        twOut = tw + qWet / cw;
        const hAout = hAin - qWet / ma;
        const decay = wetDecay;
        const hsEff = hAin - (hAin - hAout) / (1 - decay);
        const tsEff = curve.temperatureFromEnthalpy_C(hsEff, surfaceT[seg]);
        surfaceT[seg] = tsEff;
        taOut = tsEff + (ta - tsEff) * decay;
        waOut = (hAout - H_DRY * taOut) / (H_FG0 + H_VAP * taOut);
        q = -qWet;
      }
      if (relaxation !== 1) {
        taOut = airOutT[seg] + relaxation * (taOut - airOutT[seg]);
        waOut = airOutW[seg] + relaxation * (waOut - airOutW[seg]);
      }
      const change = Math.max(Math.abs(taOut - airOutT[seg]), Math.abs(twOut - segmentWaterOut[seg]));
      if (change > sweepChange[0]) sweepChange[0] = change;
      airOutT[seg] = taOut;
      airOutW[seg] = waOut;
      heatToAir[seg] = q;
      segmentWaterOut[seg] = twOut;
      tw = twOut;
    }
    tubeWaterOut[t] = tw;
    return tw;
  };

  // Sweeps alternate between water order (each circuit from supply to return: fresh water temperatures) and air
  // order (row by row from the air-entering row, water inlets from the latest upstream tube: fresh air states),
  // a symmetric Gauss–Seidel that settles counterflow circuits in far fewer sweeps than either order alone.
  const circuitOf = network.circuitOfTube;
  let sweeps = 0;
  let maxChange = Infinity;
  while (sweeps < maxSweeps && maxChange > tolerance) {
    sweeps++;
    sweepChange[0] = 0;
    if (sweeps % 2 === 1) {
      for (let c = 0; c < circuits.length; c++) {
        const tubes = circuits[c];
        const mw = circuitMassFlow[c];
        let tw = inputs.waterInlet_C;
        for (let p = 0; p < tubes.length; p++) tw = processTube(tubes[p], mw, tw);
        circuitWaterOut[c] = tw;
      }
    } else {
      for (let t = 0; t < network.tubeCount; t++) {
        const before = prevTube[t];
        processTube(t, circuitMassFlow[circuitOf[t]], before < 0 ? inputs.waterInlet_C : tubeWaterOut[before]);
      }
      for (let c = 0; c < circuits.length; c++) circuitWaterOut[c] = tubeWaterOut[circuits[c][circuits[c].length - 1]];
    }
    maxChange = sweepChange[0];
  }
  return { sweeps, converged: maxChange <= tolerance, maxChange_K: maxChange };
}

export interface LeavingAir {
  dryBulb_C: number;
  humidityRatio: number;
  enthalpy_J_kg: number;
}

/** Mass-weighted mix of the air leaving the last row (ENGINEERING.md 3.12 step 9). */
export function mixedLeavingAir(network: SweepNetwork, state: SweepState): LeavingAir {
  const ns = network.segments;
  let h = 0;
  let w = 0;
  const first = (network.rows - 1) * network.tubesPerRow;
  for (let t = first; t < network.tubeCount; t++) {
    const share = network.airShare[t] / ns;
    for (let j = 0; j < ns; j++) {
      const seg = t * ns + j;
      h += share * moistAirEnthalpy_J_kg(state.airOutT[seg], state.airOutW[seg]);
      w += share * state.airOutW[seg];
    }
  }
  return { dryBulb_C: dryBulbFromEnthalpy_C(h, w), humidityRatio: w, enthalpy_J_kg: h };
}
