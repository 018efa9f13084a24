/**
 * A measurement the bench can call (npm run bench): the cost of one edit on a large tube sheet, from dispatch to a
 * new render model: the command with patches, the client trace (lib/engine/topology) and the drawing model. React
 * then re-renders only the memoised tubes whose look changed. Pure: no React, no DOM.
 */
import { serpentineCircuiting } from '@/lib/engine/generators';
import { startingPointGeometry } from '@/lib/engine/starting-points';
import { traceCircuits } from '@/lib/engine/topology';
import type { CoilDocument } from '@/lib/engine/types';
import { sheetAnalysis } from './analysis';
import { buildDrawing, buildSheetLayout } from './render-model';
import { createEditorStore } from './store';

export interface EditMeasurement {
  rows: number;
  tubesPerRow: number;
  edits: number;
  /** Median and worst time of one edit (dispatch + trace + render model), ms. */
  median_ms: number;
  max_ms: number;
}

/**
 * A rows x tubesPerRow chilled-water coil (1/2 in starting point) circuited serpentine with one feed per tube of a
 * row, for the benches (invented data; about 0.05 kg/s of water per circuit).
 */
export function benchDocument(rows: number, tubesPerRow: number, name = 'Bench sheet'): CoilDocument {
  const geometry = { ...startingPointGeometry('half-inch', { rows: Math.min(rows, 8), tubesPerRow }), rows };
  return {
    schemaVersion: 1,
    name,
    geometry,
    circuiting: serpentineCircuiting(geometry, tubesPerRow),
    conditions: {
      air: { faceVelocity_m_s: 2.5, inletDryBulb_C: 27, inletWetBulb_C: 19.5, altitude_m: 0 },
      fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 7, massFlow_kg_s: 0.05 * tubesPerRow },
      minimumFlowFraction: 0.3,
      minimumAirTemperature_C: null,
    },
  };
}

/** Times `edits` alternating erase/redraw edits on a rows x tubesPerRow sheet circuited full serpentine. */
export function measureEditRenderModel(rows = 12, tubesPerRow = 60, edits = 60): EditMeasurement {
  const doc = benchDocument(rows, tubesPerRow);
  const geometry = doc.geometry;
  const store = createEditorStore(doc);
  const layout = buildSheetLayout(geometry); // static layer: once per geometry
  const bend = doc.circuiting.bends[Math.floor(doc.circuiting.bends.length / 2)];
  const times: number[] = [];
  for (let i = 0; i < edits; i++) {
    const t0 = performance.now();
    const s = store.getState();
    if (i % 2 === 0) s.dispatch('removeBend', { end: bend.end, a: bend.a, b: bend.b });
    else s.dispatch('addBend', { end: bend.end, a: bend.a, b: bend.b });
    const next = store.getState().document;
    const topology = traceCircuits(next);
    buildDrawing(layout, next.circuiting, sheetAnalysis(topology, null), { face: 'opposite', selection: null });
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return { rows, tubesPerRow, edits, median_ms: times[Math.floor(times.length / 2)], max_ms: times[times.length - 1] };
}
