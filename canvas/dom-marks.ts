/**
 * A keyed layer of SVG marks kept by hand on the web (no React fibers per mark). An edit of a large sheet changes a
 * handful of marks out of a thousand, yet React had to reconcile and compare every one of them; here the layer walks
 * the new marks once, rewrites only the attributes of the marks whose look changed (or rebuilds a mark whose
 * elements changed) and moves nothing that kept its place.
 */
const SVG_NS = 'http://www.w3.org/2000/svg';

/** One SVG element to build: tag, attributes (undefined: left out), text content or child elements. */
export interface MarkSpec {
  tag: string;
  attrs: Record<string, string | number | undefined>;
  text?: string;
  children?: (MarkSpec | null)[];
}

function build(doc: Document, spec: MarkSpec): Element {
  const el = doc.createElementNS(SVG_NS, spec.tag);
  for (const name in spec.attrs) {
    const v = spec.attrs[name];
    if (v !== undefined) el.setAttribute(name, String(v));
  }
  if (spec.text !== undefined) el.textContent = spec.text;
  if (spec.children) for (const c of spec.children) if (c) el.appendChild(build(doc, c));
  return el;
}

export interface MarkEntry<T> { item: T; spec: MarkSpec; node: Element }

const sameShape = (a: MarkSpec | null | undefined, b: MarkSpec | null | undefined): boolean => {
  if (!a || !b) return !a && !b;
  if (a.tag !== b.tag || (a.text === undefined) !== (b.text === undefined)) return false;
  const ac = a.children ?? [];
  const bc = b.children ?? [];
  return ac.length === bc.length && ac.every((c, i) => sameShape(c, bc[i]));
};

/**
 * Brings `el`, built from `was`, in line with `spec` of the same shape: only the attributes and text that differ
 * are written (an edit mostly changes a tube's stroke or fill).
 */
function patch(el: Element, was: MarkSpec, spec: MarkSpec): void {
  for (const name in spec.attrs) {
    const v = spec.attrs[name];
    if (v === was.attrs[name]) continue;
    if (v === undefined) el.removeAttribute(name);
    else el.setAttribute(name, String(v));
  }
  for (const name in was.attrs) if (!(name in spec.attrs) && was.attrs[name] !== undefined) el.removeAttribute(name);
  if (spec.text !== undefined && spec.text !== was.text) el.textContent = spec.text;
  const kids = spec.children ?? [];
  let child = el.firstElementChild;
  kids.forEach((c, i) => {
    if (!c) return;
    patch(child!, was.children![i]!, c);
    child = child!.nextElementSibling;
  });
}

/**
 * Brings the children of `group` in line with `items` (in order). `prev` maps key to what was drawn; items equal by
 * `same` keep their node. Returns the new map, to pass back on the next call.
 */
export function syncMarks<T>(
  group: Element,
  items: readonly T[],
  prev: Map<string, MarkEntry<T>>,
  keyOf: (item: T) => string,
  same: (a: T, b: T) => boolean,
  spec: (item: T) => MarkSpec,
): Map<string, MarkEntry<T>> {
  const doc = group.ownerDocument;
  const next = new Map<string, MarkEntry<T>>();
  let cursor: ChildNode | null = group.firstChild;
  for (const item of items) {
    const key = keyOf(item);
    const old = prev.get(key);
    prev.delete(key);
    let entry: MarkEntry<T>;
    if (old && same(old.item, item)) entry = old;
    else {
      const s = spec(item);
      if (old && sameShape(old.spec, s)) {
        patch(old.node, old.spec, s);
        entry = { item, spec: s, node: old.node };
      } else {
        entry = { item, spec: s, node: build(doc, s) };
        if (old) {
          old.node.replaceWith(entry.node);
          if (cursor === old.node) cursor = entry.node;
        }
      }
    }
    const node = entry.node;
    next.set(key, entry);
    if (node === cursor) cursor = node.nextSibling;
    else group.insertBefore(node, cursor);
  }
  for (const gone of prev.values()) gone.node.remove();
  return next;
}
