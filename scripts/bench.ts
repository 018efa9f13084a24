/**
 * npm run bench [-- --only engine]
 *
 * Median wall-clock times of the engine measured with performance.now(): each case is
 * run a few times to warm up, then N times; the median and the fastest run are printed. Targets (issue text):
 * topology + hydraulics of a 12-row x 60-high coil with 40 unequal circuits < 5 ms; full thermal solve of an
 * 8-row x 40-high wet chilled-water coil at 6 segments < 50 ms; also 12 x 60, and the growth with segments.
 *
 * The editor's measurements run in scripts/bench-ui.ts (headless Chromium against the built app); `--only engine`
 * skips them.
 */
import { spawnSync } from 'node:child_process';
import { traceCircuits } from '@/lib/engine/topology';
import { areNeighbours, deriveGeometry } from '@/lib/engine/geometry';
import { circuitingFromPaths, serpentineCircuiting } from '@/lib/engine/generators';
import { solveCoilHydraulics, isothermalTemperatures } from '@/lib/engine/coil-hydraulics';
import { cachedFluidProperties, solveCoil } from '@/lib/engine/solve-coil';
import { solveCoilThermal } from '@/lib/engine/thermal';
import type { CoilDocument, Geometry } from '@/lib/engine/types';

interface Timing {
  name: string;
  median_ms: number;
  min_ms: number;
  /** Mean CPU time of this process per run (user + system), ms: less sensitive to other load on the machine. */
  cpu_ms: number;
  runs: number;
  target_ms?: number;
}

/** Median of `runs` timed calls after `warmup` untimed ones. */
export function measure(name: string, fn: () => unknown, runs = 15, warmup = 3, target_ms?: number): Timing {
  for (let i = 0; i < warmup; i++) fn();
  const times: number[] = [];
  const cpu0 = process.cpuUsage();
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  const cpu = process.cpuUsage(cpu0);
  times.sort((a, b) => a - b);
  const mid = times.length >> 1;
  const median = times.length % 2 ? times[mid] : 0.5 * (times[mid - 1] + times[mid]);
  return { name, median_ms: median, min_ms: times[0], cpu_ms: (cpu.user + cpu.system) / 1000 / runs, runs, target_ms };
}

function geometry(rows: number, tubesPerRow: number): Geometry {
  return {
    rows,
    tubesPerRow,
    layout: 'staggered',
    tubeOuterDiameter_m: 0.0127,
    tubeWall_m: 0.00041,
    transversePitch_m: 0.03175,
    rowPitch_m: 0.0275,
    finnedLength_m: 1.5,
    fin: { type: 'plain', thickness_m: 0.00015, pitch_m: 0.00254, conductivity_W_mK: 200 },
    tubeConductivity_W_mK: 390,
  };
}

/** A chilled-water coil (wet at 27/19.5 °C air, 7 °C water) with `feeds` circuits, 0.1 kg/s per circuit. */
function chilledWaterCoil(rows: number, tubesPerRow: number, feeds: number, segmentsPerTube = 6): CoilDocument {
  const g = geometry(rows, tubesPerRow);
  return {
    schemaVersion: 1,
    name: `bench ${rows} x ${tubesPerRow}, ${feeds} circuits`,
    geometry: g,
    circuiting: serpentineCircuiting(g, feeds),
    conditions: {
      air: { faceVelocity_m_s: 2.4, inletDryBulb_C: 27, inletWetBulb_C: 19.5, altitude_m: 0 },
      fluid: { kind: 'water', glycolMassFraction: 0, inletTemperature_C: 7, massFlow_kg_s: 0.1 * feeds },
      minimumFlowFraction: 0.3,
      minimumAirTemperature_C: null,
    },
    options: { segmentsPerTube },
  };
}

/**
 * 12 x 60 with 40 circuits of unequal length: the full-height serpentine of 40 feeds (18 passes each) re-cut so
 * that each pair of circuits sharing a meander becomes 16 + 20 passes.
 */
function unequalCoil(): CoilDocument {
  const doc = chilledWaterCoil(12, 60, 40);
  const paths = traceCircuits(doc).circuits.map((c) => c.tubes.slice());
  // Pair each circuit with the one that continues its meander and move two tubes from the first to the second.
  const used = new Set<number>();
  for (let i = 0; i < paths.length; i++) {
    if (used.has(i)) continue;
    const a = paths[i];
    const j = paths.findIndex((b, k) => k !== i && !used.has(k) && areNeighbours(a[a.length - 1], b[0]));
    if (j < 0 || a.length <= 4) continue;
    used.add(i);
    used.add(j);
    paths[j] = [...a.splice(a.length - 2, 2), ...paths[j]];
  }
  return { ...doc, name: 'bench 12 x 60, 40 unequal circuits', circuiting: circuitingFromPaths(paths) };
}

function topologyAndHydraulics(doc: CoilDocument): number {
  const topology = traceCircuits(doc);
  const derived = deriveGeometry(doc.geometry);
  const fluid = doc.conditions.fluid;
  const h = solveCoilHydraulics(
    doc.geometry,
    derived,
    topology.circuits,
    isothermalTemperatures(topology.circuits, fluid.inletTemperature_C),
    fluid.massFlow_kg_s,
    cachedFluidProperties(fluid),
    'rennels',
  );
  return h.pressureDrop_Pa;
}

function thermalSolve(doc: CoilDocument): number {
  const topology = traceCircuits(doc);
  const r = solveCoilThermal(doc, deriveGeometry(doc.geometry), topology.circuits, { fluid: cachedFluidProperties(doc.conditions.fluid) }, {
    segmentsPerTube: doc.options?.segmentsPerTube ?? 6,
    airMixing: 'strip',
    bendMethod: 'rennels',
  });
  return r.capacity_W;
}

export function engineBenchmarks(): Timing[] {
  const out: Timing[] = [];
  // 12 x 60 = 720 tubes in 40 circuits: passes 18 each on average, unequal (the generator spreads them).
  const big = unequalCoil();
  const passes = new Set(traceCircuits(big).circuits.map((c) => c.passes));
  if (passes.size < 2 || !traceCircuits(big).valid) throw new Error('bench coil should have valid circuits of unequal length');
  out.push(measure('topology + hydraulics, 12 rows x 60 high, 40 unequal circuits', () => topologyAndHydraulics(big), 100, 30, 5));
  out.push(measure('  of which topology (traceCircuits)', () => traceCircuits(big), 100, 30));
  const traced = traceCircuits(big);
  const bigDerived = deriveGeometry(big.geometry);
  const bigFluid = big.conditions.fluid;
  out.push(
    measure('  of which hydraulics (flow split, ΔP, Re)', () =>
      solveCoilHydraulics(big.geometry, bigDerived, traced.circuits, isothermalTemperatures(traced.circuits, bigFluid.inletTemperature_C), bigFluid.massFlow_kg_s, cachedFluidProperties(bigFluid), 'rennels'),
    30,
    5,
    ),
  );
  const wet8 = chilledWaterCoil(8, 40, 40);
  out.push(measure('thermal solve, 8 x 40 wet chilled water, 6 segments', () => thermalSolve(wet8), 21, 5, 50));
  out.push(measure('thermal solve, 12 x 60 wet chilled water, 6 segments', () => thermalSolve(chilledWaterCoil(12, 60, 60)), 7, 2));
  for (const segments of [1, 6, 20]) {
    out.push(measure(`thermal solve, 8 x 40 wet, ${segments} segment${segments > 1 ? 's' : ''} per tube`, () => thermalSolve(chilledWaterCoil(8, 40, 40, segments)), 7, 2));
  }
  out.push(measure('solveCoil (everything incl. 10 turndown points), 8 x 40 wet', () => solveCoil(wet8), 5, 1));
  return out;
}


function report(title: string, timings: Timing[]): void {
  process.stdout.write(`\n${title}\n`);
  for (const t of timings) {
    const verdict = t.target_ms === undefined ? '' : t.median_ms <= t.target_ms ? `  (target < ${t.target_ms} ms: met)` : `  (target < ${t.target_ms} ms: NOT met)`;
    process.stdout.write(
      `  ${t.name.padEnd(66)} median ${t.median_ms.toFixed(2).padStart(9)} ms   fastest ${t.min_ms.toFixed(2).padStart(9)} ms   cpu ${t.cpu_ms.toFixed(2).padStart(9)} ms   n=${t.runs}${verdict}\n`,
    );
  }
}

function main(): void {
  // A fixed reference loop, so timings from a busy machine can be judged (about 60–90 ms on an idle core).
  const ref = measure('reference: 1e7 Math.exp calls', () => {
    let sum = 0;
    for (let i = 0; i < 1e7; i++) sum += Math.exp(-i * 1e-7);
    return sum;
  }, 3, 1);
  report('machine', [ref]);
  const args = process.argv.slice(2);
  const onlyIndex = args.indexOf('--only');
  const only = onlyIndex >= 0 ? args[onlyIndex + 1] : undefined;
  report('engine', engineBenchmarks());
  if (only !== 'engine') {
    // The editor measurements drive the built web app in Chromium (scripts/bench-ui.ts); their own process.
    process.stdout.write('\neditor (scripts/bench-ui.ts)\n');
    const ui = spawnSync(process.execPath, ['--import', 'tsx', 'scripts/bench-ui.ts'], { stdio: 'inherit' });
    if (ui.status !== 0) process.exitCode = ui.status ?? 1;
  }
}

main();
