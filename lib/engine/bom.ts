/**
 * Bill of materials of a coil document (ENGINEERING.md section 5 item 13): tubes, hairpins by span, return bends,
 * crossovers, header stubs, braze joints, internal water volume, fins, copper and operating water mass.
 * Counts come from the drawing as it is (it need not be a valid circuiting); lengths from the geometry.
 */
import { bendRadius_m, deriveGeometry, halfPitchLevel, internalVolume_m3 } from '@/lib/engine/geometry';
import type { BillOfMaterials, CoilDocument, TubeRef } from '@/lib/engine/types';

/** Density of copper tube (C12200) and copper fins, kg/m3 [M: handbook value]. */
export const COPPER_DENSITY_kg_m3 = 8940;
/** Density of aluminium fin stock, kg/m3 [M: handbook value]. */
export const ALUMINIUM_DENSITY_kg_m3 = 2700;
/** Fins conducting better than this are taken as copper (Cu about 390, Al alloys 190-220 W/(m K), ENGINEERING.md 1.1). */
const COPPER_FIN_CONDUCTIVITY_W_mK = 300;

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * The span of a bend in trade words: "same row, 1 pitch", "next row" (the staggered neighbour), or for longer
 * spans the rows crossed and the vertical offset in transverse pitches ("next row, 1.5 pitches down").
 */
export function bendSpanLabel(a: TubeRef, b: TubeRef): string {
  const dRow = Math.abs(a.row - b.row);
  const dHalf = Math.abs(halfPitchLevel(a) - halfPitchLevel(b));
  const pitches = dHalf / 2;
  const offset = pitches === 1 ? '1 pitch' : `${pitches} pitches`;
  if (dRow === 0) return `same row, ${offset}`;
  if (dRow === 1 && dHalf === 1) return 'next row';
  const rows = dRow === 1 ? 'next row' : `${plural(dRow, 'row', 'rows')} over`;
  return dHalf === 0 ? rows : `${rows}, ${offset} offset`;
}

/**
 * Bill of materials. Counting rules: bends on the opposite end are formed hairpins (no joint at the bend), bends on
 * the connection end are brazed return bends, bends marked crossover are counted as crossovers on either end and
 * are brazed; braze joints = 2 per return bend or crossover + 1 per header stub at its tube. Straight tube length =
 * finned length per tube (v1 decision 2). Internal volume = straight tubes + bends as half tori (headers excluded).
 * Fin mass = fin count x full plate area H x D x sec(theta) x thickness x density (the collars are drawn from the
 * punched material, so no holes are subtracted). Copper mass = tube wall section x (straight length + bend
 * centre-line lengths) x 8940 kg/m3. Operating water mass = internal volume x fluid density (default 1000 kg/m3).
 */
export function billOfMaterials(doc: CoilDocument, fluidDensity_kg_m3 = 1000): BillOfMaterials {
  const g = doc.geometry;
  const d = deriveGeometry(g);
  const { bends, supply, return: ret } = doc.circuiting;

  const spans = new Map<string, number>();
  let hairpinCount = 0;
  let returnBends = 0;
  let crossovers = 0;
  let bendLength_m = 0;
  for (const b of bends) {
    bendLength_m += Math.PI * bendRadius_m(g, b.a, b.b);
    if (b.crossover) {
      crossovers++;
    } else if (b.end === 'opposite') {
      hairpinCount++;
      const span = bendSpanLabel(b.a, b.b);
      spans.set(span, (spans.get(span) ?? 0) + 1);
    } else {
      returnBends++;
    }
  }
  const hairpins = [...spans.entries()]
    .map(([span, count]) => ({ span, count }))
    .sort((x, y) => y.count - x.count || x.span.localeCompare(y.span));
  const headerStubs = supply.length + ret.length;

  const tubes = d.tubeCount;
  const straightTubeLength_m = tubes * g.finnedLength_m;
  const internalVolume = internalVolume_m3(g, bends);
  const finCount = Math.round(d.finCount);
  const finDensity = g.fin.conductivity_W_mK > COPPER_FIN_CONDUCTIVITY_W_mK ? COPPER_DENSITY_kg_m3 : ALUMINIUM_DENSITY_kg_m3;
  const finMass = finCount * d.finHeight_m * d.depth_m * d.finAreaFactor * g.fin.thickness_m * finDensity;
  const wallSection = (Math.PI / 4) * (g.tubeOuterDiameter_m ** 2 - d.insideDiameter_m ** 2);
  const copperMass = wallSection * (straightTubeLength_m + bendLength_m) * COPPER_DENSITY_kg_m3;

  return {
    tubes,
    straightTubeLength_m,
    hairpins,
    hairpinCount,
    returnBends,
    crossovers,
    headerStubs,
    brazeJoints: 2 * (returnBends + crossovers) + headerStubs,
    internalVolume_m3: internalVolume,
    finCount,
    finArea_m2: d.finArea_m2,
    finMass_kg: finMass,
    copperMass_kg: copperMass,
    operatingWaterMass_kg: internalVolume * fluidDensity_kg_m3,
  };
}
