/**
 * The render model of the tube sheet: pure functions from the geometry, the circuiting and the traced circuits to
 * what the SVG layers draw. Kept free of React so it can be measured (canvas/perf.ts) and tested. Sheet units are
 * millimetres; rows run left to right in the air direction (row 1 = air-entering row), tube 1 at the top.
 */
import type { Circuiting, EndFace, Geometry, TubeRef } from '@/lib/engine/types';
import { tubeCentre } from '@/lib/engine/geometry';
import { circuitColour, sheetColours } from './palette';
import { viridis } from './colormap';
import type { FaceShown, Selection } from './session';

export const tubeKey = (t: TubeRef): string => `r${t.row}-t${t.tube}`;

export interface TubeSpot { key: string; row: number; tube: number; x: number; y: number }

export interface SheetLayout {
  rows: number;
  tubesPerRow: number;
  /** Whole drawing, mm. */
  width: number;
  height: number;
  tubeRadius: number;
  rowPitch: number;
  transversePitch: number;
  originX: number;
  originY: number;
  finPack: { x: number; y: number; w: number; h: number };
  tubes: TubeSpot[];
}

const MM = 1000;

/** Positions of every tube on the end face, drawn to scale (ENGINEERING.md 1.3 item 12). */
export function buildSheetLayout(g: Geometry): SheetLayout {
  const pl = g.rowPitch_m * MM;
  const pt = g.transversePitch_m * MM;
  const marginX = Math.max(pl, 14);
  const marginTop = Math.max(pt * 1.6, 26); // room for the air-direction arrow
  const marginBottom = Math.max(pt * 0.6, 8);
  const tubes: TubeSpot[] = [];
  for (let row = 1; row <= g.rows; row++) {
    for (let tube = 1; tube <= g.tubesPerRow; tube++) {
      const c = tubeCentre(g, { row, tube });
      tubes.push({ key: tubeKey({ row, tube }), row, tube, x: marginX + c.x_m * MM, y: marginTop + c.y_m * MM });
    }
  }
  const packW = g.rows * pl;
  const packH = (g.tubesPerRow + (g.rows > 1 ? 0.5 : 0)) * pt;
  const finPack = { x: marginX - pl / 2, y: marginTop - pt / 2, w: packW, h: packH };
  return {
    rows: g.rows,
    tubesPerRow: g.tubesPerRow,
    width: finPack.w + 2 * (marginX - pl / 2),
    height: marginTop - pt / 2 + packH + marginBottom,
    tubeRadius: (g.tubeOuterDiameter_m * MM) / 2,
    rowPitch: pl,
    transversePitch: pt,
    originX: marginX,
    originY: marginTop,
    finPack,
    tubes,
  };
}

export function spotOf(layout: SheetLayout, t: TubeRef): TubeSpot | undefined {
  if (t.row < 1 || t.row > layout.rows || t.tube < 1 || t.tube > layout.tubesPerRow) return undefined;
  return layout.tubes[(t.row - 1) * layout.tubesPerRow + (t.tube - 1)];
}

/** The tube under a point of the sheet (mm), or null: constant time, from the grid. */
export function hitTube(layout: SheetLayout, x: number, y: number): TubeRef | null {
  const row = Math.round((x - layout.originX) / layout.rowPitch) + 1;
  if (row < 1 || row > layout.rows) return null;
  const offset = row % 2 === 0 ? layout.transversePitch / 2 : 0;
  const tube = Math.round((y - layout.originY - offset) / layout.transversePitch) + 1;
  if (tube < 1 || tube > layout.tubesPerRow) return null;
  const s = spotOf(layout, { row, tube })!;
  const reach = Math.min(layout.transversePitch, layout.rowPitch) * 0.55;
  return Math.hypot(s.x - x, s.y - y) <= reach ? { row, tube } : null;
}

// ---- circuits and overlays ----

/**
 * What the sheet needs to know about the circuits: each circuit's index (1-based, as the tracer and the solve
 * result number them) and its tubes in water order, and the tubes named by errors and warnings.
 */
export interface SheetAnalysis {
  circuits: { index: number; tubes: TubeRef[] }[];
  errorTubes: TubeRef[];
  warningTubes: TubeRef[];
}

export interface TubeTemperature { waterIn_C?: number; waterOut_C?: number }

export interface DrawingOptions {
  face: FaceShown;
  selection: Selection;
  /** Mean water temperature per tube key (°C); when given, tubes are coloured by it. */
  temperatures?: Map<string, TubeTemperature> | null;
}

export interface TubeLook {
  key: string;
  row: number;
  tube: number;
  x: number;
  y: number;
  fill: string;
  stroke: string;
  strokeWidth: number;
  dashed: boolean;
  /** Pass number in its circuit, shown when there is room. */
  label: string | null;
  labelColour: string;
  dim: boolean;
}

export interface BendMark {
  key: string;
  end: EndFace;
  a: TubeRef;
  b: TubeRef;
  d: string;
  colour: string;
  faint: boolean;
  invalid: boolean;
  /** Water-direction arrowhead at the middle of the bend. */
  arrow: string | null;
  /** Marked as a crossover: drawn dashed, bowed out, with a bridge mark at its apex. */
  crossover: boolean;
  bridge: string | null;
  selected: boolean;
}

export interface StubMark { key: string; kind: 'supply' | 'return'; end: EndFace; d: string; head: string; colour: string; faint: boolean; labelX: number; labelY: number }

export interface SheetDrawing {
  tubes: TubeLook[];
  bends: BendMark[];
  stubs: StubMark[];
  /** Circuit index (1-based) and pass (1-based) of each assigned tube. */
  place: Map<string, { circuit: number; pass: number }>;
  temperatureRange: { min: number; max: number } | null;
}

const LABEL_TUBE_LIMIT = 160;

function faceIsFaint(face: FaceShown, end: EndFace): boolean | null {
  if (face === 'both') return end === 'opposite';
  return face === end ? false : null; // null: not drawn
}

/** Everything the circuit and overlay layers draw, from one pass over the tubes and bends. */
export function buildDrawing(layout: SheetLayout, circuiting: Circuiting, analysis: SheetAnalysis, options: DrawingOptions): SheetDrawing {
  const place = new Map<string, { circuit: number; pass: number }>();
  for (const c of analysis.circuits) c.tubes.forEach((t, i) => place.set(tubeKey(t), { circuit: c.index, pass: i + 1 }));
  const colourOf = circuitColours(layout, circuiting, analysis);
  const errors = new Set(analysis.errorTubes.map(tubeKey));
  const warnings = new Set(analysis.warningTubes.map(tubeKey));
  const sel = options.selection;
  const selectedTube = sel?.kind === 'tube' ? tubeKey(sel.tube) : null;
  // Tapping a tube selects it and, when it is in a circuit, brings that circuit forward.
  const selectedCircuit = sel?.kind === 'circuit' ? sel.circuit : selectedTube ? (place.get(selectedTube)?.circuit ?? null) : null;
  const selectedBend = sel?.kind === 'bend' ? bendKey(sel.end, tubeKey(sel.a), tubeKey(sel.b)) : null;
  const bendEnds = sel?.kind === 'bend' ? new Set([tubeKey(sel.a), tubeKey(sel.b)]) : null;
  const highlighted = sel?.kind === 'issue' ? new Set(sel.tubes.map(tubeKey)) : null;
  const issueCircuits = sel?.kind === 'issue' ? new Set(sel.circuits) : null;
  const showAllLabels = layout.rows * layout.tubesPerRow <= LABEL_TUBE_LIMIT;

  let range: { min: number; max: number } | null = null;
  const mean = (t: TubeTemperature | undefined) =>
    t && t.waterIn_C !== undefined && t.waterOut_C !== undefined ? (t.waterIn_C + t.waterOut_C) / 2 : undefined;
  if (options.temperatures && options.temperatures.size > 0) {
    let min = Infinity;
    let max = -Infinity;
    for (const t of options.temperatures.values()) {
      const m = mean(t);
      if (m === undefined) continue;
      min = Math.min(min, m);
      max = Math.max(max, m);
    }
    if (Number.isFinite(min)) range = { min, max };
  }

  const r = layout.tubeRadius;
  const tubes: TubeLook[] = layout.tubes.map((s) => {
    const p = place.get(s.key);
    const isError = errors.has(s.key);
    const isWarning = warnings.has(s.key);
    const inFocus =
      (selectedCircuit === null || p?.circuit === selectedCircuit) &&
      (highlighted === null || highlighted.has(s.key) || (p !== undefined && issueCircuits!.has(p.circuit)));
    let fill: string = sheetColours.tubeEmpty;
    let labelColour = '#0E2A33';
    if (range && options.temperatures) {
      const m = mean(options.temperatures.get(s.key));
      if (m !== undefined) {
        const t = range.max > range.min ? (m - range.min) / (range.max - range.min) : 0.5;
        fill = viridis(t);
        labelColour = t < 0.55 ? '#FFFFFF' : '#0E2A33';
      }
    } else if (p) {
      fill = colourOf(p.circuit);
    }
    const showLabel = p !== undefined && (showAllLabels || selectedCircuit === p.circuit);
    return {
      key: s.key,
      row: s.row,
      tube: s.tube,
      x: s.x,
      y: s.y,
      fill,
      stroke: isError ? sheetColours.error : isWarning ? sheetColours.warning : p ? '#22313A' : sheetColours.unassigned,
      strokeWidth:
        isError || isWarning || (highlighted?.has(s.key) ?? false) || selectedTube === s.key || (bendEnds?.has(s.key) ?? false) ? r * 0.32 : r * 0.12,
      dashed: !p && !isError,
      label: showLabel ? String(p!.pass) : null,
      labelColour,
      dim: !inFocus,
    };
  });

  // Water direction of each bend: from the earlier tube of its circuit to the later one.
  const bends: BendMark[] = [];
  for (const b of circuiting.bends) {
    const faint = faceIsFaint(options.face, b.end);
    if (faint === null) continue;
    const pa = spotOf(layout, b.a);
    const pb = spotOf(layout, b.b);
    if (!pa || !pb) continue;
    const ka = place.get(pa.key);
    const kb = place.get(pb.key);
    const sameCircuit = ka !== undefined && kb !== undefined && ka.circuit === kb.circuit && Math.abs(ka.pass - kb.pass) === 1;
    const invalid = !sameCircuit && (errors.has(pa.key) || errors.has(pb.key));
    const [from, to] = sameCircuit && ka!.pass > kb!.pass ? [pb, pa] : [pa, pb];
    const crossover = b.crossover === true;
    const shape = bendShape(layout, from, to, crossover);
    const d = shape.d;
    const key = bendKey(b.end, pa.key, pb.key);
    bends.push({
      key,
      end: b.end,
      a: b.a,
      b: b.b,
      d,
      colour: invalid ? sheetColours.error : sameCircuit ? colourOf(ka!.circuit) : '#4A5A60',
      faint,
      invalid,
      arrow: sameCircuit ? shape.arrow : null,
      crossover,
      bridge: shape.bridge,
      selected: selectedBend !== null && (selectedBend === key || selectedBend === bendKey(b.end, pb.key, pa.key)),
    });
  }

  const stubs: StubMark[] = [];
  for (const kind of ['supply', 'return'] as const) {
    for (const s of circuiting[kind]) {
      const faint = faceIsFaint(options.face, s.end);
      if (faint === null) continue;
      const spot = spotOf(layout, s.tube);
      if (!spot) continue;
      const p = place.get(spot.key);
      stubs.push({ key: `${kind}:${s.end}:${spot.key}`, kind, end: s.end, ...stubPath(spot, kind, r), colour: p ? colourOf(p.circuit) : '#4A5A60', faint });
    }
  }

  return { tubes, bends, stubs, place, temperatureRange: range };
}

/**
 * Colour of each circuit, by the rank of its supply stub among all supply stubs (top of the sheet first, then row
 * order: the order the tracer numbers circuits in). On a complete drawing the rank is the circuit's number less
 * one; while one circuit is broken the others keep their colours instead of shifting up a number, which keeps the
 * sheet steady and spares re-drawing every tube after the break.
 */
function circuitColours(layout: SheetLayout, circuiting: Circuiting, analysis: SheetAnalysis): (circuit: number) => string {
  const ranked = circuiting.supply
    .map((s) => spotOf(layout, s.tube))
    .filter((s): s is TubeSpot => s !== undefined)
    .sort((u, v) => u.y - v.y || u.row - v.row);
  const rank = new Map<string, number>();
  ranked.forEach((s, i) => {
    if (!rank.has(s.key)) rank.set(s.key, i);
  });
  const slot = new Map<number, number>();
  for (const c of analysis.circuits) {
    const first = c.tubes[0];
    const r = first ? rank.get(tubeKey(first)) : undefined;
    slot.set(c.index, r ?? c.index - 1);
  }
  return (circuit) => circuitColour(slot.get(circuit) ?? circuit - 1);
}

interface BendShape { d: string; arrow: string; bridge: string | null }

/**
 * Path strings of a bend from one tube to another, kept per layout: they depend only on the two positions, and
 * formatting them anew for every bend on every edit was the largest cost of building the drawing.
 */
const shapeCache = new WeakMap<SheetLayout, Map<string, BendShape>>();

function bendShape(layout: SheetLayout, from: TubeSpot, to: TubeSpot, crossover: boolean): BendShape {
  let cache = shapeCache.get(layout);
  if (!cache) {
    cache = new Map();
    shapeCache.set(layout, cache);
  }
  const key = `${from.key}>${to.key}${crossover ? 'x' : ''}`;
  let shape = cache.get(key);
  if (!shape) {
    const r = layout.tubeRadius;
    shape = { d: bendPath(from, to, crossover, r), arrow: arrowHead(from, to, r, crossover), bridge: crossover ? bridgeMark(from, to, r) : null };
    cache.set(key, shape);
  }
  return shape;
}

const bendKey = (end: EndFace, a: string, b: string) => `${end}:${a}:${b}`;

type Pt = { x: number; y: number };

/** How far a crossover bows out from the straight line, as a multiple of the tube radius. */
const CROSSOVER_BOW = 2.2;

/** Control point of a crossover's curve and its apex (the curve's midpoint), on the left of p→q. */
function crossoverCurve(p: Pt, q: Pt, r: number) {
  const mx = (p.x + q.x) / 2;
  const my = (p.y + q.y) / 2;
  const len = Math.hypot(q.x - p.x, q.y - p.y) || 1;
  const nx = -(q.y - p.y) / len;
  const ny = (q.x - p.x) / len;
  const bow = r * CROSSOVER_BOW;
  return { cx: mx + nx * bow, cy: my + ny * bow, apexX: mx + (nx * bow) / 2, apexY: my + (ny * bow) / 2, ux: (q.x - p.x) / len, uy: (q.y - p.y) / len, nx, ny };
}

/** A bend seen end-on: a straight band between centres; crossovers bow out so they read as a second layer. */
function bendPath(p: Pt, q: Pt, crossover: boolean, r: number): string {
  const f = (n: number) => n.toFixed(2);
  if (!crossover) return `M${f(p.x)} ${f(p.y)}L${f(q.x)} ${f(q.y)}`;
  const c = crossoverCurve(p, q, r);
  return `M${f(p.x)} ${f(p.y)}Q${f(c.cx)} ${f(c.cy)} ${f(q.x)} ${f(q.y)}`;
}

/** The bridge mark of a crossover: a small hump over the curve's apex, the sign of one pipe passing over another. */
function bridgeMark(p: Pt, q: Pt, r: number): string {
  const f = (n: number) => n.toFixed(2);
  const c = crossoverCurve(p, q, r);
  const s = r * 0.9;
  const x0 = c.apexX - c.ux * s;
  const y0 = c.apexY - c.uy * s;
  const x1 = c.apexX + c.ux * s;
  const y1 = c.apexY + c.uy * s;
  // sweep chosen so the hump bulges outward, away from the straight line between the tubes
  return `M${f(x0)} ${f(y0)}A${f(s)} ${f(s)} 0 0 0 ${f(x1)} ${f(y1)}`;
}

/** The bend on a face nearest a point of the sheet (mm), within reach of its line or curve, or null. */
export function hitBend(layout: SheetLayout, circuiting: Circuiting, end: EndFace, x: number, y: number): { end: EndFace; a: TubeRef; b: TubeRef } | null {
  const reach = layout.tubeRadius * 0.9;
  let best: { end: EndFace; a: TubeRef; b: TubeRef } | null = null;
  let bestDist = reach;
  for (const b of circuiting.bends) {
    if (b.end !== end) continue;
    const p = spotOf(layout, b.a);
    const q = spotOf(layout, b.b);
    if (!p || !q) continue;
    // Sample the line or the crossover's curve; bends are short, 12 samples are plenty.
    const c = b.crossover ? crossoverCurve(p, q, layout.tubeRadius) : null;
    for (let i = 0; i <= 12; i++) {
      const t = i / 12;
      const px = c ? (1 - t) ** 2 * p.x + 2 * (1 - t) * t * c.cx + t * t * q.x : p.x + (q.x - p.x) * t;
      const py = c ? (1 - t) ** 2 * p.y + 2 * (1 - t) * t * c.cy + t * t * q.y : p.y + (q.y - p.y) * t;
      const d = Math.hypot(px - x, py - y);
      if (d < bestDist) {
        bestDist = d;
        best = { end: b.end, a: b.a, b: b.b };
      }
    }
  }
  return best;
}

function arrowHead(p: Pt, q: Pt, r: number, crossover: boolean): string {
  const c = crossover ? crossoverCurve(p, q, r) : null;
  const mx = c ? c.apexX : (p.x + q.x) / 2;
  const my = c ? c.apexY : (p.y + q.y) / 2;
  const len = Math.hypot(q.x - p.x, q.y - p.y) || 1;
  const ux = (q.x - p.x) / len;
  const uy = (q.y - p.y) / len;
  const s = r * 0.7;
  const tip = [mx + ux * s, my + uy * s];
  const left = [mx - ux * s * 0.6 - uy * s * 0.8, my - uy * s * 0.6 + ux * s * 0.8];
  const right = [mx - ux * s * 0.6 + uy * s * 0.8, my - uy * s * 0.6 - ux * s * 0.8];
  const f = (n: number) => n.toFixed(2);
  return `M${f(tip[0])} ${f(tip[1])}L${f(left[0])} ${f(left[1])}L${f(right[0])} ${f(right[1])}Z`;
}

/** A header stub: a short pipe up and to the right of the tube, arrowhead in (supply) or out (return). */
function stubPath(spot: TubeSpot, kind: 'supply' | 'return', r: number) {
  const f = (n: number) => n.toFixed(2);
  const ux = Math.SQRT1_2;
  const uy = -Math.SQRT1_2;
  const x0 = spot.x + ux * r * 0.9;
  const y0 = spot.y + uy * r * 0.9;
  const x1 = spot.x + ux * r * 2.1;
  const y1 = spot.y + uy * r * 2.1;
  const s = r * 0.55;
  // supply points toward the tube, return away from it
  const [tx, ty, bx, by] = kind === 'supply' ? [x0, y0, x0 + ux * s * 1.4, y0 + uy * s * 1.4] : [x1 + ux * s * 1.4, y1 + uy * s * 1.4, x1, y1];
  const dx = tx - bx;
  const dy = ty - by;
  const l = Math.hypot(dx, dy) || 1;
  const px = (-dy / l) * s * 0.8;
  const py = (dx / l) * s * 0.8;
  return {
    d: `M${f(x0)} ${f(y0)}L${f(x1)} ${f(y1)}`,
    head: `M${f(tx)} ${f(ty)}L${f(bx + px)} ${f(by + py)}L${f(bx - px)} ${f(by - py)}Z`,
    labelX: x1 + r * 0.5,
    labelY: y1 - r * 0.3,
  };
}
