import { describe, expect, it } from 'vitest';
import DxfParser from 'dxf-parser';
import { tubeCentre } from '@/lib/engine/geometry';
import { DXF_LAYERS, renderTubeSheetDxf } from '@/server/reports/dxf';
import { brokenCoil, defaultCoolingCoil, exampleFixtures, smallCoolingCoil } from './fixtures';

interface ParsedEntity { type: string; layer: string; center?: { x: number; y: number }; radius?: number; text?: string }

function parse(text: string) {
  const parsed = new DxfParser().parseSync(text);
  if (!parsed) throw new Error('dxf-parser returned nothing');
  return { entities: parsed.entities as unknown as ParsedEntity[], header: parsed.header as Record<string, unknown> };
}

const fixtures = [smallCoolingCoil(), defaultCoolingCoil(), brokenCoil(), ...exampleFixtures()];

describe('renderTubeSheetDxf', () => {
  for (const fx of fixtures) {
    it(`${fx.name}: one hole circle per tube at its centre, bends on the layer of their end face`, () => {
      const { entities, header } = parse(renderTubeSheetDxf(fx.doc, fx.result));
      const g = fx.doc.geometry;
      expect(header.$INSUNITS).toBe(4); // millimetres

      const holes = entities.filter((e) => e.type === 'CIRCLE' && e.layer === DXF_LAYERS.tubes);
      expect(holes.length).toBe(g.rows * g.tubesPerRow);
      const key = (x: number, y: number) => `${x.toFixed(3)},${y.toFixed(3)}`;
      const found = new Set(holes.map((h) => key(h.center!.x, h.center!.y)));
      for (let row = 1; row <= g.rows; row++) {
        for (let tube = 1; tube <= g.tubesPerRow; tube++) {
          const c = tubeCentre(g, { row, tube });
          expect(found.has(key(c.x_m * 1000, -c.y_m * 1000))).toBe(true);
        }
      }
      for (const h of holes) expect(h.radius).toBeCloseTo((g.tubeOuterDiameter_m * 1000) / 2, 6);

      for (const face of ['connection', 'opposite'] as const) {
        const onLayer = entities.filter((e) => e.layer === DXF_LAYERS.bends[face]);
        expect(onLayer.length).toBe(fx.doc.circuiting.bends.filter((b) => b.end === face).length);
        for (const e of onLayer) expect(['LINE', 'ARC']).toContain(e.type);
      }
    });
  }

  it('labels every row and every tube with TEXT entities', () => {
    const { doc, result } = smallCoolingCoil();
    const texts = parse(renderTubeSheetDxf(doc, result)).entities.filter((e) => e.type === 'TEXT' && e.layer === DXF_LAYERS.labels);
    const values = texts.map((t) => t.text);
    for (let row = 1; row <= doc.geometry.rows; row++) expect(values).toContain(`ROW ${row}`);
    expect(values.filter((v) => /^\d+$/.test(v ?? '')).length).toBe(doc.geometry.rows * doc.geometry.tubesPerRow);
  });

  it('marks each supply and return stub', () => {
    const { doc, result } = smallCoolingCoil();
    const stubs = parse(renderTubeSheetDxf(doc, result)).entities.filter((e) => e.layer === DXF_LAYERS.stubs && e.type === 'CIRCLE');
    expect(stubs.length).toBe(doc.circuiting.supply.length + doc.circuiting.return.length);
  });

  it('draws a crossover as an arc whose ends sit on the two tube centres', () => {
    const { doc, result } = smallCoolingCoil();
    const a = { row: 1, tube: 1 };
    const b = { row: 1, tube: 4 };
    const withCrossover = { ...doc, circuiting: { ...doc.circuiting, bends: [...doc.circuiting.bends, { end: 'opposite' as const, a, b, crossover: true }] } };
    const arcs = parse(renderTubeSheetDxf(withCrossover, result)).entities.filter((e) => e.type === 'ARC') as unknown as {
      center: { x: number; y: number }; radius: number; startAngle: number; endAngle: number;
    }[];
    expect(arcs.length).toBe(1);
    const arc = arcs[0];
    const ends = [arc.startAngle, arc.endAngle].map((t) => ({ x: arc.center.x + arc.radius * Math.cos(t), y: arc.center.y + arc.radius * Math.sin(t) }));
    const pa = tubeCentre(doc.geometry, a);
    const pb = tubeCentre(doc.geometry, b);
    const targets = [pb, pa].map((p) => ({ x: p.x_m * 1000, y: -p.y_m * 1000 }));
    ends.forEach((e, i) => {
      expect(e.x).toBeCloseTo(targets[i].x, 3);
      expect(e.y).toBeCloseTo(targets[i].y, 3);
    });
  });
});
