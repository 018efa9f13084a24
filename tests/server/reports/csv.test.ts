import { describe, expect, it } from 'vitest';
import { tubeCentre } from '@/lib/engine/geometry';
import { toDisplay } from '@/lib/units';
import { billOfMaterialsCsv, circuitsCsv, tubesCsv } from '@/server/reports/csv';
import { csvDocument, csvField, userText } from '@/server/reports/csv-encode';
import { brokenCoil, smallCoolingCoil } from './fixtures';

/** A strict RFC 4180 reader (section 2), written here independently of the encoder under test. */
function parseCsv(text: string): string[][] {
  expect(text.endsWith('\r\n')).toBe(true);
  const records: string[][] = [];
  let field = '';
  let record: string[] = [];
  let i = 0;
  let quoted = false;
  while (i < text.length) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') { field += '"'; i += 2; continue; }
      if (ch === '"') { quoted = false; i++; continue; }
      field += ch; i++; continue;
    }
    if (ch === '"' && field === '') { quoted = true; i++; continue; }
    if (ch === ',') { record.push(field); field = ''; i++; continue; }
    if (ch === '\r' && text[i + 1] === '\n') { record.push(field); records.push(record); record = []; field = ''; i += 2; continue; }
    if (ch === '\n' || ch === '\r' || ch === '"') throw new Error(`bare ${JSON.stringify(ch)} at ${i}`);
    field += ch; i++;
  }
  return records;
}

const round6 = (v: number) => Number(v.toPrecision(6));

describe('csv encoding (RFC 4180 section 2)', () => {
  it('quotes fields holding a comma, a double quote or a line break, doubling inner quotes', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField(undefined)).toBe('');
    expect(csvField(Number.NaN)).toBe('');
    expect(csvField(-1.5)).toBe('-1.5');
  });

  it('round-trips awkward text through a strict reader, CRLF after every record', () => {
    const text = csvDocument(['name', 'note'], [['AHU-1, "east"', 'line one\r\nline two'], ['x', 3]]);
    expect(parseCsv(text)).toEqual([['name', 'note'], ['AHU-1, "east"', 'line one\r\nline two'], ['x', '3']]);
  });

  it('refuses a row whose length differs from the header', () => {
    expect(() => csvDocument(['a', 'b'], [[1]])).toThrow(RangeError);
  });

  it('guards user text that a spreadsheet would run as a formula (OWASP CSV injection advice)', () => {
    expect(userText('=SUM(A1)')).toBe("'=SUM(A1)");
    expect(userText('AHU-1')).toBe('AHU-1');
  });
});

describe('circuitsCsv', () => {
  const { doc, result } = smallCoolingCoil();

  it('has one row per circuit and the units in the column names (SI)', () => {
    const rows = parseCsv(circuitsCsv(doc, result, 'si'));
    const [header, ...body] = rows;
    expect(body.length).toBe(result.circuits.length);
    for (const r of rows) expect(r.length).toBe(header.length);
    expect(header).toContain('pressure drop (kPa)');
    expect(header).toContain('capacity (kW)');
    const col = (name: string) => header.indexOf(name);
    result.circuits.forEach((c, i) => {
      expect(Number(body[i][col('circuit')])).toBe(c.index);
      expect(Number(body[i][col('passes')])).toBe(c.passes);
      expect(Number(body[i][col('pressure drop (kPa)')])).toBe(round6(c.pressureDrop_Pa! / 1000));
      expect(Number(body[i][col('water mass flow (kg/s)')])).toBe(round6(c.massFlow_kg_s!));
    });
  });

  it('converts to IP units and names them', () => {
    const [header, first] = parseCsv(circuitsCsv(doc, result, 'ip'));
    const c = result.circuits[0];
    expect(Number(first[header.indexOf('pressure drop (ft of water)')])).toBe(round6(toDisplay('waterPressureDrop', c.pressureDrop_Pa!, 'ip')));
    expect(Number(first[header.indexOf('leaving water temperature (°F)')])).toBe(round6(toDisplay('temperature', c.leavingTemperature_C!, 'ip')));
  });

  it('leaves hydraulic cells empty for an invalid circuiting', () => {
    const broken = brokenCoil();
    const [header, ...body] = parseCsv(circuitsCsv(broken.doc, broken.result, 'si'));
    expect(body.length).toBe(broken.result.circuits.length);
    for (const r of body) expect(r[header.indexOf('pressure drop (kPa)')]).toBe('');
  });
});

describe('tubesCsv', () => {
  const { doc, result } = smallCoolingCoil();

  it('has one row per tube with its circuit, position and centre', () => {
    const [header, ...body] = parseCsv(tubesCsv(doc, result, 'si'));
    expect(body.length).toBe(doc.geometry.rows * doc.geometry.tubesPerRow);
    const at = (name: string) => header.indexOf(name);
    for (const c of result.circuits) {
      c.tubes.forEach((t, step) => {
        const r = body.find((b) => Number(b[at('row')]) === t.row && Number(b[at('tube')]) === t.tube)!;
        expect(Number(r[at('circuit')])).toBe(c.index);
        expect(Number(r[at('position in circuit')])).toBe(step + 1);
        const centre = tubeCentre(doc.geometry, t);
        expect(Number(r[at('centre x (mm)')])).toBeCloseTo(centre.x_m * 1000, 3);
        expect(Number(r[at('centre y (mm)')])).toBeCloseTo(centre.y_m * 1000, 3);
      });
    }
    expect(header).toContain('water in (°C)');
  });
});

describe('billOfMaterialsCsv', () => {
  const { doc, result } = smallCoolingCoil();

  it('lists the counts, quotes hairpin spans that hold commas, and gives each row its unit', () => {
    const text = billOfMaterialsCsv(doc, result, 'ip');
    const [header, ...body] = parseCsv(text);
    expect(header).toEqual(['item', 'quantity', 'unit']);
    const b = result.billOfMaterials!;
    const item = (name: string) => body.find((r) => r[0] === name);
    expect(Number(item('tubes')?.[1])).toBe(b.tubes);
    expect(Number(item('braze joints')?.[1])).toBe(b.brazeJoints);
    expect(item('internal volume')?.[2]).toBe('US gal');
    const spans = body.filter((r) => r[0].startsWith('hairpins, '));
    expect(spans.reduce((s, r) => s + Number(r[1]), 0)).toBe(b.hairpinCount);
    const withComma = spans.filter((r) => r[0].split(',').length > 2); // "hairpins, same row, 1 pitch"
    expect(withComma.length).toBeGreaterThan(0);
    for (const s of withComma) expect(text).toContain(`"${s[0]}"`);
  });

  it('is a header alone when the result has no bill of materials', () => {
    const broken = brokenCoil();
    expect(parseCsv(billOfMaterialsCsv(broken.doc, broken.result, 'si'))).toEqual([['item', 'quantity', 'unit']]);
  });
});
