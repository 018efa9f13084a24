/**
 * What changed in the drawing and the settings between two coil documents. A bend is identified by its end face and
 * the unordered pair of tubes it joins (so a bend drawn b->a equals a->b); it "changed" when only its crossover flag
 * differs. A stub is identified by header (supply/return) and tube; it "changed" when it moved to the other end face.
 */
import type { Bend, CoilDocument, Stub, TubeRef } from '@/lib/engine/types';
import type { CompareReply, SettingDifference, TaggedStub } from '@/lib/schema/api-versions';

type Scalar = string | number | boolean | null;

const tubeKey = (t: TubeRef) => `${t.row}.${t.tube}`;

function bendKey(b: Bend): string {
  const [first, second] = [tubeKey(b.a), tubeKey(b.b)].sort();
  return `${b.end}|${first}|${second}`;
}

const stubKey = (s: TaggedStub) => `${s.kind}|${tubeKey(s.stub.tube)}`;

function diffByKey<T>(before: T[], after: T[], key: (item: T) => string, same: (x: T, y: T) => boolean) {
  const old = new Map(before.map((item) => [key(item), item]));
  const next = new Map(after.map((item) => [key(item), item]));
  const added = after.filter((item) => !old.has(key(item)));
  const removed = before.filter((item) => !next.has(key(item)));
  const changed: { before: T; after: T }[] = [];
  for (const [k, item] of next) {
    const prior = old.get(k);
    if (prior !== undefined && !same(prior, item)) changed.push({ before: prior, after: item });
  }
  return { added, removed, changed };
}

const tagged = (doc: CoilDocument): TaggedStub[] => [
  ...doc.circuiting.supply.map((stub: Stub) => ({ kind: 'supply' as const, stub })),
  ...doc.circuiting.return.map((stub: Stub) => ({ kind: 'return' as const, stub })),
];

/** Scalar leaves of a plain JSON value, keyed by dotted path (arrays by index). */
function leaves(value: unknown, path: string, out: Map<string, Scalar>): Map<string, Scalar> {
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) leaves(v, path ? `${path}.${k}` : k, out);
  } else if (value === null || ['string', 'number', 'boolean'].includes(typeof value)) {
    out.set(path, value as Scalar);
  }
  return out;
}

function settingsOf(doc: CoilDocument): Map<string, Scalar> {
  const out = new Map<string, Scalar>();
  out.set('name', doc.name);
  leaves(doc.geometry, 'geometry', out);
  leaves(doc.conditions, 'conditions', out);
  leaves(doc.options ?? {}, 'options', out);
  return out;
}

export function compareSettings(a: CoilDocument, b: CoilDocument): SettingDifference[] {
  const sa = settingsOf(a);
  const sb = settingsOf(b);
  const paths = [...new Set([...sa.keys(), ...sb.keys()])];
  return paths
    .filter((p) => sa.get(p) !== sb.get(p))
    .map((path) => ({ path, a: sa.get(path) ?? null, b: sb.get(path) ?? null }));
}

export function compareDrawings(a: CoilDocument, b: CoilDocument): Pick<CompareReply, 'bends' | 'stubs' | 'settings'> {
  return {
    bends: diffByKey(a.circuiting.bends, b.circuiting.bends, bendKey, (x, y) => Boolean(x.crossover) === Boolean(y.crossover)),
    stubs: diffByKey(tagged(a), tagged(b), stubKey, (x, y) => x.stub.end === y.stub.end),
    settings: compareSettings(a, b),
  };
}
