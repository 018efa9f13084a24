import { describe, expect, it } from 'vitest';
import { deriveGeometry } from '@/lib/engine/geometry';
import { STARTING_POINTS, blankCoilDocument, startingPointDocument } from '@/lib/engine/starting-points';
import { traceCircuits } from '@/lib/engine/topology';
import { coilDocumentSchema } from '@/lib/schema/coil-document';

describe('starting points (typical values of ENGINEERING.md 1.1)', () => {
  it('1/2 in: 0.41 mm wall, 31.75 x 27.5 mm; 5/8 in: 0.51 mm wall, 38.1 x 33.0 mm; 0.15 mm Al fins at 10 FPI', () => {
    const half = STARTING_POINTS.find((p) => p.id === 'half-inch')!.sheet;
    expect(half).toMatchObject({ tubeOuterDiameter_m: 0.0127, tubeWall_m: 0.00041, transversePitch_m: 0.03175, rowPitch_m: 0.0275 });
    const fiveEighths = STARTING_POINTS.find((p) => p.id === 'five-eighths-inch')!.sheet;
    expect(fiveEighths).toMatchObject({ tubeOuterDiameter_m: 0.015875, tubeWall_m: 0.00051, transversePitch_m: 0.0381, rowPitch_m: 0.033 });
    for (const p of STARTING_POINTS) {
      expect(p.sheet.fin.thickness_m).toBe(0.00015);
      expect(p.sheet.fin.pitch_m).toBeCloseTo(0.00254, 12);
    }
  });

  for (const p of STARTING_POINTS) {
    for (let rows = 1; rows <= 8; rows++) {
      for (const mode of ['cooling', 'heating'] as const) {
        it(`${p.id}, ${rows} rows, ${mode}: schema-valid, full serpentine traces valid`, () => {
          const doc = startingPointDocument(p.id, { rows, mode });
          expect(coilDocumentSchema.safeParse(doc).success).toBe(true);
          const topo = traceCircuits(doc);
          expect(topo.errors).toEqual([]);
          expect(topo.circuits).toHaveLength(doc.geometry.tubesPerRow);
          expect(topo.circuits.every((c) => c.passes === rows)).toBe(true);
          expect(deriveGeometry(doc.geometry).sigma).toBeGreaterThan(0.5);
        });
      }
    }
  }

  it('default conditions: chilled water 7 degC with a wet bulb; hot water 80 degC', () => {
    const cool = startingPointDocument('half-inch', { mode: 'cooling' });
    expect(cool.conditions.fluid.inletTemperature_C).toBe(7);
    expect(cool.conditions.air.inletWetBulb_C).toBe(19.5);
    // 1.0 m/s in each of 24 circuits of 11.88 mm bore at 1000 kg/m3: 24 x 1000 x pi/4 x 0.01188^2 = 2.660 kg/s
    expect(cool.conditions.fluid.massFlow_kg_s).toBeCloseTo(2.66, 2);
    const heat = startingPointDocument('five-eighths-inch', { mode: 'heating', tubesPerRow: 10, finnedLength_m: 0.9 });
    expect(heat.conditions.fluid.inletTemperature_C).toBe(80);
    expect(heat.geometry).toMatchObject({ tubesPerRow: 10, finnedLength_m: 0.9, rows: 4 });
  });

  it('refuses rows outside 1-8 and unknown ids', () => {
    expect(() => startingPointDocument('half-inch', { rows: 9 })).toThrow(RangeError);
    expect(() => startingPointDocument('quarter-inch' as 'half-inch')).toThrow(RangeError);
  });

  it('blank document: schema-valid with nothing drawn', () => {
    const doc = blankCoilDocument();
    expect(coilDocumentSchema.safeParse(doc).success).toBe(true);
    expect(doc.circuiting).toEqual({ bends: [], supply: [], return: [] });
    expect(traceCircuits(doc).errors.map((e) => e.code)).toContain('no-circuits');
  });
});
