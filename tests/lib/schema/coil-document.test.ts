import { describe, expect, it } from 'vitest';
import { coilDocumentSchema, fluidSchema, geometrySchema } from '@/lib/schema/coil-document';
import { startingPointDocument } from '@/lib/engine/starting-points';
import type { CoilDocument } from '@/lib/engine/types';

const base = startingPointDocument('half-inch', { rows: 4, tubesPerRow: 24 });
const messages = (doc: unknown) => {
  const r = coilDocumentSchema.safeParse(doc);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};
const withGeometry = (patch: Partial<CoilDocument['geometry']>): CoilDocument => ({ ...base, geometry: { ...base.geometry, ...patch } });
const withFluid = (patch: Partial<CoilDocument['conditions']['fluid']>): CoilDocument => ({
  ...base,
  conditions: { ...base.conditions, fluid: { ...base.conditions.fluid, ...patch } },
});

describe('coilDocumentSchema', () => {
  it('accepts the starting-point documents', () => {
    expect(messages(base)).toEqual([]);
    expect(messages(startingPointDocument('five-eighths-inch', { rows: 8, mode: 'heating' }))).toEqual([]);
  });

  it('rows 1-12 and tubes per row 1-80, whole numbers', () => {
    expect(messages(withGeometry({ rows: 13 }))).toContainEqual(expect.stringContaining('at most 12 rows'));
    expect(messages(withGeometry({ rows: 0 }))).toContainEqual(expect.stringContaining('at least 1 row'));
    expect(messages(withGeometry({ tubesPerRow: 81 }))).toContainEqual(expect.stringContaining('at most 80 tubes'));
    expect(messages(withGeometry({ tubesPerRow: 2.5 }))).toContainEqual(expect.stringContaining('whole number'));
  });

  it('pitches must clear the fin collar; fin pitch must exceed fin thickness', () => {
    // collar = 12.7 + 2 x 0.15 = 13.0 mm (ENGINEERING.md 1.1: D_c = D_o + 2 delta_f)
    expect(messages(withGeometry({ transversePitch_m: 0.0129 }))).toContainEqual(expect.stringContaining('13.00 mm'));
    expect(messages(withGeometry({ transversePitch_m: 0.014, rowPitch_m: 0.008 }))).toContainEqual(expect.stringContaining('row pitch too small'));
    const thickFin = { ...base.geometry.fin, thickness_m: 0.001, pitch_m: 0.0012 };
    expect(messages(withGeometry({ fin: thickFin }))).toContainEqual(expect.stringContaining('fin pitch must be clearly larger'));
  });

  it('wavy fins need their wave dimensions; only staggered layouts', () => {
    expect(geometrySchema.safeParse({ ...base.geometry, fin: { ...base.geometry.fin, type: 'wavy' } }).success).toBe(false);
    expect(messages({ ...base, geometry: { ...base.geometry, layout: 'inline' } })).toContainEqual(expect.stringContaining('staggered'));
  });

  it('tube references must lie inside the coil', () => {
    const doc = { ...base, circuiting: { ...base.circuiting, supply: [{ end: 'connection', tube: { row: 5, tube: 1 } }] } };
    expect(messages(doc)).toContainEqual(expect.stringContaining('row 5 is outside the coil (it has 4 rows)'));
  });

  it('glycol mass fraction 0-0.6; water has none; glycols at least 0.05', () => {
    expect(messages(withFluid({ kind: 'ethylene-glycol', glycolMassFraction: 0.7 }))).toContainEqual(expect.stringContaining('between 0 and 0.6'));
    expect(messages(withFluid({ glycolMassFraction: 0.2 }))).toContainEqual(expect.stringContaining('glycol mass fraction of 0'));
    expect(messages(withFluid({ kind: 'propylene-glycol', glycolMassFraction: 0.02 }))).toContainEqual(expect.stringContaining('at least 0.05'));
  });

  it('water enters between 1 and 120 degC', () => {
    expect(fluidSchema.safeParse({ ...base.conditions.fluid, inletTemperature_C: 1 }).success).toBe(true);
    expect(fluidSchema.safeParse({ ...base.conditions.fluid, inletTemperature_C: 120 }).success).toBe(true);
    expect(messages(withFluid({ inletTemperature_C: 0.5 }))).toContainEqual(expect.stringContaining('1 °C or warmer'));
    expect(messages(withFluid({ inletTemperature_C: 121 }))).toContainEqual(expect.stringContaining('between -40 and 120'));
  });

  it('glycol enters above its Melinder freezing point and at 100 degC or below (ENGINEERING.md 2.6: EG 30 % freezes at -14.6 degC [C])', () => {
    const eg30 = { kind: 'ethylene-glycol' as const, glycolMassFraction: 0.3 };
    expect(messages(withFluid({ ...eg30, inletTemperature_C: -14 }))).toEqual([]);
    expect(messages(withFluid({ ...eg30, inletTemperature_C: -15 }))).toContainEqual(expect.stringContaining('30 % ethylene glycol freezes at -14.6 °C'));
    expect(messages(withFluid({ ...eg30, inletTemperature_C: 101 }))).toContainEqual(expect.stringContaining('100 °C or cooler'));
    // PG 40 % freezes at -20.6 degC (ENGINEERING.md 2.6 [C])
    expect(messages(withFluid({ kind: 'propylene-glycol', glycolMassFraction: 0.4, inletTemperature_C: -21 }))).toContainEqual(expect.stringContaining('-20.6 °C'));
  });

  it('air needs exactly one of wet bulb or relative humidity, wet bulb not above dry bulb', () => {
    const air = base.conditions.air;
    const both = { ...base, conditions: { ...base.conditions, air: { ...air, inletRelativeHumidity: 0.5 } } };
    expect(messages(both)).toContainEqual(expect.stringContaining('exactly one'));
    const wet = { ...base, conditions: { ...base.conditions, air: { ...air, inletWetBulb_C: 30 } } };
    expect(messages(wet)).toContainEqual(expect.stringContaining('wet bulb cannot be above the dry bulb'));
  });
});
