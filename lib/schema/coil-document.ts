/**
 * The coil document v1 (ARCHITECTURE.md section 2): one JSON document per coil design, SI units named in
 * each field. It is what a version stores, what /api/solve and `npm run solve` take, and what JSON
 * export/import carries. Limits are physical-sense bounds; every message says what is wrong and why.
 */
import { z } from 'zod';
import type * as Engine from '@/lib/engine/types';
import { freezingPoint_C } from '@/lib/engine/properties/fluid';

const bounded = (what: string, unit: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a number (${unit})` })
    .refine(Number.isFinite, `${what} must be a finite number`)
    .refine((v) => v >= min && v <= max, `${what} must be between ${min} and ${max} ${unit}`);

export const endFaceSchema = z.enum(['connection', 'opposite'], {
  error: 'end must be "connection" (header end) or "opposite" (hairpin end)',
});
export type EndFace = z.infer<typeof endFaceSchema>;

export const tubeRefSchema = z.object({
  row: z.number().int('row must be a whole number').min(1, 'row is counted from 1 (air-entering row)'),
  tube: z.number().int('tube must be a whole number').min(1, 'tube is counted from 1 (top tube)'),
});
export type TubeRef = z.infer<typeof tubeRefSchema>;

export const bendSchema = z.object({
  end: endFaceSchema,
  a: tubeRefSchema,
  b: tubeRefSchema,
  crossover: z.boolean().optional(),
});
export type Bend = z.infer<typeof bendSchema>;

export const stubSchema = z.object({ end: endFaceSchema, tube: tubeRefSchema });
export type Stub = z.infer<typeof stubSchema>;

export const finSchema = z.object({
  type: z.enum(['plain', 'wavy'], { error: 'fin type must be "plain" or "wavy"' }),
  thickness_m: bounded('fin thickness', 'm', 0.00005, 0.001),
  pitch_m: bounded('fin pitch', 'm', 0.001, 0.0127),
  conductivity_W_mK: bounded('fin conductivity', 'W/(m K)', 10, 430),
  /** Wavy fins only: corrugation depth peak to valley, m. */
  waveDepth_m: bounded('wave depth', 'm', 0.0002, 0.005).optional(),
  /** Wavy fins only: projected half wavelength, m. */
  waveHalfLength_m: bounded('wave half length', 'm', 0.001, 0.02).optional(),
});
export type Fin = z.infer<typeof finSchema>;

export const geometrySchema = z
  .object({
    rows: z.number().int('rows must be a whole number').min(1, 'at least 1 row').max(12, 'at most 12 rows'),
    tubesPerRow: z
      .number()
      .int('tubes per row must be a whole number')
      .min(1, 'at least 1 tube per row')
      .max(80, 'at most 80 tubes per row'),
    layout: z.literal('staggered', {
      error: 'only staggered tube layouts are supported in version 1 (the air-side correlations are for staggered banks)',
    }),
    tubeOuterDiameter_m: bounded('tube outside diameter', 'm', 0.005, 0.0254),
    tubeWall_m: bounded('tube wall', 'm', 0.0002, 0.002),
    transversePitch_m: bounded('transverse (tube) pitch', 'm', 0.01, 0.08),
    rowPitch_m: bounded('row pitch', 'm', 0.008, 0.08),
    finnedLength_m: bounded('finned length', 'm', 0.1, 5),
    fin: finSchema,
    tubeConductivity_W_mK: bounded('tube conductivity', 'W/(m K)', 10, 430),
    /** Water-side fouling resistance, m2 K/W (optional, default 0). */
    insideFouling_m2K_W: bounded('inside fouling resistance', 'm2 K/W', 0, 0.001).optional(),
    /** Tube inner-wall roughness, m (optional, default 1.5 um for drawn copper, ENGINEERING.md 3.4). */
    tubeRoughness_m: bounded('tube roughness', 'm', 0, 0.0001).optional(),
  })
  .superRefine((g, ctx) => {
    const collar = g.tubeOuterDiameter_m + 2 * g.fin.thickness_m;
    if (2 * g.tubeWall_m >= g.tubeOuterDiameter_m * 0.5) {
      ctx.addIssue({ code: 'custom', path: ['tubeWall_m'], message: 'tube wall is too thick for this diameter (inside diameter would be under half the outside diameter)' });
    }
    if (g.transversePitch_m <= collar) {
      ctx.addIssue({ code: 'custom', path: ['transversePitch_m'], message: `transverse pitch must be larger than the fin-collar diameter (${(collar * 1000).toFixed(2)} mm)` });
    }
    const diagonal = Math.hypot(g.transversePitch_m / 2, g.rowPitch_m);
    if (diagonal <= collar) {
      ctx.addIssue({ code: 'custom', path: ['rowPitch_m'], message: `row pitch too small: tubes of neighbouring rows would touch (diagonal pitch must exceed the collar diameter ${(collar * 1000).toFixed(2)} mm)` });
    }
    if (g.fin.pitch_m <= g.fin.thickness_m * 1.5) {
      ctx.addIssue({ code: 'custom', path: ['fin', 'pitch_m'], message: 'fin pitch must be clearly larger than the fin thickness' });
    }
    if (g.fin.type === 'wavy' && (g.fin.waveDepth_m === undefined || g.fin.waveHalfLength_m === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['fin', 'waveDepth_m'], message: 'wavy fins need waveDepth_m and waveHalfLength_m' });
    }
  });
export type Geometry = z.infer<typeof geometrySchema>;

export const circuitingSchema = z.object({
  bends: z.array(bendSchema).max(2000, 'too many bends'),
  supply: z.array(stubSchema).max(1000, 'too many supply stubs'),
  return: z.array(stubSchema).max(1000, 'too many return stubs'),
});
export type Circuiting = z.infer<typeof circuitingSchema>;

export const fluidKindSchema = z.enum(['water', 'ethylene-glycol', 'propylene-glycol'], {
  error: 'fluid kind must be "water", "ethylene-glycol" or "propylene-glycol"',
});
export type FluidKind = z.infer<typeof fluidKindSchema>;

/** Highest entering water temperature accepted, degC (pressurised hot water; the property range is wider). */
export const WATER_MAX_INLET_C = 120;
/** Lowest entering water temperature accepted, degC (plain water must stay clear of freezing). */
export const WATER_MIN_INLET_C = 1;
/** Highest entering glycol temperature, degC: the upper limit of the Melinder (2010) fits (ENGINEERING.md 3.2). */
export const GLYCOL_MAX_INLET_C = 100;

/** Freezing point of a glycol solution (Melinder 2010), or null when it cannot be evaluated for these inputs. */
function glycolFreezingPoint_C(kind: Engine.FluidKind, fraction: number): number | null {
  try {
    const t = freezingPoint_C({ kind, glycolMassFraction: fraction });
    return Number.isFinite(t) ? t : null;
  } catch {
    return null;
  }
}

export const fluidSchema = z
  .object({
    kind: fluidKindSchema,
    glycolMassFraction: bounded('glycol mass fraction', '(0 to 0.6)', 0, 0.6),
    inletTemperature_C: bounded('entering fluid temperature', '°C', -40, WATER_MAX_INLET_C),
    massFlow_kg_s: bounded('fluid mass flow', 'kg/s', 0.001, 100),
  })
  .superRefine((f, ctx) => {
    if (f.kind === 'water' && f.glycolMassFraction !== 0) {
      ctx.addIssue({ code: 'custom', path: ['glycolMassFraction'], message: 'plain water has a glycol mass fraction of 0' });
    }
    if (f.kind !== 'water' && f.glycolMassFraction < 0.05) {
      ctx.addIssue({ code: 'custom', path: ['glycolMassFraction'], message: 'glycol solutions need a mass fraction of at least 0.05 (use water below that)' });
    }
    if (f.kind === 'water' && f.inletTemperature_C < WATER_MIN_INLET_C) {
      ctx.addIssue({ code: 'custom', path: ['inletTemperature_C'], message: `plain water must enter at ${WATER_MIN_INLET_C} °C or warmer (use a glycol solution below that)` });
    }
    if (f.kind !== 'water') {
      const name = f.kind === 'ethylene-glycol' ? 'ethylene glycol' : 'propylene glycol';
      const percent = Math.round(f.glycolMassFraction * 1000) / 10;
      if (f.inletTemperature_C > GLYCOL_MAX_INLET_C) {
        ctx.addIssue({ code: 'custom', path: ['inletTemperature_C'], message: `glycol solutions must enter at ${GLYCOL_MAX_INLET_C} °C or cooler (the limit of the property data)` });
      }
      const freeze = glycolFreezingPoint_C(f.kind, f.glycolMassFraction);
      // Without a freezing point (fraction out of range, reported above) fall back to the -30 degC floor.
      const floor = freeze ?? -30;
      if (f.inletTemperature_C <= floor) {
        ctx.addIssue({
          code: 'custom',
          path: ['inletTemperature_C'],
          message: `${percent} % ${name} freezes at ${floor.toFixed(1)} °C; the entering temperature must be above that`,
        });
      }
    }
  });
export type Fluid = z.infer<typeof fluidSchema>;

export const airSchema = z
  .object({
    faceVelocity_m_s: bounded('face velocity', 'm/s', 0.2, 6),
    inletDryBulb_C: bounded('entering dry bulb', '°C', -40, 60),
    inletWetBulb_C: bounded('entering wet bulb', '°C', -40, 60).optional(),
    inletRelativeHumidity: bounded('entering relative humidity', '(0 to 1)', 0, 1).optional(),
    altitude_m: bounded('altitude', 'm', -500, 5000),
  })
  .superRefine((a, ctx) => {
    const hasWb = a.inletWetBulb_C !== undefined;
    const hasRh = a.inletRelativeHumidity !== undefined;
    if (hasWb === hasRh) {
      ctx.addIssue({ code: 'custom', path: ['inletWetBulb_C'], message: 'give exactly one of entering wet bulb or entering relative humidity' });
    }
    if (hasWb && a.inletWetBulb_C! > a.inletDryBulb_C) {
      ctx.addIssue({ code: 'custom', path: ['inletWetBulb_C'], message: 'wet bulb cannot be above the dry bulb' });
    }
  });
export type Air = z.infer<typeof airSchema>;

export const conditionsSchema = z.object({
  air: airSchema,
  fluid: fluidSchema,
  minimumFlowFraction: bounded('minimum flow fraction', '(0.05 to 1)', 0.05, 1),
  minimumAirTemperature_C: bounded('minimum entering air temperature', '°C', -50, 40).nullable(),
});
export type Conditions = z.infer<typeof conditionsSchema>;

/** Solver options; every field optional with the default named. */
export const solveOptionsSchema = z.object({
  /** Segments per tube in the tube-by-tube solver (ENGINEERING.md 3.12), default 6. */
  segmentsPerTube: z.number().int().min(1, 'at least 1 segment per tube').max(20, 'at most 20 segments per tube').optional(),
  /** Air path between rows: "strip" (default) or "staggered" mixing (ENGINEERING.md 3.12 step 2). */
  airMixing: z.enum(['strip', 'staggered']).optional(),
  /** Bend loss method: "rennels" (default, v1 decision 3) or "ito". */
  bendMethod: z.enum(['rennels', 'ito']).optional(),
  /** The team's water pressure-drop limit, Pa (default 45 kPa, critical). */
  pressureDropLimit_Pa: bounded('pressure drop limit', 'Pa', 1000, 300000).optional(),
});
export type SolveOptions = z.infer<typeof solveOptionsSchema>;

export const coilDocumentSchema = z
  .object({
    schemaVersion: z.literal(1, { error: 'schemaVersion must be 1' }),
    name: z.string().trim().min(1, 'name is required').max(120, 'name is at most 120 characters'),
    geometry: geometrySchema,
    circuiting: circuitingSchema,
    conditions: conditionsSchema,
    options: solveOptionsSchema.optional(),
  })
  .superRefine((d, ctx) => {
    const { rows, tubesPerRow } = d.geometry;
    const check = (t: TubeRef, path: (string | number)[]) => {
      if (t.row > rows) ctx.addIssue({ code: 'custom', path: [...path, 'row'], message: `row ${t.row} is outside the coil (it has ${rows} rows)` });
      if (t.tube > tubesPerRow) ctx.addIssue({ code: 'custom', path: [...path, 'tube'], message: `tube ${t.tube} is outside the coil (it has ${tubesPerRow} tubes per row)` });
    };
    d.circuiting.bends.forEach((b, i) => {
      check(b.a, ['circuiting', 'bends', i, 'a']);
      check(b.b, ['circuiting', 'bends', i, 'b']);
    });
    d.circuiting.supply.forEach((s, i) => check(s.tube, ['circuiting', 'supply', i, 'tube']));
    d.circuiting.return.forEach((s, i) => check(s.tube, ['circuiting', 'return', i, 'tube']));
  });
export type CoilDocument = z.infer<typeof coilDocumentSchema>;

// Compile-time proof that the validators describe exactly the engine's types (lib/engine/types.ts).
type MutuallyAssignable<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const documentTypesAgree: MutuallyAssignable<CoilDocument, Engine.CoilDocument> = true;
void documentTypesAgree;
