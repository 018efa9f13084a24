import { describe, expect, it } from 'vitest';
import type { CoilDocument, EndFace } from '@/lib/engine/types';
import { tubeCentre } from '@/lib/engine/geometry';
import { renderEndFaceSvg } from '@/server/reports/end-face-svg';
import { circuitStyle, CIRCUIT_HUES, UNASSIGNED_COLOUR } from '@/server/reports/palette';
import { brokenCoil, defaultCoolingCoil, exampleFixtures, smallCoolingCoil } from './fixtures';

const count = (svg: string, re: RegExp): number => (svg.match(re) ?? []).length;
const attr = (el: string, name: string): string | undefined => el.match(new RegExp(`\\s${name}="([^"]*)"`))?.[1];
const elements = (svg: string, tag: string, cls: string): string[] =>
  svg.match(new RegExp(`<${tag} class="${cls}[^"]*"[^>]*>`, 'g')) ?? [];
const bendsOn = (doc: CoilDocument, face: EndFace) => doc.circuiting.bends.filter((b) => b.end === face);

const fixtures = [smallCoolingCoil(), defaultCoolingCoil(), ...exampleFixtures()];

describe('renderEndFaceSvg', () => {
  for (const fx of fixtures) {
    for (const face of ['connection', 'opposite'] as const) {
      it(`${fx.name}, ${face} end: one circle per tube and one path per bend on that face`, () => {
        const svg = renderEndFaceSvg(fx.doc, fx.result, face);
        const g = fx.doc.geometry;
        expect(count(svg, /<circle class="tube"/g)).toBe(g.rows * g.tubesPerRow);
        expect(count(svg, /<path class="bend /g)).toBe(bendsOn(fx.doc, face).length);
        const stubs = [...fx.doc.circuiting.supply, ...fx.doc.circuiting.return].filter((s) => s.end === face);
        expect(count(svg, /<g class="stub (supply|return)"/g)).toBe(stubs.length);
        expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
        expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
      });
    }
  }

  it('puts each tube hole at its centre in millimetres, radius half the tube outer diameter', () => {
    const { doc, result } = smallCoolingCoil();
    const svg = renderEndFaceSvg(doc, result, 'connection');
    for (const ref of [{ row: 1, tube: 1 }, { row: 2, tube: 1 }, { row: 4, tube: 8 }]) {
      const el = svg.match(new RegExp(`<circle class="tube" id="tube-connection-r${ref.row}-t${ref.tube}"[^>]*>`))?.[0] ?? '';
      const c = tubeCentre(doc.geometry, ref);
      // Coordinates are written to 0.01 mm.
      expect(Math.abs(Number(attr(el, 'cx')) - c.x_m * 1000)).toBeLessThanOrEqual(0.0051);
      expect(Math.abs(Number(attr(el, 'cy')) - c.y_m * 1000)).toBeLessThanOrEqual(0.0051);
      expect(Number(attr(el, 'r'))).toBeCloseTo(6.35, 2); // 1/2 in tube: 12.7 mm / 2
    }
  });

  it('colours every bend with its circuit colour, and an arrow shows the water direction of each', () => {
    const { doc, result } = smallCoolingCoil();
    for (const face of ['connection', 'opposite'] as const) {
      const svg = renderEndFaceSvg(doc, result, face);
      const bends = elements(svg, 'path', 'bend');
      for (const el of bends) {
        const circuit = Number(attr(el, 'data-circuit'));
        const ordinal = result.circuits.findIndex((c) => c.index === circuit);
        expect(ordinal).toBeGreaterThanOrEqual(0);
        expect(attr(el, 'stroke')).toBe(circuitStyle(ordinal).colour);
      }
      expect(count(svg, /<path class="flow-arrow"/g)).toBe(bends.length);
    }
  });

  it('gives neighbouring circuits different colours and changes the line pattern after the six hues', () => {
    expect(new Set([0, 1, 2, 3, 4, 5].map((i) => circuitStyle(i).colour)).size).toBe(CIRCUIT_HUES.length);
    expect(circuitStyle(6).colour).toBe(circuitStyle(0).colour);
    expect(circuitStyle(6).dash).not.toEqual(circuitStyle(0).dash);
  });

  it('labels rows and tubes and shows the air direction', () => {
    const { doc, result } = smallCoolingCoil();
    const svg = renderEndFaceSvg(doc, result, 'opposite');
    expect(count(svg, /<text class="row-label"/g)).toBe(doc.geometry.rows);
    // Stub holes carry S or R instead of the tube number; the opposite face of an even-pass coil has none.
    expect(count(svg, /<text class="tube-label"/g)).toBe(doc.geometry.rows * doc.geometry.tubesPerRow);
    expect(svg).toContain('class="air-direction"');
  });

  it('draws the bends of an invalid circuiting that belong to no traced circuit in neutral ink, with no arrow', () => {
    const { doc, result } = brokenCoil();
    expect(result.valid).toBe(false);
    for (const face of ['connection', 'opposite'] as const) {
      const svg = renderEndFaceSvg(doc, result, face);
      const bends = elements(svg, 'path', 'bend');
      expect(bends.length).toBe(bendsOn(doc, face).length);
      const loose = bends.filter((el) => attr(el, 'data-circuit') === undefined);
      expect(loose.length).toBeGreaterThan(0);
      for (const el of loose) expect(attr(el, 'stroke')).toBe(UNASSIGNED_COLOUR);
      expect(count(svg, /<path class="flow-arrow"/g)).toBe(bends.length - loose.length);
    }
  });

  it('escapes the coil name', () => {
    const { doc, result } = smallCoolingCoil();
    const svg = renderEndFaceSvg({ ...doc, name: 'A <b> & "c"' }, result, 'connection');
    expect(svg).toContain('A &lt;b&gt; &amp; &quot;c&quot;');
  });
});
