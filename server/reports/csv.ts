/**
 * CSV exports of a solved coil: one row per circuit, one row per tube, and the bill of materials. Values are in the
 * reader's unit system (lib/units) with the unit in the column name; numbers carry six significant digits, with no
 * thousands separators, so spreadsheets read them as numbers. Empty cells mean "not computed".
 */
import type { CoilDocument, SolveResult } from '@/lib/engine/types';
import { tubeCentre } from '@/lib/engine/geometry';
import { toDisplay, unitLabel, type QuantityKind, type UnitSystem } from '@/lib/units';
import { allTubes, buildCircuitMap } from '@/server/reports/circuit-map';
import { csvDocument, type CsvCell } from '@/server/reports/csv-encode';

const SIGNIFICANT_DIGITS = 6;

/** A converted number rounded to six significant digits; undefined stays empty. */
function value(kind: QuantityKind, valueSI: number | undefined, units: UnitSystem): number | undefined {
  if (valueSI === undefined || !Number.isFinite(valueSI)) return undefined;
  return round(toDisplay(kind, valueSI, units));
}

function round(v: number | undefined): number | undefined {
  if (v === undefined || !Number.isFinite(v)) return undefined;
  const r = Number(v.toPrecision(SIGNIFICANT_DIGITS));
  return Object.is(r, -0) ? 0 : r;
}

/** Column name with its unit, e.g. "pressure drop (kPa)". */
const named = (name: string, kind: QuantityKind, units: UnitSystem): string => `${name} (${unitLabel(kind, units)})`;

export function circuitsCsv(_doc: CoilDocument, result: SolveResult, units: UnitSystem): string {
  const header = [
    'circuit',
    'passes',
    'supply end',
    'supply row',
    'supply tube',
    'return end',
    'return row',
    'return tube',
    'arrangement',
    'counterflow index',
    named('water mass flow', 'massFlow', units),
    named('velocity', 'velocity', units),
    'reynolds number (mean)',
    'reynolds number (min)',
    'regime',
    named('pressure drop', 'waterPressureDrop', units),
    named('leaving water temperature', 'temperature', units),
    named('capacity', 'power', units),
  ];
  const rows: CsvCell[][] = result.circuits.map((c) => [
    c.index,
    c.passes,
    c.supply.end,
    c.supply.tube.row,
    c.supply.tube.tube,
    c.return.end,
    c.return.tube.row,
    c.return.tube.tube,
    c.arrangement,
    round(c.counterflowIndex),
    value('massFlow', c.massFlow_kg_s, units),
    value('velocity', c.velocity_m_s, units),
    round(c.reynolds),
    round(c.reynoldsMin),
    c.regime,
    value('waterPressureDrop', c.pressureDrop_Pa, units),
    value('temperature', c.leavingTemperature_C, units),
    value('power', c.capacity_W, units),
  ]);
  return csvDocument(header, rows);
}

/**
 * Every tube of the sheet, row by row from tube 1 at the top: its circuit and position along it (1 = first tube
 * after the supply), its centre on the end face (from row 1 tube 1, x along the air, y down) and the water
 * temperatures when solved. Tubes in no circuit have empty circuit cells.
 */
export function tubesCsv(doc: CoilDocument, result: SolveResult, units: UnitSystem): string {
  const map = buildCircuitMap(result);
  const temps = new Map(result.tubes.map((t) => [`${t.row}:${t.tube}`, t]));
  const header = [
    'row',
    'tube',
    'circuit',
    'position in circuit',
    named('centre x', 'smallLength', units),
    named('centre y', 'smallLength', units),
    named('water in', 'temperature', units),
    named('water out', 'temperature', units),
  ];
  const rows: CsvCell[][] = allTubes(doc).map((ref) => {
    const place = map.placeOf(ref);
    const c = tubeCentre(doc.geometry, ref);
    const t = temps.get(`${ref.row}:${ref.tube}`);
    return [
      ref.row,
      ref.tube,
      place?.circuitIndex,
      place === undefined ? undefined : place.step + 1,
      value('smallLength', c.x_m, units),
      value('smallLength', c.y_m, units),
      value('temperature', t?.waterIn_C, units),
      value('temperature', t?.waterOut_C, units),
    ];
  });
  return csvDocument(header, rows);
}

/** The bill of materials as item, quantity, unit (one unit per row, since the items differ). Empty when absent. */
export function billOfMaterialsCsv(_doc: CoilDocument, result: SolveResult, units: UnitSystem): string {
  const header = ['item', 'quantity', 'unit'];
  const b = result.billOfMaterials;
  if (!b) return csvDocument(header, []);
  const count = (item: string, n: number | undefined): CsvCell[] => [item, n, 'pcs'];
  const measured = (item: string, kind: QuantityKind, si: number | undefined): CsvCell[] => [item, value(kind, si, units), unitLabel(kind, units)];
  const rows: CsvCell[][] = [
    count('tubes', b.tubes),
    measured('straight tube length, total', 'longLength', b.straightTubeLength_m),
    count('hairpins', b.hairpinCount),
    ...b.hairpins.map((h) => count(`hairpins, ${h.span}`, h.count)),
    count('return bends', b.returnBends),
    count('crossovers', b.crossovers),
    count('header stubs', b.headerStubs),
    count('braze joints', b.brazeJoints),
    measured('internal volume', 'volume', b.internalVolume_m3),
  ];
  if (b.finCount !== undefined) rows.push(count('fins', b.finCount));
  if (b.finArea_m2 !== undefined) rows.push(measured('fin area', 'area', b.finArea_m2));
  if (b.finMass_kg !== undefined) rows.push(measured('fin mass', 'mass', b.finMass_kg));
  if (b.copperMass_kg !== undefined) rows.push(measured('copper mass', 'mass', b.copperMass_kg));
  if (b.operatingWaterMass_kg !== undefined) rows.push(measured('water in the coil', 'mass', b.operatingWaterMass_kg));
  return csvDocument(header, rows);
}
