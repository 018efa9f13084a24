/**
 * The bill of materials as labelled lines (label, number, unit) in the user's units, for the workspace table.
 * Pure, so it is tested without rendering.
 */
import type { BillOfMaterials } from '@/lib/engine/types';
import { formatQuantity, type QuantityKind, type UnitSystem } from '@/lib/units';

export interface BillOfMaterialsLine {
  label: string;
  value: string;
  unit: string;
}

function quantity(label: string, kind: QuantityKind, valueSI: number, system: UnitSystem): BillOfMaterialsLine {
  const f = formatQuantity(kind, valueSI, system);
  return { label, value: f.text, unit: f.unit };
}

const count = (label: string, n: number, unit = 'pcs'): BillOfMaterialsLine => ({ label, value: n.toLocaleString('en-US'), unit });

export function billOfMaterialsLines(bom: BillOfMaterials, system: UnitSystem): BillOfMaterialsLine[] {
  const lines: BillOfMaterialsLine[] = [count('Tubes', bom.tubes), quantity('Straight tube length, total', 'longLength', bom.straightTubeLength_m, system)];
  lines.push(count('Hairpins', bom.hairpinCount));
  for (const h of bom.hairpins) lines.push(count(`  hairpins, ${h.span}`, h.count));
  lines.push(count('Return bends', bom.returnBends), count('Crossovers', bom.crossovers), count('Header stubs', bom.headerStubs));
  lines.push(count('Braze joints', bom.brazeJoints, 'joints'));
  if (bom.finCount !== undefined) lines.push(count('Fins', bom.finCount));
  if (bom.finArea_m2 !== undefined) lines.push(quantity('Fin area (both faces)', 'area', bom.finArea_m2, system));
  if (bom.finMass_kg !== undefined) lines.push(quantity('Fin mass', 'mass', bom.finMass_kg, system));
  if (bom.copperMass_kg !== undefined) lines.push(quantity('Copper tube mass', 'mass', bom.copperMass_kg, system));
  lines.push(quantity('Internal water volume', 'volume', bom.internalVolume_m3, system));
  if (bom.operatingWaterMass_kg !== undefined) lines.push(quantity('Operating water mass', 'mass', bom.operatingWaterMass_kg, system));
  return lines;
}
