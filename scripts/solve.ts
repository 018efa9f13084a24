/**
 * npm run solve -- path/to/coil.json [--units ip|si] [--table]
 *
 * Reads a coil document, validates it with the zod schema (field paths in every message), solves it with the
 * engine and prints the result: JSON by default (SI, or IP with --units ip: every unit-suffixed field is renamed
 * to its IP unit and converted), or a readable table with --table. Exit code 1 on a bad file or document.
 */
import { readFileSync } from 'node:fs';
import { coilDocumentSchema } from '@/lib/schema/coil-document';
import { solveCoil } from '@/lib/engine/solve-coil';
import type { SolveResult } from '@/lib/engine/types';
import { formatQuantity, toDisplay, type QuantityKind, type UnitSystem } from '@/lib/units';

function fail(message: string): never {
  process.stderr.write(`${message}\n`);
  process.exit(1);
}

interface Args {
  file: string;
  units: UnitSystem;
  table: boolean;
}

function parseArgs(argv: string[]): Args {
  let file: string | undefined;
  let units: UnitSystem = 'si';
  let table = false;
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--table') table = true;
    else if (a === '--units') {
      const u = argv[++i];
      if (u !== 'si' && u !== 'ip') fail(`--units takes "si" or "ip" (got ${u ?? 'nothing'})`);
      units = u;
    } else if (a.startsWith('--units=')) {
      const u = a.slice('--units='.length);
      if (u !== 'si' && u !== 'ip') fail(`--units takes "si" or "ip" (got ${u})`);
      units = u;
    } else if (a === '--help' || a === '-h') {
      process.stdout.write('usage: npm run solve -- path/to/coil.json [--units ip|si] [--table]\n');
      process.exit(0);
    } else if (a.startsWith('--')) fail(`unknown option ${a}`);
    else if (file === undefined) file = a;
    else fail(`only one coil document at a time (got ${file} and ${a})`);
  }
  if (!file) fail('usage: npm run solve -- path/to/coil.json [--units ip|si] [--table]');
  return { file, units, table };
}

/** SI field suffix → quantity kind and IP suffix, for the JSON conversion. Order matters (longest first). */
const SUFFIXES: { suffix: string; kind: (key: string) => QuantityKind; ip: (key: string) => string }[] = [
  { suffix: '_m3', kind: () => 'volume', ip: () => '_gal' },
  { suffix: '_m2', kind: () => 'area', ip: () => '_ft2' },
  { suffix: '_m_s', kind: (k) => (k.startsWith('faceVelocity') ? 'faceVelocity' : 'velocity'), ip: (k) => (k.startsWith('faceVelocity') ? '_fpm' : '_ft_s') },
  { suffix: '_kg_s', kind: () => 'massFlow', ip: () => '_lb_h' },
  { suffix: '_kg', kind: () => 'mass', ip: () => '_lb' },
  { suffix: '_Pa', kind: (k) => (k.startsWith('air') ? 'airPressureDrop' : 'waterPressureDrop'), ip: (k) => (k.startsWith('air') ? '_inWG' : '_ftWater') },
  { suffix: '_W', kind: () => 'powerSmall', ip: () => '_Btu_h' },
  { suffix: '_C', kind: () => 'temperature', ip: () => '_F' },
  { suffix: '_m', kind: () => 'length', ip: () => '_in' },
];

/** Deep copy of a result with every SI-suffixed number converted to IP and its key renamed. */
export function resultInUnits(value: unknown, system: UnitSystem): unknown {
  if (system === 'si') return value;
  if (Array.isArray(value)) return value.map((v) => resultInUnits(v, system));
  if (value === null || typeof value !== 'object') return value;
  const out: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(value)) {
    const rule = SUFFIXES.find((s) => key.endsWith(s.suffix));
    if (rule && typeof v === 'number') {
      const base = key.slice(0, -rule.suffix.length);
      out[base + rule.ip(key)] = toDisplay(rule.kind(key), v, system);
    } else if (key === 'leavingAirHumidityRatio' && typeof v === 'number') {
      out.leavingAirHumidityRatio_gr_lb = toDisplay('humidityRatio', v, system);
    } else out[key] = resultInUnits(v, system);
  }
  return out;
}

function pad(s: string, n: number): string {
  return s.length >= n ? s : s + ' '.repeat(n - s.length);
}

function table(r: SolveResult, system: UnitSystem, name: string): string {
  const q = (kind: QuantityKind, v: number | undefined) => (v === undefined ? '—' : formatQuantity(kind, v, system).label);
  const lines: string[] = [];
  lines.push(`${name}: ${r.valid ? 'valid circuiting' : 'INVALID circuiting'}`);
  for (const e of r.errors) lines.push(`  error ${e.code}: ${e.message}`);
  const t = r.totals;
  if (r.valid && t.capacity_W !== undefined) {
    const rows: [string, string][] = [
      ['mode', t.mode ?? '—'],
      ['capacity', q('power', t.capacity_W)],
      ['sensible / latent', `${q('power', t.sensibleCapacity_W)} / ${q('power', t.latentCapacity_W)}`],
      ['leaving air db / wb', `${q('temperature', t.leavingAirDryBulb_C)} / ${q('temperature', t.leavingAirWetBulb_C)}`],
      ['leaving air humidity ratio', q('humidityRatio', t.leavingAirHumidityRatio)],
      ['leaving water', q('temperature', t.leavingWaterTemperature_C)],
      ['water pressure drop', q('waterPressureDrop', t.waterPressureDrop_Pa)],
      ['air pressure drop', `${q('airPressureDrop', t.airPressureDrop_Pa)}${t.airPressureDropIsWetEstimate ? ' (wet, estimate)' : ''}`],
      ['condensate', q('massFlow', t.condensate_kg_s)],
      ['face velocity', q('faceVelocity', t.faceVelocity_m_s)],
      ['circuits / maldistribution', `${t.circuitCount} / ${t.maldistribution?.toFixed(3) ?? '—'}`],
      ['energy balance error', t.energyBalanceError?.toExponential(1) ?? '—'],
      ['outer iterations / converged', `${t.iterations} / ${t.converged ? 'yes' : 'NO'}`],
    ];
    for (const [k, v] of rows) lines.push(`  ${pad(k, 30)}${v}`);
  } else lines.push(`  circuits: ${t.circuitCount}`);
  if (r.circuits.length > 0) {
    lines.push('');
    lines.push(`  ${pad('circuit', 9)}${pad('passes', 8)}${pad('arrangement', 13)}${pad('flow', 14)}${pad('velocity', 13)}${pad('Re min', 9)}${pad('regime', 14)}${pad('ΔP', 16)}${pad('leaving', 10)}capacity`);
    for (const c of r.circuits) {
      lines.push(
        `  ${pad(String(c.index), 9)}${pad(String(c.passes), 8)}${pad(c.arrangement, 13)}${pad(q('massFlow', c.massFlow_kg_s), 14)}${pad(q('velocity', c.velocity_m_s), 13)}${pad(c.reynoldsMin?.toFixed(0) ?? '—', 9)}${pad(c.regime ?? '—', 14)}${pad(q('waterPressureDrop', c.pressureDrop_Pa), 16)}${pad(q('temperature', c.leavingTemperature_C), 10)}${q('power', c.capacity_W)}`,
      );
    }
  }
  if (r.turndown && r.turndown.length > 0) {
    lines.push('');
    lines.push(`  ${pad('flow', 8)}${pad('capacity', 14)}${pad('Re min', 9)}water ΔP`);
    for (const p of r.turndown) {
      lines.push(`  ${pad(`${Math.round(p.flowFraction * 100)} %`, 8)}${pad(q('power', p.capacity_W), 14)}${pad(p.minReynolds.toFixed(0), 9)}${q('waterPressureDrop', p.waterPressureDrop_Pa)}`);
    }
  }
  if (r.warnings.length > 0) {
    lines.push('');
    for (const w of r.warnings) lines.push(`  [${w.severity}] ${w.code}: ${w.message}`);
  }
  if (r.solveTime_ms !== undefined) lines.push('', `  solved in ${r.solveTime_ms.toFixed(0)} ms`);
  return lines.join('\n');
}

function main(): void {
  const args = parseArgs(process.argv.slice(2));
  let text: string;
  try {
    text = readFileSync(args.file, 'utf8');
  } catch (e) {
    fail(`cannot read ${args.file}: ${(e as Error).message}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    fail(`${args.file} is not valid JSON: ${(e as Error).message}`);
  }
  const parsed = coilDocumentSchema.safeParse(json);
  if (!parsed.success) {
    const issues = parsed.error.issues.map((i) => `  ${i.path.length > 0 ? i.path.join('.') : '(document)'}: ${i.message}`);
    fail(`${args.file} is not a valid coil document:\n${issues.join('\n')}`);
  }
  const result = solveCoil(parsed.data);
  if (args.table) process.stdout.write(`${table(result, args.units, parsed.data.name)}\n`);
  else process.stdout.write(`${JSON.stringify(resultInUnits(result, args.units), null, 2)}\n`);
}

main();
