/**
 * DXF drawing of the tube sheet for the shop's CAD: one CIRCLE per tube hole (tube outer diameter) at its centre,
 * the bends of each end face on their own layer (BENDS-CONNECTION, BENDS-OPPOSITE), supply and return stubs, and
 * TEXT labels of rows and tube numbers.
 *
 * Coordinates in millimetres (header $INSUNITS = 4), origin at the centre of row 1 tube 1, X along the air flow
 * (row 1 towards the last row), Y up, so tube centres lie at (x, -y) of tubeCentre() in lib/engine/geometry.
 * Both faces are drawn as seen from the connection end, on top of the same holes.
 */
import { DxfWriter, TextHorizontalAlignment, TextVerticalAlignment, Units, point3d } from '@tarikjabiri/dxf';
import type { Bend, CoilDocument, EndFace, SolveResult, TubeRef } from '@/lib/engine/types';
import { areNeighbours, tubeCentre } from '@/lib/engine/geometry';
import { allTubes, buildCircuitMap } from '@/server/reports/circuit-map';
import { UNASSIGNED_COLOUR, circuitStyle } from '@/server/reports/palette';

export const DXF_LAYERS = {
  sheet: 'SHEET',
  tubes: 'TUBES',
  bends: { connection: 'BENDS-CONNECTION', opposite: 'BENDS-OPPOSITE' } as Record<EndFace, string>,
  stubs: 'STUBS',
  labels: 'LABELS',
} as const;

// AutoCAD Color Index numbers for the layers (7 = white/black, 8 = grey, 5 = blue, 1 = red, 3 = green).
const LAYER_COLOURS = { sheet: 8, tubes: 7, connection: 5, opposite: 1, stubs: 3, labels: 8 };

/** DXF group 420 true colour: 0x00RRGGBB as a decimal integer. */
const trueColour = (hex: string): string => String(parseInt(hex.replace('#', ''), 16));

/** Tube centre in drawing millimetres (Y up). */
export function dxfTubeCentre(doc: CoilDocument, ref: TubeRef): { x: number; y: number } {
  const c = tubeCentre(doc.geometry, ref);
  return { x: c.x_m * 1000, y: -c.y_m * 1000 };
}

export function renderTubeSheetDxf(doc: CoilDocument, result: SolveResult): string {
  const g = doc.geometry;
  const dxf = new DxfWriter();
  dxf.setUnits(Units.Millimeters);
  dxf.addLayer(DXF_LAYERS.sheet, LAYER_COLOURS.sheet);
  dxf.addLayer(DXF_LAYERS.tubes, LAYER_COLOURS.tubes);
  dxf.addLayer(DXF_LAYERS.bends.connection, LAYER_COLOURS.connection);
  dxf.addLayer(DXF_LAYERS.bends.opposite, LAYER_COLOURS.opposite);
  dxf.addLayer(DXF_LAYERS.stubs, LAYER_COLOURS.stubs);
  dxf.addLayer(DXF_LAYERS.labels, LAYER_COLOURS.labels);

  const Pt = g.transversePitch_m * 1000;
  const Pl = g.rowPitch_m * 1000;
  const radius = (g.tubeOuterDiameter_m * 1000) / 2;
  const textHeight = Math.min(Pt, Pl) * 0.18;
  const map = buildCircuitMap(result);

  // Sheet outline: fin height N_T P_t by depth N_R P_l around the staggered tube field.
  dxf.addRectangle(
    { x: -Pl / 2, y: Pt / 4 },
    { x: (g.rows - 0.5) * Pl, y: -(g.tubesPerRow - 0.25) * Pt },
    { layerName: DXF_LAYERS.sheet },
  );

  for (const ref of allTubes(doc)) {
    const c = dxfTubeCentre(doc, ref);
    dxf.addCircle(point3d(c.x, c.y), radius, { layerName: DXF_LAYERS.tubes });
    dxf.addText(point3d(c.x + radius * 1.15, c.y + radius * 0.6), textHeight, String(ref.tube), {
      layerName: DXF_LAYERS.labels,
    });
  }

  for (let row = 1; row <= g.rows; row++) {
    const x = dxfTubeCentre(doc, { row, tube: 1 }).x;
    const at = point3d(x, Pt / 4 + textHeight * 1.5);
    dxf.addText(at, textHeight * 1.4, `ROW ${row}`, {
      layerName: DXF_LAYERS.labels,
      horizontalAlignment: TextHorizontalAlignment.Center,
      verticalAlignment: TextVerticalAlignment.BaseLine,
      secondAlignmentPoint: at,
    });
  }

  for (const bend of doc.circuiting.bends) addBend(bend);

  const stubs = [
    ...doc.circuiting.supply.map((s) => ({ s, label: 'S' })),
    ...doc.circuiting.return.map((s) => ({ s, label: 'R' })),
  ];
  for (const { s, label } of stubs) {
    const c = dxfTubeCentre(doc, s.tube);
    const face = s.end === 'connection' ? 'C' : 'O';
    dxf.addCircle(point3d(c.x, c.y), radius * 0.55, { layerName: DXF_LAYERS.stubs });
    dxf.addText(point3d(c.x - radius * 0.4, c.y - radius * 0.3), textHeight * 0.9, `${label}${face}`, {
      layerName: DXF_LAYERS.stubs,
    });
  }

  return dxf.stringify();

  function addBend(bend: Bend): void {
    const a = dxfTubeCentre(doc, bend.a);
    const b = dxfTubeCentre(doc, bend.b);
    const order = map.waterOrder(bend);
    const colour = order ? circuitStyle(order.ordinal).colour : UNASSIGNED_COLOUR;
    const options = { layerName: DXF_LAYERS.bends[bend.end], trueColor: trueColour(colour) };
    if (areNeighbours(bend.a, bend.b) && !bend.crossover) {
      dxf.addLine(point3d(a.x, a.y), point3d(b.x, b.y), options);
      return;
    }
    // Crossovers bow sideways as a circular arc whose sagitta is a quarter of the chord.
    const chord = Math.hypot(b.x - a.x, b.y - a.y);
    const sagitta = chord / 4;
    const r = sagitta / 2 + (chord * chord) / (8 * sagitta);
    const mx = (a.x + b.x) / 2;
    const my = (a.y + b.y) / 2;
    const ux = (b.x - a.x) / chord;
    const uy = (b.y - a.y) / chord;
    // Centre on the right of a->b, so the counter-clockwise arc from a to b bows to the left.
    const d = r - sagitta;
    const cx = mx + uy * d;
    const cy = my - ux * d;
    const angle = (p: { x: number; y: number }) => (Math.atan2(p.y - cy, p.x - cx) * 180) / Math.PI;
    dxf.addArc(point3d(cx, cy), r, angle(b), angle(a), options);
  }
}
