import { describe, expect, it } from 'vitest';
import { areNeighbours, bendRadius_m, deriveGeometry, internalVolume_m3, tubeCentre } from '@/lib/engine/geometry';
import type { Geometry } from '@/lib/engine/types';

/** |actual - expected| <= tol * |expected| */
const near = (actual: number, expected: number, tol: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tol * Math.abs(expected));

const sheet = (od: number, wall: number, pt: number, pl: number, rows: number, tubes: number, lf: number): Geometry => ({
  rows,
  tubesPerRow: tubes,
  layout: 'staggered',
  tubeOuterDiameter_m: od,
  tubeWall_m: wall,
  transversePitch_m: pt,
  rowPitch_m: pl,
  finnedLength_m: lf,
  fin: { type: 'plain', thickness_m: 0.00015, pitch_m: 0.00254, conductivity_W_mK: 200 },
  tubeConductivity_W_mK: 390,
});

// Reference coil of ENGINEERING.md 1.3: 1/2 in, 0.41 mm wall, 0.15 mm fins, 10 FPI, 31.75 x 27.5 mm, 24 high, 1.2192 m.
const reference = sheet(0.0127, 0.00041, 0.03175, 0.0275, 4, 24, 1.2192);

describe('deriveGeometry: reference coil (computed from the formulas in ENGINEERING.md section 1.3, values [C] there)', () => {
  const d = deriveGeometry(reference);
  it('diameters, fin count and face area', () => {
    near(d.insideDiameter_m, 0.01188, 1e-9);
    near(d.collarDiameter_m, 0.0130, 1e-9);
    near(d.finCount, 480, 1e-12);
    near(d.faceArea_m2, 0.929032, 5e-6); // exact H L_f = 0.9290304
    near(d.finHeight_m, 0.762, 1e-12);
    near(d.depth_m, 0.11, 1e-12);
    expect(d.tubeCount).toBe(96);
  });
  it('free-flow ratio and minimum free-flow area', () => {
    near(d.sigma, 0.55568, 1e-5);
    near(d.minFreeFlowArea_m2, 0.516241, 1e-5);
  });
  it('fin, primary and outside areas, fin fraction, hydraulic diameter, inside area', () => {
    near(d.finArea_m2, 68.2346, 1e-5);
    near(d.primaryArea_m2, 4.4978, 1e-4);
    near(d.outsideArea_m2, 72.7324, 1e-5);
    near(d.finAreaFraction, 0.93816, 1e-5);
    near(d.hydraulicDiameter_m, 0.0031230, 1e-4);
    near(d.insideArea_m2, 4.3683, 1e-4);
    near(d.outsideArea_m2 / d.insideArea_m2, 16.65, 5e-4);
  });
  it('per-tube areas and tube flow area add up', () => {
    near(d.outsideAreaPerTube_m2 * 96, d.outsideArea_m2, 1e-12);
    near(d.tubeFlowArea_m2, (Math.PI * 0.01188 ** 2) / 4, 1e-12);
    near(d.bareTubeArea_m2, Math.PI * 0.0127 * 1.2192 * 96, 1e-12);
  });
  it('2-row variant matches check E1 areas (ENGINEERING.md 4.7 E1, [C])', () => {
    const e = deriveGeometry({ ...reference, rows: 2 });
    near(e.outsideArea_m2, 36.3662, 2e-5);
    near(e.finArea_m2, 34.1173, 2e-5);
    near(e.insideArea_m2, 2.18415, 2e-5);
  });
});

describe('deriveGeometry: per-geometry table (ENGINEERING.md 1.3, [C]; fin height one pitch, one row)', () => {
  // od, wall, pt, pl | D_c mm, D_i mm, sigma, A_o/(A_fr row), A_f/A_o, D_h mm, A_o/A_i
  const rows: [string, number, number, number, number, number, number, number, number, number, number, number][] = [
    ['7 mm, 21 x 12.7', 0.007, 0.00028, 0.021, 0.0127, 7.30, 6.44, 0.6139, 9.46, 0.891, 3.297, 9.82],
    ['3/8 in, 25.4 x 22.0', 0.009525, 0.000356, 0.0254, 0.022, 9.83, 8.81, 0.5770, 16.12, 0.929, 3.151, 14.78],
    ['3/8 in, 25.4 x 19.05', 0.009525, 0.000356, 0.0254, 0.01905, 9.83, 8.81, 0.5770, 13.79, 0.917, 3.187, 12.65],
    ['1/2 in, 31.75 x 27.5', 0.0127, 0.000406, 0.03175, 0.0275, 13.00, 11.89, 0.5557, 19.57, 0.938, 3.123, 16.64],
    ['5/8 in, 38.1 x 33.0', 0.015875, 0.000508, 0.0381, 0.033, 16.18, 14.86, 0.5415, 22.99, 0.945, 3.109, 18.77],
  ];
  it.each(rows)('%s', (_n, od, wall, pt, pl, dc, di, sigma, aoPer, frac, dh, aoai) => {
    const d = deriveGeometry(sheet(od, wall, pt, pl, 1, 1, 1.0));
    near(d.collarDiameter_m * 1000, dc, 6e-4);
    near(d.insideDiameter_m * 1000, di, 6e-4);
    near(d.sigma, sigma, 2e-4);
    near(d.outsideArea_m2 / d.faceArea_m2, aoPer, 6e-4);
    near(d.finAreaFraction, frac, 6e-4);
    near(d.hydraulicDiameter_m * 1000, dh, 3e-4);
    near(d.outsideArea_m2 / d.insideArea_m2, aoai, 6e-4);
  });
});

describe('deriveGeometry: wavy fins', () => {
  it('multiplies the fin area by sec(theta) = sqrt(x_f^2 + p_d^2)/x_f and nothing else (ENGINEERING.md 1.3 item 6)', () => {
    const plain = deriveGeometry(reference);
    const wavy = deriveGeometry({ ...reference, fin: { ...reference.fin, type: 'wavy', waveDepth_m: 0.0015, waveHalfLength_m: 0.002 } });
    near(wavy.finAreaFactor, 1.25, 1e-12); // 3-4-5 triangle: sqrt(2^2 + 1.5^2)/2
    near(wavy.finArea_m2, plain.finArea_m2 * 1.25, 1e-12);
    near(wavy.primaryArea_m2, plain.primaryArea_m2, 1e-12);
    near(wavy.sigma, plain.sigma, 1e-12);
  });
  it('throws RangeError for pitches that leave no free area', () => {
    expect(() => deriveGeometry({ ...reference, transversePitch_m: 0.012 })).toThrow(RangeError);
  });
});

describe('tube centres and bends (ENGINEERING.md 1.3 item 12; ARCHITECTURE.md section 2)', () => {
  it('x along the air flow from row 1, y down from the top tube, even rows half a pitch lower', () => {
    expect(tubeCentre(reference, { row: 1, tube: 1 })).toEqual({ x_m: 0, y_m: 0 });
    const r2 = tubeCentre(reference, { row: 2, tube: 1 });
    near(r2.x_m, 0.0275, 1e-12);
    near(r2.y_m, 0.015875, 1e-12);
    const r3 = tubeCentre(reference, { row: 3, tube: 4 });
    near(r3.x_m, 0.055, 1e-12);
    near(r3.y_m, 3 * 0.03175, 1e-12);
  });
  it('bend radius: same-row neighbour P_t/2, next-row neighbour sqrt((P_t/2)^2 + P_l^2)/2', () => {
    near(bendRadius_m(reference, { row: 1, tube: 1 }, { row: 1, tube: 2 }), 0.015875, 1e-12);
    near(bendRadius_m(reference, { row: 1, tube: 1 }, { row: 2, tube: 1 }), Math.hypot(0.015875, 0.0275) / 2, 1e-12);
    // R_b/D_i ~ 1.34 for 1/2 in (ENGINEERING.md 1.3 item 12)
    near(bendRadius_m(reference, { row: 1, tube: 1 }, { row: 1, tube: 2 }) / 0.01188, 1.34, 5e-3);
  });
  it('neighbours: same row +-1, or the staggered neighbour in the next row', () => {
    expect(areNeighbours({ row: 1, tube: 3 }, { row: 1, tube: 4 })).toBe(true);
    expect(areNeighbours({ row: 1, tube: 3 }, { row: 1, tube: 5 })).toBe(false);
    expect(areNeighbours({ row: 1, tube: 3 }, { row: 2, tube: 3 })).toBe(true); // row 2 tube 3 sits below row 1 tube 3
    expect(areNeighbours({ row: 1, tube: 3 }, { row: 2, tube: 2 })).toBe(true);
    expect(areNeighbours({ row: 1, tube: 3 }, { row: 2, tube: 4 })).toBe(false);
    expect(areNeighbours({ row: 2, tube: 3 }, { row: 3, tube: 4 })).toBe(true);
    expect(areNeighbours({ row: 1, tube: 3 }, { row: 3, tube: 3 })).toBe(false);
  });
  it('internal volume: straight tubes, plus a half torus per bend when bends are given', () => {
    const straight = internalVolume_m3(reference);
    near(straight, ((Math.PI * 0.01188 ** 2) / 4) * 1.2192 * 96, 1e-12);
    const withBend = internalVolume_m3(reference, [{ end: 'opposite', a: { row: 1, tube: 1 }, b: { row: 1, tube: 2 } }]);
    near(withBend - straight, ((Math.PI * 0.01188 ** 2) / 4) * Math.PI * 0.015875, 1e-9);
  });
});
