/**
 * Design warnings of a solved coil (ENGINEERING.md 2.4–2.6, section 5 and the v1 decisions). Each function takes
 * what the solver computed and returns the warnings it implies; the texts say what is wrong, by how much, and what
 * a designer usually does about it.
 */
import type { Regime, ResultWarning } from '@/lib/engine/types';

/** Coil water pressure drop above which a critical warning is raised by default, Pa (2.5: typical cap 45 kPa). */
export const DEFAULT_PRESSURE_DROP_LIMIT_PA = 45_000;
/** Minimum velocity in circuits with a downward leg to sweep air out, m/s (2.4 [CP]). */
export const AIR_SWEEP_MIN_VELOCITY_M_S = 0.6;
/** Lower end of the rated water-velocity range, m/s (2.5 [M: AHRI 410 range]). */
export const MIN_WATER_VELOCITY_M_S = 0.3;
/** Face velocity above which condensate carry-over is likely on a wet coil, m/s (2.5). */
export const WET_FACE_VELOCITY_LIMIT_M_S = 2.5;
/** Glycol freezing point must lie at least this far below the lowest entering-air temperature, K (2.6). */
export const FREEZE_MARGIN_K = 3;
/** Relative energy-balance error above which the result is flagged (3.12 step 9). */
export const ENERGY_BALANCE_LIMIT = 1e-4;
/** Entering-air temperature below which laminar flow is a freeze risk, °C (2.6 [CP]). */
export const LAMINAR_FREEZE_AIR_C = 2;

/**
 * Copper erosion–corrosion velocity limit for a water temperature, m/s (2.5 [S: failure-analysis article]):
 * cold water 2.4, hot water up to 60 °C 1.5, above 60 °C 0.9. "Cold" is taken as up to 30 °C (our choice:
 * ENGINEERING.md gives no bound).
 */
export function erosionVelocityLimit_m_s(maxWaterTemperature_C: number): number {
  if (maxWaterTemperature_C <= 30) return 2.4;
  if (maxWaterTemperature_C <= 60) return 1.5;
  return 0.9;
}

export interface CircuitFlowFacts {
  index: number;
  velocity_m_s: number;
  velocityMax_m_s: number;
  reynoldsMin: number;
  regime: Regime;
  /** Highest water temperature in the circuit, °C. */
  maxTemperature_C: number;
  /** The circuit has a leg where the water runs downward. */
  runsDownward: boolean;
}

const list = (circuits: number[]) => (circuits.length > 8 ? `${circuits.slice(0, 8).join(', ')} and ${circuits.length - 8} more` : circuits.join(', '));

/** Laminar (critical) and transitional (warning) circuits at design flow or at the minimum flow fraction. */
export function regimeWarnings(design: CircuitFlowFacts[], atMinimumFlow: CircuitFlowFacts[] | null, minimumFlowFraction: number): ResultWarning[] {
  const out: ResultWarning[] = [];
  const laminar = design.filter((c) => c.regime === 'laminar').map((c) => c.index);
  const transitional = design.filter((c) => c.regime === 'transitional').map((c) => c.index);
  if (laminar.length > 0) {
    out.push({
      code: 'laminar-at-design',
      severity: 'critical',
      message: `circuit${laminar.length > 1 ? 's' : ''} ${list(laminar)} run laminar at design flow (lowest Re under 2300): the water-side coefficient falls several-fold and capacity stops following flow. Use fewer, longer circuits or more flow.`,
      circuits: laminar,
    });
  }
  if (transitional.length > 0) {
    out.push({
      code: 'transitional-at-design',
      severity: 'warning',
      message: `circuit${transitional.length > 1 ? 's' : ''} ${list(transitional)} run in the transitional band at design flow (lowest Re 2300–4000): heat transfer is uncertain there. Aim for Re of at least 4000.`,
      circuits: transitional,
    });
  }
  if (atMinimumFlow && minimumFlowFraction < 1) {
    const pct = Math.round(minimumFlowFraction * 100);
    const lamMin = atMinimumFlow.filter((c) => c.regime === 'laminar' && !laminar.includes(c.index)).map((c) => c.index);
    const transMin = atMinimumFlow
      .filter((c) => c.regime === 'transitional' && !laminar.includes(c.index) && !transitional.includes(c.index))
      .map((c) => c.index);
    if (lamMin.length > 0) {
      out.push({
        code: 'laminar-at-minimum-flow',
        severity: 'critical',
        message: `at the minimum flow (${pct} % of design) circuit${lamMin.length > 1 ? 's' : ''} ${list(lamMin)} go laminar (Re under 2300).`,
        circuits: lamMin,
      });
    }
    if (transMin.length > 0) {
      out.push({
        code: 'transitional-at-minimum-flow',
        severity: 'warning',
        message: `at the minimum flow (${pct} % of design) circuit${transMin.length > 1 ? 's' : ''} ${list(transMin)} are in the transitional band (Re 2300–4000).`,
        circuits: transMin,
      });
    }
  }
  return out;
}

/** Velocity too low to sweep air (downward legs) or below the rated range, and above the erosion limit. */
export function velocityWarnings(design: CircuitFlowFacts[]): ResultWarning[] {
  const out: ResultWarning[] = [];
  const slowDown = design.filter((c) => c.runsDownward && c.velocity_m_s < AIR_SWEEP_MIN_VELOCITY_M_S).map((c) => c.index);
  const slow = design.filter((c) => !c.runsDownward && c.velocity_m_s < MIN_WATER_VELOCITY_M_S).map((c) => c.index);
  if (slowDown.length > 0) {
    out.push({
      code: 'velocity-air-sweep',
      severity: 'warning',
      message: `circuit${slowDown.length > 1 ? 's' : ''} ${list(slowDown)} run downward somewhere at under ${AIR_SWEEP_MIN_VELOCITY_M_S} m/s: air pockets may not be swept out.`,
      circuits: slowDown,
    });
  }
  if (slow.length > 0) {
    out.push({
      code: 'velocity-low',
      severity: 'warning',
      message: `circuit${slow.length > 1 ? 's' : ''} ${list(slow)} run under ${MIN_WATER_VELOCITY_M_S} m/s, below the usual rated range (0.3–2.4 m/s).`,
      circuits: slow,
    });
  }
  const fast = design.filter((c) => c.velocityMax_m_s > erosionVelocityLimit_m_s(c.maxTemperature_C));
  if (fast.length > 0) {
    const worst = fast.reduce((a, b) => (b.velocityMax_m_s > a.velocityMax_m_s ? b : a));
    out.push({
      code: 'velocity-erosion',
      severity: 'warning',
      message: `circuit${fast.length > 1 ? 's' : ''} ${list(fast.map((c) => c.index))} exceed the copper erosion limit for their water temperature (up to ${worst.velocityMax_m_s.toFixed(2)} m/s against ${erosionVelocityLimit_m_s(worst.maxTemperature_C)} m/s at ${worst.maxTemperature_C.toFixed(0)} °C). Use more circuits or a heavier wall.`,
      circuits: fast.map((c) => c.index),
    });
  }
  return out;
}

/** Coil water pressure drop above the team's limit (critical). */
export function pressureDropWarnings(pressureDrop_Pa: number, limit_Pa = DEFAULT_PRESSURE_DROP_LIMIT_PA): ResultWarning[] {
  if (!(pressureDrop_Pa > limit_Pa)) return [];
  return [
    {
      code: 'pressure-drop-high',
      severity: 'critical',
      message: `water pressure drop ${(pressureDrop_Pa / 1000).toFixed(1)} kPa is above the limit of ${(limit_Pa / 1000).toFixed(1)} kPa. Use more circuits (fewer passes each).`,
    },
  ];
}

export interface FreezeFacts {
  fluidKind: 'water' | 'ethylene-glycol' | 'propylene-glycol';
  freezingPoint_C: number;
  minimumAirTemperature_C: number | null;
  /** Circuits laminar at the minimum flow fraction. */
  laminarAtMinimumFlow: number[];
}

/** Freeze protection (ENGINEERING.md 2.6). */
export function freezeWarnings(f: FreezeFacts): ResultWarning[] {
  const out: ResultWarning[] = [];
  const tMin = f.minimumAirTemperature_C;
  if (tMin === null) return out;
  if (f.fluidKind === 'water') {
    if (tMin < 0) {
      out.push({
        code: 'freeze-plain-water',
        severity: 'critical',
        message: `plain water with entering air down to ${tMin} °C: the coil can freeze. Use glycol, guarantee a minimum flow with a low-limit control, or build it drainable.`,
      });
    }
  } else if (f.freezingPoint_C > tMin - FREEZE_MARGIN_K) {
    out.push({
      code: 'freeze-glycol-weak',
      severity: 'critical',
      message: `the glycol freezes at ${f.freezingPoint_C.toFixed(1)} °C, less than ${FREEZE_MARGIN_K} K below the lowest entering air (${tMin} °C). Raise the concentration.`,
    });
  }
  if (tMin < LAMINAR_FREEZE_AIR_C && f.laminarAtMinimumFlow.length > 0) {
    out.push({
      code: 'freeze-laminar',
      severity: 'critical',
      message: `circuit${f.laminarAtMinimumFlow.length > 1 ? 's' : ''} ${list(f.laminarAtMinimumFlow)} run laminar at minimum flow while the entering air can be ${tMin} °C: tube walls approach air temperature and freezing becomes likely.`,
      circuits: f.laminarAtMinimumFlow,
    });
  }
  return out;
}

/** Face velocity over 2.5 m/s on a coil that condenses (ENGINEERING.md 2.5). */
export function wetFaceVelocityWarnings(faceVelocity_m_s: number, condensate_kg_s: number): ResultWarning[] {
  if (!(condensate_kg_s > 0 && faceVelocity_m_s > WET_FACE_VELOCITY_LIMIT_M_S)) return [];
  return [
    {
      code: 'face-velocity-wet',
      severity: 'warning',
      message: `face velocity ${faceVelocity_m_s.toFixed(2)} m/s on a condensing coil is above ${WET_FACE_VELOCITY_LIMIT_M_S} m/s: condensate may be carried off the fins. Enlarge the face area.`,
    },
  ];
}

/** Energy balance worse than 1e-4 between the air and water sides. */
export function energyBalanceWarnings(relativeError: number): ResultWarning[] {
  if (!(relativeError > ENERGY_BALANCE_LIMIT)) return [];
  return [
    {
      code: 'energy-balance',
      severity: 'warning',
      message: `air-side and water-side heat differ by ${(relativeError * 100).toPrecision(2)} %, more than ${ENERGY_BALANCE_LIMIT * 100} %: treat the result with care.`,
    },
  ];
}

/** Laminar circuits at part load: state the capacity at the minimum flow fraction. */
export function partLoadWarnings(laminarAtMinimum: number[], minimumFlowFraction: number, capacityAtMinimum_W: number | undefined, designCapacity_W: number | undefined): ResultWarning[] {
  if (laminarAtMinimum.length === 0 || capacityAtMinimum_W === undefined || !designCapacity_W) return [];
  return [
    {
      code: 'part-load-laminar-capacity',
      severity: 'warning',
      message: `at ${Math.round(minimumFlowFraction * 100)} % flow, where circuit${laminarAtMinimum.length > 1 ? 's' : ''} ${list(laminarAtMinimum)} run laminar, the coil gives ${(capacityAtMinimum_W / 1000).toFixed(1)} kW (${Math.round((capacityAtMinimum_W / designCapacity_W) * 100)} % of design).`,
      circuits: laminarAtMinimum,
    },
  ];
}

export interface TemperatureFacts {
  mode: 'heating' | 'cooling';
  leavingAirDryBulb_C: number;
  leavingWaterTemperature_C: number;
}

/**
 * Leaving temperatures that cannot happen: a heating coil cannot heat air above the entering water, a cooling coil
 * cannot cool it below the entering water, and the mixed leaving water cannot pass the entering air. Seeing this
 * means a solver defect; the result is flagged rather than hidden.
 */
export function solverDefectWarnings(t: TemperatureFacts, waterIn_C: number, airIn_C: number): ResultWarning[] {
  const slack = 1e-6;
  const bad =
    t.mode === 'heating'
      ? t.leavingAirDryBulb_C > waterIn_C + slack || t.leavingWaterTemperature_C < airIn_C - slack
      : t.leavingAirDryBulb_C < waterIn_C - slack || t.leavingWaterTemperature_C > airIn_C + slack;
  if (!bad) return [];
  return [
    {
      code: 'solver-defect-temperature-cross',
      severity: 'critical',
      message: `impossible leaving temperatures (air ${t.leavingAirDryBulb_C.toFixed(2)} °C, water ${t.leavingWaterTemperature_C.toFixed(2)} °C with water entering at ${waterIn_C} °C and air at ${airIn_C} °C): this is a solver defect, do not use this result`,
    },
  ];
}
