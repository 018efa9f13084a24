/**
 * The marks of the tube sheet's changing layers on the web. The tubes, bends and stubs are kept by hand in their
 * SVG groups (canvas/dom-marks.ts, built from canvas/mark-specs.ts): on a 12 x 60 sheet React had a thousand mark
 * components to reconcile and compare on every edit, and a stale result clearing its warnings re-rendered a hundred
 * or more through react-native-svg. The overlays stay React elements. Same elements, attributes and test ids as
 * sheet-marks.tsx.
 */
import { useLayoutEffect, useRef } from 'react';
import { syncMarks, type MarkEntry, type MarkSpec } from './dom-marks';
import { sameBendMark, sameStubMark, sameTubeLook } from './mark-equality';
import { bendSpec, stubSpec, tubeSpec } from './mark-specs';
import type { BendMark, StubMark, TubeLook } from './render-model';

/** A group whose children follow `items`; a new tube radius redraws them all. */
function useMarkGroup<T>(items: readonly T[], r: number, keyOf: (item: T) => string, same: (a: T, b: T) => boolean, spec: (item: T, r: number) => MarkSpec) {
  const ref = useRef<SVGGElement>(null);
  const drawn = useRef<{ r: number; marks: Map<string, MarkEntry<T>> }>({ r: Number.NaN, marks: new Map() });
  useLayoutEffect(() => {
    const group = ref.current;
    if (!group) return;
    const d = drawn.current;
    if (d.r !== r) {
      group.replaceChildren();
      d.marks = new Map();
    }
    d.marks = syncMarks(group, items, d.marks, keyOf, same, (item) => spec(item, r));
    d.r = r;
    // keyOf, same and spec are module-level functions
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [items, r]);
  return ref;
}

const keyOfMark = (m: { key: string }) => m.key;

export function BendLayer({ bends, r }: { bends: BendMark[]; r: number }) {
  return <g ref={useMarkGroup(bends, r, keyOfMark, sameBendMark, bendSpec)} />;
}

export function TubeLayer({ tubes, r }: { tubes: TubeLook[]; r: number }) {
  return <g ref={useMarkGroup(tubes, r, keyOfMark, sameTubeLook, tubeSpec)} />;
}

export function StubLayer({ stubs, r }: { stubs: StubMark[]; r: number }) {
  return <g ref={useMarkGroup(stubs, r, keyOfMark, sameStubMark, stubSpec)} />;
}

/** A ring around a tube (hover, pending first tube of a bend). */
export function RingMark(p: { x: number; y: number; r: number; stroke: string; strokeWidth: number; opacity?: number; testID?: string }) {
  return <circle cx={p.x} cy={p.y} r={p.r} fill="none" stroke={p.stroke} strokeWidth={p.strokeWidth} opacity={p.opacity} data-testid={p.testID} pointerEvents="none" />;
}

/** The rubber band of a bend being dragged. */
export function DragLineMark(p: { x1: number; y1: number; x2: number; y2: number; stroke: string; strokeWidth: number }) {
  return <line x1={p.x1} y1={p.y1} x2={p.x2} y2={p.y2} stroke={p.stroke} strokeWidth={p.strokeWidth} strokeLinecap="round" opacity={0.8} pointerEvents="none" />;
}
