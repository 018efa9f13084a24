/**
 * The solve result (ARCHITECTURE.md section 3) returned by POST /api/solve and `npm run solve`.
 * Thermal and hydraulic parts are omitted when the circuiting is invalid (valid: false).
 * All quantities SI; capacities are positive magnitudes.
 */
import { z } from 'zod';
import type * as Engine from '@/lib/engine/types';
import { tubeRefSchema, endFaceSchema } from './coil-document';

export const topologyErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  tubes: z.array(tubeRefSchema).optional(),
});
export type TopologyError = z.infer<typeof topologyErrorSchema>;

export const severitySchema = z.enum(['info', 'warning', 'critical']);
export type Severity = z.infer<typeof severitySchema>;

export const resultWarningSchema = z.object({
  code: z.string(),
  severity: severitySchema,
  message: z.string(),
  circuits: z.array(z.number().int()).optional(),
  tubes: z.array(tubeRefSchema).optional(),
});
export type ResultWarning = z.infer<typeof resultWarningSchema>;

export const arrangementSchema = z.enum(['counterflow', 'parallel', 'mixed', 'single-row']);
export type Arrangement = z.infer<typeof arrangementSchema>;
export const regimeSchema = z.enum(['laminar', 'transitional', 'turbulent']);
export type Regime = z.infer<typeof regimeSchema>;

export const circuitResultSchema = z.object({
  index: z.number().int(),
  tubes: z.array(tubeRefSchema),
  passes: z.number().int(),
  arrangement: arrangementSchema,
  counterflowIndex: z.number(),
  supply: z.object({ end: endFaceSchema, tube: tubeRefSchema }),
  return: z.object({ end: endFaceSchema, tube: tubeRefSchema }),
  connectionsSameEnd: z.boolean(),
  supplyAtBottom: z.boolean(),
  returnAtTop: z.boolean(),
  massFlow_kg_s: z.number().optional(),
  velocity_m_s: z.number().optional(),
  reynolds: z.number().optional(),
  reynoldsMin: z.number().optional(),
  regime: regimeSchema.optional(),
  pressureDrop_Pa: z.number().optional(),
  leavingTemperature_C: z.number().optional(),
  capacity_W: z.number().optional(),
  transitionalBelowFlowFraction: z.number().optional(),
  laminarBelowFlowFraction: z.number().optional(),
});
export type CircuitResult = z.infer<typeof circuitResultSchema>;

export const totalsSchema = z.object({
  mode: z.enum(['heating', 'cooling']).optional(),
  capacity_W: z.number().optional(),
  sensibleCapacity_W: z.number().optional(),
  latentCapacity_W: z.number().optional(),
  leavingAirDryBulb_C: z.number().optional(),
  leavingAirWetBulb_C: z.number().optional(),
  leavingAirHumidityRatio: z.number().optional(),
  leavingWaterTemperature_C: z.number().optional(),
  waterPressureDrop_Pa: z.number().optional(),
  airPressureDrop_Pa: z.number().optional(),
  airPressureDropIsWetEstimate: z.boolean().optional(),
  condensate_kg_s: z.number().optional(),
  faceVelocity_m_s: z.number().optional(),
  airMassFlow_kg_s: z.number().optional(),
  circuitCount: z.number().int(),
  maldistribution: z.number().optional(),
  energyBalanceError: z.number().optional(),
  iterations: z.number().int().optional(),
  converged: z.boolean().optional(),
});
export type Totals = z.infer<typeof totalsSchema>;

export const tubeResultSchema = z.object({
  row: z.number().int(),
  tube: z.number().int(),
  circuit: z.number().int(),
  waterIn_C: z.number().optional(),
  waterOut_C: z.number().optional(),
});
export type TubeResult = z.infer<typeof tubeResultSchema>;

export const turndownPointSchema = z.object({
  flowFraction: z.number(),
  capacity_W: z.number().optional(),
  minReynolds: z.number(),
  waterPressureDrop_Pa: z.number(),
});
export type TurndownPoint = z.infer<typeof turndownPointSchema>;

export const billOfMaterialsSchema = z.object({
  tubes: z.number().int(),
  straightTubeLength_m: z.number(),
  hairpins: z.array(z.object({ span: z.string(), count: z.number().int() })),
  hairpinCount: z.number().int(),
  returnBends: z.number().int(),
  crossovers: z.number().int(),
  headerStubs: z.number().int(),
  brazeJoints: z.number().int(),
  internalVolume_m3: z.number(),
  finCount: z.number().int().optional(),
  finArea_m2: z.number().optional(),
  finMass_kg: z.number().optional(),
  copperMass_kg: z.number().optional(),
  operatingWaterMass_kg: z.number().optional(),
});
export type BillOfMaterials = z.infer<typeof billOfMaterialsSchema>;

export const methodNoteSchema = z.object({ topic: z.string(), method: z.string(), source: z.string() });

export const solveResultSchema = z.object({
  valid: z.boolean(),
  errors: z.array(topologyErrorSchema),
  warnings: z.array(resultWarningSchema),
  circuits: z.array(circuitResultSchema),
  totals: totalsSchema,
  tubes: z.array(tubeResultSchema),
  turndown: z.array(turndownPointSchema).optional(),
  billOfMaterials: billOfMaterialsSchema.optional(),
  /** Methods and published sources used, and choices this implementation made that ENGINEERING.md leaves open. */
  methods: z.array(methodNoteSchema).optional(),
  solveTime_ms: z.number().optional(),
});
export type SolveResult = z.infer<typeof solveResultSchema>;

// Compile-time proof that the validator describes exactly the engine's result type (lib/engine/types.ts).
type MutuallyAssignable<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const resultTypesAgree: MutuallyAssignable<SolveResult, Engine.SolveResult> = true;
void resultTypesAgree;
