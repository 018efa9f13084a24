import { describe, expect, it } from 'vitest';
import { bendSpanLabel, billOfMaterials } from '@/lib/engine/bom';
import { serpentineCircuiting } from '@/lib/engine/generators';
import { bend, docWith, stub, t } from './doc-fixture';

// Geometry of docWith: the 1/2 in starting point (12.7 mm x 0.41 mm wall, 31.75 x 27.5 mm, 0.15 mm Al fins at
// 10 FPI, finned length 1.2192 m).
const Di = 0.0127 - 2 * 0.00041;
const Ax = (Math.PI * Di * Di) / 4;
const Lf = 1.2192;
const Rnext = Math.hypot(0.03175 / 2, 0.0275) / 2; // next-row bend radius, ENGINEERING.md 1.3 item 12
const Rsame = 0.03175 / 2;

describe('billOfMaterials: hand counts', () => {
  it('4 rows x 2 tubes, full serpentine (2 feeds x 4 passes)', () => {
    // Hand count: each circuit runs row 4 -> 3 -> 2 -> 1 in one tube position: bends at the opposite end (4-3),
    // the connection end (3-2) and the opposite end (2-1). Two circuits: 4 hairpins "next row", 2 return bends,
    // 0 crossovers, 2 supply + 2 return stubs. Braze joints: 2 x 2 return bends + 4 stubs = 8.
    const doc = docWith(4, 2, serpentineCircuiting({ rows: 4, tubesPerRow: 2 }, 2));
    const bom = billOfMaterials(doc);
    expect(bom.tubes).toBe(8);
    expect(bom.straightTubeLength_m).toBeCloseTo(8 * Lf, 12);
    expect(bom.hairpins).toEqual([{ span: 'next row', count: 4 }]);
    expect(bom.hairpinCount).toBe(4);
    expect(bom.returnBends).toBe(2);
    expect(bom.crossovers).toBe(0);
    expect(bom.headerStubs).toBe(4);
    expect(bom.brazeJoints).toBe(8);
    // Volume: 8 straight tubes + 6 half-torus bends of the next-row radius.
    const volume = Ax * (8 * Lf + 6 * Math.PI * Rnext);
    expect(bom.internalVolume_m3).toBeCloseTo(volume, 12);
    expect(bom.operatingWaterMass_kg).toBeCloseTo(volume * 1000, 9);
    // Fins: 1.2192 / 0.00254 = 480 plates of 2 x 31.75 mm high x 4 x 27.5 mm deep x 0.15 mm, aluminium 2700 kg/m3.
    expect(bom.finCount).toBe(480);
    expect(bom.finMass_kg).toBeCloseTo(480 * 0.0635 * 0.11 * 0.00015 * 2700, 9);
    // Copper: wall section x (straight + bend centre-line length) x 8940 kg/m3.
    const section = (Math.PI / 4) * (0.0127 ** 2 - Di ** 2);
    expect(bom.copperMass_kg).toBeCloseTo(section * (8 * Lf + 6 * Math.PI * Rnext) * 8940, 9);
  });

  it('1 row x 4 tubes with a crossover and a same-row hairpin, and copper fins', () => {
    // Hand count: bends 1-3 (crossover, opposite end) and 2-4 (opposite end, 2 pitches).
    // Hairpins: 1 ("same row, 2 pitches"); crossovers 1; return bends 0;
    // stubs 4; braze joints = 2 x 1 crossover + 4 stubs = 6.
    const doc = docWith(1, 4, {
      bends: [bend('opposite', t(1, 1), t(1, 3), true), bend('opposite', t(1, 2), t(1, 4))],
      supply: [stub('connection', t(1, 1)), stub('connection', t(1, 2))],
      return: [stub('connection', t(1, 3)), stub('connection', t(1, 4))],
    });
    const copperFins = { ...doc, geometry: { ...doc.geometry, fin: { ...doc.geometry.fin, conductivity_W_mK: 390 } } };
    const bom = billOfMaterials(copperFins, 1030);
    expect(bom.hairpins).toEqual([{ span: 'same row, 2 pitches', count: 1 }]);
    expect(bom.crossovers).toBe(1);
    expect(bom.returnBends).toBe(0);
    expect(bom.brazeJoints).toBe(6);
    expect(bom.finMass_kg).toBeCloseTo(480 * 0.127 * 0.0275 * 0.00015 * 8940, 9);
    const volume = Ax * (4 * Lf + 2 * Math.PI * 2 * Rsame);
    expect(bom.operatingWaterMass_kg).toBeCloseTo(volume * 1030, 9);
  });

  it('names spans in trade words', () => {
    expect(bendSpanLabel(t(1, 1), t(1, 2))).toBe('same row, 1 pitch');
    expect(bendSpanLabel(t(1, 2), t(2, 1))).toBe('next row');
    expect(bendSpanLabel(t(1, 1), t(2, 2))).toBe('next row, 1.5 pitches offset');
    expect(bendSpanLabel(t(1, 1), t(3, 1))).toBe('2 rows over');
  });
});
