/**
 * The hand-kept mark layer of the web sheet (canvas/dom-marks.ts): it must leave the group's children exactly the
 * marks given, in order, rebuild only the marks that changed and keep the nodes of the rest. Run against a minimal
 * stand-in for the DOM (the tests run in Node).
 */
import { describe, expect, it } from 'vitest';
import { syncMarks, type MarkEntry } from '@/canvas/dom-marks';
import { tubeSpec } from '@/canvas/mark-specs';
import type { TubeLook } from '@/canvas/render-model';

class FakeNode {
  parent: FakeNode | null = null;
  children: FakeNode[] = [];
  attrs = new Map<string, string>();
  textContent = '';
  constructor(
    readonly tag: string,
    readonly ownerDocument: FakeDocument,
  ) {}
  get firstChild() {
    return this.children[0] ?? null;
  }
  get nextSibling(): FakeNode | null {
    if (!this.parent) return null;
    const s = this.parent.children;
    return s[s.indexOf(this) + 1] ?? null;
  }
  get firstElementChild() {
    return this.firstChild;
  }
  get nextElementSibling() {
    return this.nextSibling;
  }
  setAttribute(name: string, value: string) {
    this.attrs.set(name, value);
  }
  removeAttribute(name: string) {
    this.attrs.delete(name);
  }
  remove() {
    if (this.parent) this.parent.children.splice(this.parent.children.indexOf(this), 1);
    this.parent = null;
  }
  appendChild(n: FakeNode) {
    return this.insertBefore(n, null);
  }
  insertBefore(n: FakeNode, before: FakeNode | null) {
    n.remove();
    const at = before ? this.children.indexOf(before) : this.children.length;
    this.children.splice(at, 0, n);
    n.parent = this;
    return n;
  }
  replaceWith(n: FakeNode) {
    const p = this.parent!;
    p.insertBefore(n, this);
    this.remove();
  }
  replaceChildren() {
    for (const c of [...this.children]) c.remove();
  }
}
class FakeDocument {
  created = 0;
  createElementNS(_ns: string, tag: string) {
    this.created++;
    return new FakeNode(tag, this);
  }
}

interface Item { key: string; colour: string }
const spec = (i: Item) => ({ tag: 'circle', attrs: { fill: i.colour, 'data-testid': i.key } });
const same = (a: Item, b: Item) => a.colour === b.colour;
const keyOf = (i: Item) => i.key;

function setup() {
  const doc = new FakeDocument();
  const group = new FakeNode('g', doc);
  let drawn = new Map<string, MarkEntry<Item>>();
  const sync = (items: Item[]) => {
    drawn = syncMarks(group as unknown as Element, items, drawn, keyOf, same, spec);
  };
  const shown = () => group.children.map((c) => `${c.attrs.get('data-testid')}:${c.attrs.get('fill')}`);
  return { doc, group, sync, shown };
}

const items = (...xs: string[]) => xs.map((x) => ({ key: x.split(':')[0], colour: x.split(':')[1] }));

describe('syncMarks', () => {
  it('builds every mark once, then rewrites only the attributes of the marks that changed, in place', () => {
    const { doc, group, sync, shown } = setup();
    sync(items('a:red', 'b:red', 'c:red'));
    expect(shown()).toEqual(['a:red', 'b:red', 'c:red']);
    expect(doc.created).toBe(3);
    const [a, b, c] = group.children;
    sync(items('a:red', 'b:blue', 'c:red'));
    expect(shown()).toEqual(['a:red', 'b:blue', 'c:red']);
    expect(doc.created).toBe(3);
    expect(group.children).toEqual([a, b, c]);
  });

  it('removes, inserts and reorders marks by key', () => {
    const { doc, sync, shown } = setup();
    sync(items('a:red', 'b:red', 'c:red', 'd:red'));
    sync(items('a:red', 'c:red', 'd:red'));
    expect(shown()).toEqual(['a:red', 'c:red', 'd:red']);
    sync(items('a:red', 'b:green', 'c:red', 'd:red'));
    expect(shown()).toEqual(['a:red', 'b:green', 'c:red', 'd:red']);
    sync(items('d:red', 'c:blue', 'a:red', 'e:red'));
    expect(shown()).toEqual(['d:red', 'c:blue', 'a:red', 'e:red']);
    sync([]);
    expect(shown()).toEqual([]);
    expect(doc.created).toBe(6);
  });

  it('rebuilds a tube whose elements change (a pass label appears) and patches one whose stroke changes', () => {
    const doc = new FakeDocument();
    const group = new FakeNode('g', doc);
    const base: TubeLook = { key: 'r1-t1', row: 1, tube: 1, x: 10, y: 20, fill: '#E69F00', stroke: '#22313A', strokeWidth: 0.5, dashed: true, label: null, labelColour: '#0E2A33', dim: false };
    const other = { ...base, key: 'r1-t2', y: 40 };
    const sync = (prev: Map<string, MarkEntry<TubeLook>>, looks: TubeLook[]) =>
      syncMarks(group as unknown as Element, looks, prev, (l) => l.key, (x, y) => x === y, (l) => tubeSpec(l, 4));
    let drawn = sync(new Map(), [base, other]);
    const [first, second] = group.children;
    expect(second.children[0].attrs.get('stroke-dasharray')).toBe(`${4 * 0.35} ${4 * 0.25}`);
    drawn = sync(drawn, [{ ...base, label: '2' }, { ...other, stroke: '#A52A1F', dashed: false }]);
    expect(group.children[0]).not.toBe(first);
    expect(group.children[0].children.map((c) => c.tag)).toEqual(['circle', 'text']);
    expect(group.children[0].children[1].textContent).toBe('2');
    expect(group.children[1]).toBe(second);
    expect(second.children[0].attrs.get('stroke')).toBe('#A52A1F');
    expect(second.children[0].attrs.has('stroke-dasharray')).toBe(false);
    expect(drawn.size).toBe(2);
  });
});

describe('tubeSpec', () => {
  const look: TubeLook = { key: 'r1-t2', row: 1, tube: 2, x: 10, y: 20, fill: '#E69F00', stroke: '#22313A', strokeWidth: 0.5, dashed: false, label: '3', labelColour: '#0E2A33', dim: true };
  it('draws the tube as the react-native-svg sheet does: a dimmed group, the circle with its test id, the pass label', () => {
    const s = tubeSpec(look, 4);
    expect(s.attrs.opacity).toBe(0.35);
    const [circle, label] = s.children!;
    expect(circle!.attrs).toMatchObject({ cx: 10, cy: 20, r: 4, fill: '#E69F00', stroke: '#22313A', 'stroke-width': 0.5, 'data-testid': 'tube-r1-t2' });
    expect(circle!.attrs['stroke-dasharray']).toBeUndefined();
    expect(label!.text).toBe('3');
    expect(tubeSpec({ ...look, label: null, dashed: true, dim: false }, 4).children![1]).toBeNull();
  });
});
