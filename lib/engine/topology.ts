/**
 * Circuit tracing and validation (ENGINEERING.md sections 2.1-2.4). Water is followed from each supply stub: it
 * enters a tube at the stub's end face and leaves at the other face; there it meets a bend on that face (and enters
 * the bend's other tube at that same face) or a return stub. Everything the drawing gets wrong becomes a
 * TopologyError with a stable kebab-case code; design concerns become ResultWarnings. traceCircuits never throws for
 * a document that passed the zod schema: out-of-range references are reported, loops are bounded by the tube count.
 */
import { areNeighbours, bendRadius_m, halfPitchLevel } from '@/lib/engine/geometry';
import { crossingPairs, segmentsIntersectXY, type BendFrame } from '@/lib/engine/topology-crossings';
import type {
  Arrangement,
  CoilDocument,
  EndFace,
  Geometry,
  ResultWarning,
  Severity,
  Stub,
  TopologyError,
  TubeRef,
} from '@/lib/engine/types';

/** Stable error codes of the tracer. */
export const TOPOLOGY_ERROR_CODES = [
  'tube-outside-coil', // a bend or stub names a tube the coil does not have
  'bend-self', // a bend joins a tube to itself
  'tube-end-conflict', // one tube end carries two connections (two bends, or a bend and a stub, or two stubs)
  'tube-in-two-circuits', // the water of two circuits runs through one tube
  'tube-unused', // a tube with no bend or stub at all (T1)
  'bend-dangling', // a bend the water never reaches
  'circuit-no-return', // the water path ends at a tube end with nothing on it
  'circuit-no-supply', // tubes lead to a return stub but no supply feeds them
  'closed-loop', // bends join tubes into a ring with no header
  'supply-at-outlet', // the water path leaves a tube where a supply stub sits
  'supply-faces-mixed', // supply stubs on both end faces (T7)
  'return-faces-mixed', // return stubs on both end faces (T7)
  'bends-cross', // two bends on one face cross and neither is marked crossover (T5)
  'no-circuits', // the drawing has no supply stub
] as const;
export type TopologyErrorCode = (typeof TOPOLOGY_ERROR_CODES)[number];

export interface TracedBend {
  end: EndFace;
  /** Tube the water comes from. */
  a: TubeRef;
  /** Tube the water goes to. */
  b: TubeRef;
  radius_m: number;
  crossover: boolean;
  /** Derived from the end face: hairpins are formed on the opposite end, return bends brazed on the connection end. */
  kind: 'hairpin' | 'return-bend';
  /** Same row +-1 tube, or the staggered neighbour in the next row. */
  adjacent: boolean;
}

export interface TracedCircuit {
  /** 1-based, ordered by supply position (top to bottom, then air-entering row first). */
  index: number;
  /** Tubes in water order. */
  tubes: TubeRef[];
  passes: number;
  bends: TracedBend[];
  supply: Stub;
  return: Stub;
  arrangement: Arrangement;
  counterflowIndex: number;
  startsInLastRow: boolean;
  endsInFirstRow: boolean;
  supplyAtBottom: boolean;
  returnAtTop: boolean;
  connectionsSameEnd: boolean;
}

export interface Topology {
  valid: boolean;
  errors: TopologyError[];
  warnings: ResultWarning[];
  circuits: TracedCircuit[];
  /** Circuit index (1-based) of each tube, 0 when the tube is in no traced circuit; see tubeIndex. */
  tubeCircuit: number[];
}

/** Index of a tube in Topology.tubeCircuit: (row - 1) * tubesPerRow + (tube - 1). */
export function tubeIndex(g: Pick<Geometry, 'tubesPerRow'>, ref: TubeRef): number {
  return (ref.row - 1) * g.tubesPerRow + (ref.tube - 1);
}

export const tubeLabel = (t: TubeRef): string => `row ${t.row} tube ${t.tube}`;
const faceWord = (f: EndFace): string => (f === 'connection' ? 'connection end' : 'opposite end');

/**
 * Flow arrangement of a circuit from its row sequence in water order (ENGINEERING.md 2.3): n_against = steps toward
 * row 1, n_with = steps toward the last row; all rows equal -> single-row; n_with = 0 -> counterflow; n_against = 0
 * -> parallel; else mixed. CFI = (n_against - n_with) / (n_against + n_with), 0 for a single-row circuit.
 */
export function classifyArrangement(rows: readonly number[]): { arrangement: Arrangement; counterflowIndex: number } {
  let against = 0;
  let withAir = 0;
  for (let k = 0; k + 1 < rows.length; k++) {
    const d = rows[k + 1] - rows[k];
    if (d < 0) against++;
    else if (d > 0) withAir++;
  }
  if (against + withAir === 0) return { arrangement: 'single-row', counterflowIndex: 0 };
  const counterflowIndex = (against - withAir) / (against + withAir);
  if (withAir === 0) return { arrangement: 'counterflow', counterflowIndex };
  if (against === 0) return { arrangement: 'parallel', counterflowIndex };
  return { arrangement: 'mixed', counterflowIndex };
}

/**
 * Interior tubes where water is trapped when the coil is drained: heights (half-pitch levels, larger = lower) along
 * the circuit are run-length compressed; a run that is strictly lower than the runs on both sides and contains
 * neither end tube is a trapped low point (water there must rise to leave by either header). Ends drain through
 * the headers' drains, so a low end is not trapped.
 */
export function trappedLowPoints(tubes: readonly TubeRef[]): TubeRef[] {
  const runs: { level: number; tubes: TubeRef[]; hasEnd: boolean }[] = [];
  tubes.forEach((t, i) => {
    const level = halfPitchLevel(t);
    const isEnd = i === 0 || i === tubes.length - 1;
    const last = runs[runs.length - 1];
    if (last && last.level === level) {
      last.tubes.push(t);
      last.hasEnd ||= isEnd;
    } else runs.push({ level, tubes: [t], hasEnd: isEnd });
  });
  const trapped: TubeRef[] = [];
  for (let k = 1; k + 1 < runs.length; k++) {
    const r = runs[k];
    if (!r.hasEnd && r.level > runs[k - 1].level && r.level > runs[k + 1].level) trapped.push(...r.tubes);
  }
  return trapped;
}

interface Point { x: number; y: number }

/** True when segments p1p2 and p3p4 intersect (touching or overlapping counts). Integer-valued inputs keep it exact. */
export function segmentsIntersect(p1: Point, p2: Point, p3: Point, p4: Point): boolean {
  return segmentsIntersectXY(p1.x, p1.y, p2.x, p2.y, p3.x, p3.y, p4.x, p4.y);
}

const sameTube = (a: TubeRef, b: TubeRef) => a.row === b.row && a.tube === b.tube;

/**
 * Trace and validate the circuiting of a coil document (ENGINEERING.md 2.1 T1-T7, 2.3, 2.4). Returns the circuits
 * that run from a supply stub to a return stub, every error found (the drawing is valid only when there are none),
 * and the design warnings of the traced circuits.
 *
 * Runs on every edit in the editor, so the bookkeeping is on integer tube indices and typed arrays: connection ids
 * are bend i -> i, supply stub j -> nBends + j, return stub j -> nBends + nSupplies + j, kept per tube end in
 * singly linked lists in the order they were drawn (the order error messages list them in).
 */
export function traceCircuits(doc: CoilDocument): Topology {
  const g = doc.geometry;
  const { rows, tubesPerRow } = g;
  const tubeCount = rows * tubesPerRow;
  const errors: TopologyError[] = [];
  const bends = doc.circuiting.bends;
  const supplies = doc.circuiting.supply;
  const returns = doc.circuiting.return;
  const nBends = bends.length;
  const nSupplies = supplies.length;
  const firstReturn = nBends + nSupplies;

  const inCoil = (t: TubeRef) =>
    Number.isInteger(t.row) && Number.isInteger(t.tube) && t.row >= 1 && t.row <= rows && t.tube >= 1 && t.tube <= tubesPerRow;
  const indexOf = (t: TubeRef) => (t.row - 1) * tubesPerRow + (t.tube - 1);
  const faceBit = (f: EndFace) => (f === 'connection' ? 0 : 1);

  // ---- index the connections on every tube end ----
  const endCount = new Int32Array(2 * tubeCount);
  const endHead = new Int32Array(2 * tubeCount).fill(-1);
  const endTail = new Int32Array(2 * tubeCount).fill(-1);
  const nodeConn = new Int32Array(2 * nBends + nSupplies + returns.length);
  const nodeNext = new Int32Array(nodeConn.length).fill(-1);
  let nodes = 0;
  const link = (key: number, conn: number) => {
    nodeConn[nodes] = conn;
    if (endTail[key] < 0) endHead[key] = nodes;
    else nodeNext[endTail[key]] = nodes;
    endTail[key] = nodes;
    endCount[key]++;
    nodes++;
  };

  const bendUsable = new Uint8Array(nBends);
  const tubeA = new Int32Array(nBends).fill(-1);
  const tubeB = new Int32Array(nBends).fill(-1);
  for (let i = 0; i < nBends; i++) {
    const b = bends[i];
    if (!inCoil(b.a) || !inCoil(b.b)) {
      errors.push({ code: 'tube-outside-coil', message: `bend ${i + 1} names a tube outside the coil`, tubes: [b.a, b.b] });
      continue;
    }
    if (sameTube(b.a, b.b)) {
      errors.push({ code: 'bend-self', message: `a bend on the ${faceWord(b.end)} joins ${tubeLabel(b.a)} to itself`, tubes: [b.a] });
      continue;
    }
    bendUsable[i] = 1;
    tubeA[i] = indexOf(b.a);
    tubeB[i] = indexOf(b.b);
    link(2 * tubeA[i] + faceBit(b.end), i);
    link(2 * tubeB[i] + faceBit(b.end), i);
  }
  const stubUsable = (list: readonly Stub[], kind: 'supply' | 'return', firstId: number) => {
    const usable = new Uint8Array(list.length);
    for (let i = 0; i < list.length; i++) {
      const s = list[i];
      if (!inCoil(s.tube)) {
        errors.push({ code: 'tube-outside-coil', message: `${kind} stub ${i + 1} names a tube outside the coil`, tubes: [s.tube] });
        continue;
      }
      link(2 * indexOf(s.tube) + faceBit(s.end), firstId + i);
      usable[i] = 1;
    }
    return usable;
  };
  const supplyUsable = stubUsable(supplies, 'supply', nBends);
  const returnUsable = stubUsable(returns, 'return', firstReturn);

  const refOf = (idx: number): TubeRef => ({ row: Math.floor(idx / tubesPerRow) + 1, tube: (idx % tubesPerRow) + 1 });
  const describe = (conn: number) => (conn < nBends ? 'a bend' : conn < firstReturn ? 'a supply stub' : 'a return stub');
  for (let key = 0; key < 2 * tubeCount; key++) {
    if (endCount[key] <= 1) continue;
    const t = refOf(key >> 1);
    const face: EndFace = key % 2 === 0 ? 'connection' : 'opposite';
    const words: string[] = [];
    for (let n = endHead[key]; n >= 0; n = nodeNext[n]) words.push(describe(nodeConn[n]));
    errors.push({
      code: 'tube-end-conflict',
      message: `${tubeLabel(t)} has ${endCount[key]} connections on its ${faceWord(face)} (${words.join(', ')}); a tube end takes one`,
      tubes: [t],
    });
  }

  // ---- T7: one header pair ----
  const facesMixed = (list: readonly Stub[], usable: Uint8Array) => {
    let connection = false;
    let opposite = false;
    for (let i = 0; i < list.length; i++) {
      if (usable[i] === 0) continue;
      if (list[i].end === 'connection') connection = true;
      else opposite = true;
    }
    return connection && opposite;
  };
  if (facesMixed(supplies, supplyUsable)) {
    errors.push({ code: 'supply-faces-mixed', message: 'supply stubs sit on both end faces; all supply stubs must share one header (one end face)', tubes: supplies.map((s) => s.tube) });
  }
  if (facesMixed(returns, returnUsable)) {
    errors.push({ code: 'return-faces-mixed', message: 'return stubs sit on both end faces; all return stubs must share one header (one end face)', tubes: returns.map((s) => s.tube) });
  }

  // ---- follow the water from each supply stub ----
  const owner = new Int32Array(tubeCount); // provisional trace number (1-based) per tube
  const bendUsed = new Uint8Array(nBends);
  interface RawCircuit { supply: number; ret: number; tubes: TubeRef[]; bends: number[] }
  const complete: RawCircuit[] = [];
  let traceNo = 0;

  for (let si = 0; si < nSupplies; si++) {
    if (supplyUsable[si] === 0) continue;
    const s = supplies[si];
    traceNo++;
    const tubes: TubeRef[] = [];
    const path: number[] = [];
    let current = s.tube;
    let idx = indexOf(current);
    let entry = faceBit(s.end);
    for (let step = 0; step <= tubeCount; step++) {
      if (owner[idx] !== 0) {
        errors.push({
          code: 'tube-in-two-circuits',
          message: `${tubeLabel(current)} is reached by ${owner[idx] === traceNo ? 'the same circuit twice' : 'two circuits'}; each tube belongs to exactly one circuit`,
          tubes: [current],
        });
        break;
      }
      owner[idx] = traceNo;
      tubes.push(current);
      const exit = 1 - entry;
      const key = 2 * idx + exit;
      // First return stub on this end, else the first bend not yet used, else note whether a supply stub sits here.
      let ret = -1;
      let bend = -1;
      let supplyHere = false;
      for (let n = endHead[key]; n >= 0; n = nodeNext[n]) {
        const conn = nodeConn[n];
        if (conn >= firstReturn) {
          ret = conn - firstReturn;
          break;
        }
        if (conn < nBends) {
          if (bend < 0 && bendUsed[conn] === 0) bend = conn;
        } else supplyHere = true;
      }
      if (ret >= 0) {
        complete.push({ supply: si, ret, tubes, bends: path });
        break;
      }
      if (bend >= 0) {
        bendUsed[bend] = 1;
        path.push(bend);
        const b = bends[bend];
        if (tubeA[bend] === idx) {
          current = b.b;
          idx = tubeB[bend];
        } else {
          current = b.a;
          idx = tubeA[bend];
        }
        entry = exit;
        continue;
      }
      const exitWord = faceWord(exit === 0 ? 'connection' : 'opposite');
      if (supplyHere) {
        errors.push({
          code: 'supply-at-outlet',
          message: `the water entering at ${tubeLabel(s.tube)} leaves ${tubeLabel(current)} at the ${exitWord}, where a supply stub sits; it needs a return stub or a bend there`,
          tubes: [s.tube, current],
        });
        break;
      }
      errors.push({
        code: 'circuit-no-return',
        message: `the water entering at ${tubeLabel(s.tube)} reaches the ${exitWord} of ${tubeLabel(current)} and finds neither a bend nor a return stub`,
        tubes: [s.tube, current],
      });
      break;
    }
  }
  if (nSupplies === 0) errors.push({ code: 'no-circuits', message: 'the drawing has no supply stub, so no circuit can be traced' });

  // ---- what the water never reached ----
  // Usable bends the water did not pass through: 1 when one of its tubes is traced (dangling off a circuit), 2 when
  // neither is (part of an unfed group).
  const idle = new Uint8Array(nBends);
  for (let i = 0; i < nBends; i++) {
    if (bendUsable[i] === 0 || bendUsed[i] === 1) continue;
    idle[i] = owner[tubeA[i]] !== 0 || owner[tubeB[i]] !== 0 ? 1 : 2;
    if (idle[i] === 1) {
      const b = bends[i];
      errors.push({
        code: 'bend-dangling',
        message: `the bend on the ${faceWord(b.end)} between ${tubeLabel(b.a)} and ${tubeLabel(b.b)} sits where the water does not arrive`,
        tubes: [b.a, b.b],
      });
    }
  }
  const untraced = owner.indexOf(0) >= 0;
  if (untraced) leftoverErrors();

  // ---- T5: crossing bends on one face ----
  const frame: BendFrame = {
    usable: bendUsable,
    tubeA,
    tubeB,
    ax: new Int32Array(nBends),
    ay: new Int32Array(nBends),
    bx: new Int32Array(nBends),
    by: new Int32Array(nBends),
    rows,
  };
  for (let i = 0; i < nBends; i++) {
    if (bendUsable[i] === 0) continue;
    const b = bends[i];
    frame.ax[i] = b.a.row - 1;
    frame.ay[i] = halfPitchLevel(b.a);
    frame.bx[i] = b.b.row - 1;
    frame.by[i] = halfPitchLevel(b.b);
  }
  for (const face of ['connection', 'opposite'] as const) {
    for (const [lo, hi] of crossingPairs(bends, face, frame)) {
      const a = bends[lo];
      const b = bends[hi];
      errors.push({
        code: 'bends-cross',
        message: `on the ${faceWord(face)} the bend ${tubeLabel(a.a)}-${tubeLabel(a.b)} crosses the bend ${tubeLabel(b.a)}-${tubeLabel(b.b)}; mark one as a crossover or reroute`,
        tubes: [a.a, a.b, b.a, b.b],
      });
    }
  }

  // ---- build the traced circuits, numbered by supply position ----
  const ordered = complete
    .map((c) => ({ c, s: supplies[c.supply] }))
    .sort((u, v) => {
      const du = halfPitchLevel(u.s.tube) - halfPitchLevel(v.s.tube);
      return du !== 0 ? du : u.s.tube.row - v.s.tube.row;
    });
  const tubeCircuit = new Array<number>(tubeCount).fill(0);
  const circuits: TracedCircuit[] = ordered.map(({ c }, k) => {
    const index = k + 1;
    const supply = supplies[c.supply];
    const ret = returns[c.ret];
    const traced: TracedBend[] = new Array<TracedBend>(c.bends.length);
    for (let j = 0; j < c.bends.length; j++) {
      const b = bends[c.bends[j]];
      const from = c.tubes[j];
      const to = c.tubes[j + 1];
      traced[j] = {
        end: b.end,
        a: from,
        b: to,
        radius_m: bendRadius_m(g, from, to),
        crossover: b.crossover === true,
        kind: b.end === 'opposite' ? 'hairpin' : 'return-bend',
        adjacent: areNeighbours(from, to),
      };
    }
    const rowSequence = new Array<number>(c.tubes.length);
    let lowest = -Infinity;
    let highest = Infinity;
    for (let j = 0; j < c.tubes.length; j++) {
      const t = c.tubes[j];
      tubeCircuit[indexOf(t)] = index;
      rowSequence[j] = t.row;
      const level = halfPitchLevel(t);
      if (level > lowest) lowest = level;
      if (level < highest) highest = level;
    }
    const { arrangement, counterflowIndex } = classifyArrangement(rowSequence);
    const first = c.tubes[0];
    const last = c.tubes[c.tubes.length - 1];
    return {
      index,
      tubes: c.tubes,
      passes: c.tubes.length,
      bends: traced,
      supply,
      return: ret,
      arrangement,
      counterflowIndex,
      startsInLastRow: first.row === rows,
      endsInFirstRow: last.row === 1,
      // Within the half-pitch stagger of the circuit's lowest / highest tube (2.4).
      supplyAtBottom: halfPitchLevel(first) >= lowest - 1,
      returnAtTop: halfPitchLevel(last) <= highest + 1,
      connectionsSameEnd: supply.end === ret.end,
    };
  });

  const warnings = circuitWarnings(doc, circuits);
  return { valid: errors.length === 0, errors, warnings, circuits, tubeCircuit };

  /** Errors of the tubes no supply reached: groups joined by idle bends are unfed, loops, or bare tubes. */
  function leftoverErrors(): void {
    const parent = new Int32Array(tubeCount);
    for (let i = 0; i < tubeCount; i++) parent[i] = i;
    const find = (i: number): number => {
      while (parent[i] !== i) {
        parent[i] = parent[parent[i]];
        i = parent[i];
      }
      return i;
    };
    for (let i = 0; i < nBends; i++) if (idle[i] === 2) parent[find(tubeA[i])] = find(tubeB[i]);
    interface Leftover { tubes: number[]; bends: number[]; returns: number; ends: number }
    const groups = new Map<number, Leftover>();
    for (let idx = 0; idx < tubeCount; idx++) {
      if (owner[idx] !== 0) continue;
      const root = find(idx);
      let grp = groups.get(root);
      if (!grp) {
        grp = { tubes: [], bends: [], returns: 0, ends: 0 };
        groups.set(root, grp);
      }
      grp.tubes.push(idx);
      for (let key = 2 * idx; key <= 2 * idx + 1; key++) {
        if (endCount[key] > 0) grp.ends++;
        for (let n = endHead[key]; n >= 0; n = nodeNext[n]) if (nodeConn[n] >= firstReturn) grp.returns++;
      }
    }
    for (let i = 0; i < nBends; i++) if (idle[i] === 2) groups.get(find(tubeA[i]))?.bends.push(i);
    const untouched: TubeRef[] = [];
    for (const grp of groups.values()) {
      const tubes = grp.tubes.map(refOf);
      const list = tubes.slice(0, 12).map(tubeLabel).join(', ') + (tubes.length > 12 ? ', ...' : '');
      if (grp.ends === 0) {
        for (const t of tubes) untouched.push(t);
      } else if (grp.returns > 0) {
        errors.push({ code: 'circuit-no-supply', message: `tubes ${list} lead to a return stub but no supply stub feeds them`, tubes });
      } else if (grp.bends.length === grp.tubes.length && grp.ends === 2 * grp.tubes.length) {
        errors.push({ code: 'closed-loop', message: `tubes ${list} are joined into a closed loop with no header`, tubes });
      } else {
        for (const i of grp.bends) {
          const b = bends[i];
          errors.push({
            code: 'bend-dangling',
            message: `the bend on the ${faceWord(b.end)} between ${tubeLabel(b.a)} and ${tubeLabel(b.b)} is not fed from any supply stub`,
            tubes: [b.a, b.b],
          });
        }
      }
    }
    if (untouched.length > 0) {
      // One error for all bare tubes: a fresh sheet would otherwise list every tube separately.
      const names = untouched.slice(0, 12).map(tubeLabel).join(', ') + (untouched.length > 12 ? ', ...' : '');
      errors.push({
        code: 'tube-unused',
        message: untouched.length === 1 ? `${names} belongs to no circuit (no bend or stub on either end)` : `${untouched.length} tubes belong to no circuit (no bend or stub on either end): ${names}`,
        tubes: untouched,
      });
    }
  }
}

function warn(code: string, severity: Severity, message: string, circuits?: number[], tubes?: TubeRef[]): ResultWarning {
  const w: ResultWarning = { code, severity, message };
  if (circuits && circuits.length > 0) w.circuits = circuits;
  if (tubes && tubes.length > 0) w.tubes = tubes;
  return w;
}

const listCircuits = (ids: number[]) => (ids.length === 1 ? `circuit ${ids[0]}` : `circuits ${ids.slice(0, 10).join(', ')}${ids.length > 10 ? ', ...' : ''}`);

/** Design warnings of traced circuits (ENGINEERING.md 2.1 T3-T5, 2.3, 2.4, v1 decision 12). */
function circuitWarnings(doc: CoilDocument, circuits: TracedCircuit[]): ResultWarning[] {
  const out: ResultWarning[] = [];
  if (circuits.length === 0) return out;

  const farHairpins = circuits.flatMap((c) => c.bends.filter((b) => b.kind === 'hairpin' && !b.adjacent).map((b) => ({ c: c.index, b })));
  if (farHairpins.length > 0) {
    out.push(warn('hairpin-not-adjacent', 'warning',
      `${farHairpins.length} bend(s) on the opposite end join tubes that are not neighbours; a formed hairpin normally spans one pitch or the next-row neighbour (longer spans need special hairpins or brazed bends)`,
      [...new Set(farHairpins.map((h) => h.c))], farHairpins.flatMap((h) => [h.b.a, h.b.b])));
  }

  const odd = circuits.filter((c) => !c.connectionsSameEnd).map((c) => c.index);
  if (odd.length > 0) {
    out.push(warn('odd-passes', 'warning',
      `${listCircuits(odd)} ${odd.length === 1 ? 'has' : 'have'} an odd number of passes, so the return header sits on the opposite end (a second header there)`, odd));
    out.push(warn('opposite-end-brazed', 'info',
      'the opposite end carries header stubs, so it cannot be a hairpin-only end: its bends must be brazed return bends (T4)', odd));
  }
  const crossOpposite = circuits.filter((c) => c.bends.some((b) => b.kind === 'hairpin' && b.crossover)).map((c) => c.index);
  if (crossOpposite.length > 0) {
    out.push(warn('opposite-end-crossover', 'info', `${listCircuits(crossOpposite)} use crossover bends on the opposite end; those are brazed, not formed hairpins`, crossOpposite));
  }

  const passes = circuits.map((c) => c.passes);
  const minP = Math.min(...passes);
  const maxP = Math.max(...passes);
  if (maxP !== minP) {
    out.push(warn('unequal-passes', maxP - minP > 2 ? 'warning' : 'info',
      `circuits have between ${minP} and ${maxP} passes; longer circuits get less flow, so outlet temperatures differ`,
      circuits.filter((c) => c.passes !== minP).map((c) => c.index)));
  }

  const notCounter = circuits.filter((c) => c.arrangement === 'parallel' || c.arrangement === 'mixed');
  if (notCounter.length > 0) {
    out.push(warn('not-counterflow', 'warning',
      `${listCircuits(notCounter.map((c) => c.index))} ${notCounter.length === 1 ? 'is' : 'are'} not counterflow (water should enter in the air-leaving row and leave in the air-entering row); this costs capacity`,
      notCounter.map((c) => c.index)));
  }

  const lowSupply = circuits.filter((c) => !c.supplyAtBottom).map((c) => c.index);
  if (lowSupply.length > 0) {
    out.push(warn('supply-not-at-bottom', 'info', `${listCircuits(lowSupply)}: the supply is not at the circuit's bottom, so air is not purged upward with the flow`, lowSupply));
  }
  const highReturn = circuits.filter((c) => !c.returnAtTop).map((c) => c.index);
  if (highReturn.length > 0) {
    out.push(warn('return-not-at-top', 'info', `${listCircuits(highReturn)}: the return is not at the circuit's top, so air can collect in the circuit`, highReturn));
  }

  const trapped = circuits.map((c) => ({ c: c.index, tubes: trappedLowPoints(c.tubes) })).filter((t) => t.tubes.length > 0);
  if (trapped.length > 0) {
    const fluid = doc.conditions.fluid;
    const freezing = doc.conditions.minimumAirTemperature_C !== null && doc.conditions.minimumAirTemperature_C < 2 && fluid.kind === 'water';
    out.push(warn('trapped-low-point', freezing ? 'warning' : 'info',
      `${listCircuits(trapped.map((t) => t.c))} ${trapped.length === 1 ? 'has' : 'have'} low points with higher tubes on both sides, so the coil does not drain fully${freezing ? '; with water and freezing entering air, use glycol or keep the pump running' : ''}`,
      trapped.map((t) => t.c), trapped.flatMap((t) => t.tubes)));
  }
  return out;
}
