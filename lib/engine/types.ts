/**
 * The engine's input and output types: the coil document v1 and the solve result (ARCHITECTURE.md
 * sections 2 and 3). The engine sits below lib/schema, so it owns these plain types; lib/schema holds the zod
 * validators and asserts at compile time that they describe exactly these types.
 */

export type EndFace = 'connection' | 'opposite';
export interface TubeRef { row: number; tube: number }
export interface Bend { end: EndFace; a: TubeRef; b: TubeRef; crossover?: boolean }
export interface Stub { end: EndFace; tube: TubeRef }

export interface Fin {
  type: 'plain' | 'wavy';
  thickness_m: number;
  pitch_m: number;
  conductivity_W_mK: number;
  waveDepth_m?: number;
  waveHalfLength_m?: number;
}

export interface Geometry {
  rows: number;
  tubesPerRow: number;
  layout: 'staggered';
  tubeOuterDiameter_m: number;
  tubeWall_m: number;
  transversePitch_m: number;
  rowPitch_m: number;
  finnedLength_m: number;
  fin: Fin;
  tubeConductivity_W_mK: number;
  insideFouling_m2K_W?: number;
  tubeRoughness_m?: number;
}

export interface Circuiting { bends: Bend[]; supply: Stub[]; return: Stub[] }

export type FluidKind = 'water' | 'ethylene-glycol' | 'propylene-glycol';
export interface Fluid { kind: FluidKind; glycolMassFraction: number; inletTemperature_C: number; massFlow_kg_s: number }
export interface Air {
  faceVelocity_m_s: number;
  inletDryBulb_C: number;
  inletWetBulb_C?: number;
  inletRelativeHumidity?: number;
  altitude_m: number;
}
export interface Conditions {
  air: Air;
  fluid: Fluid;
  minimumFlowFraction: number;
  minimumAirTemperature_C: number | null;
}
export interface SolveOptions {
  segmentsPerTube?: number;
  airMixing?: 'strip' | 'staggered';
  bendMethod?: 'rennels' | 'ito';
  pressureDropLimit_Pa?: number;
}
export interface CoilDocument {
  schemaVersion: 1;
  name: string;
  geometry: Geometry;
  circuiting: Circuiting;
  conditions: Conditions;
  options?: SolveOptions;
}

// ---- result ----

export interface TopologyError { code: string; message: string; tubes?: TubeRef[] }
export type Severity = 'info' | 'warning' | 'critical';
export interface ResultWarning { code: string; severity: Severity; message: string; circuits?: number[]; tubes?: TubeRef[] }
export type Arrangement = 'counterflow' | 'parallel' | 'mixed' | 'single-row';
export type Regime = 'laminar' | 'transitional' | 'turbulent';

export interface CircuitResult {
  index: number;
  tubes: TubeRef[];
  passes: number;
  arrangement: Arrangement;
  counterflowIndex: number;
  supply: Stub;
  return: Stub;
  connectionsSameEnd: boolean;
  supplyAtBottom: boolean;
  returnAtTop: boolean;
  massFlow_kg_s?: number;
  velocity_m_s?: number;
  reynolds?: number;
  reynoldsMin?: number;
  regime?: Regime;
  pressureDrop_Pa?: number;
  leavingTemperature_C?: number;
  capacity_W?: number;
  /** Flow fraction of design below which this circuit's lowest Re falls under 4000 (1 when already below). */
  transitionalBelowFlowFraction?: number;
  /** Flow fraction of design below which this circuit's lowest Re falls under 2300 (1 when already below). */
  laminarBelowFlowFraction?: number;
}

export interface Totals {
  mode?: 'heating' | 'cooling';
  capacity_W?: number;
  sensibleCapacity_W?: number;
  latentCapacity_W?: number;
  leavingAirDryBulb_C?: number;
  leavingAirWetBulb_C?: number;
  leavingAirHumidityRatio?: number;
  leavingWaterTemperature_C?: number;
  waterPressureDrop_Pa?: number;
  airPressureDrop_Pa?: number;
  airPressureDropIsWetEstimate?: boolean;
  condensate_kg_s?: number;
  faceVelocity_m_s?: number;
  airMassFlow_kg_s?: number;
  circuitCount: number;
  maldistribution?: number;
  energyBalanceError?: number;
  iterations?: number;
  converged?: boolean;
}

export interface TubeResult { row: number; tube: number; circuit: number; waterIn_C?: number; waterOut_C?: number }
export interface TurndownPoint { flowFraction: number; capacity_W?: number; minReynolds: number; waterPressureDrop_Pa: number }

export interface BillOfMaterials {
  tubes: number;
  straightTubeLength_m: number;
  hairpins: { span: string; count: number }[];
  hairpinCount: number;
  returnBends: number;
  crossovers: number;
  headerStubs: number;
  brazeJoints: number;
  internalVolume_m3: number;
  finCount?: number;
  finArea_m2?: number;
  finMass_kg?: number;
  copperMass_kg?: number;
  operatingWaterMass_kg?: number;
}

export interface MethodNote { topic: string; method: string; source: string }

export interface SolveResult {
  valid: boolean;
  errors: TopologyError[];
  warnings: ResultWarning[];
  circuits: CircuitResult[];
  totals: Totals;
  tubes: TubeResult[];
  turndown?: TurndownPoint[];
  billOfMaterials?: BillOfMaterials;
  methods?: MethodNote[];
  solveTime_ms?: number;
}
