/**
 * Field-by-field comparisons of the sheet's marks: the render model rebuilds every mark on every edit, and comparing
 * what they look like lets React skip the ones that did not change (canvas/sheet-marks*.tsx).
 */
import type { TubeRef } from '@/lib/engine/types';
import type { BendMark, StubMark, TubeLook } from './render-model';

export interface TubeMarkProps { look: TubeLook; r: number }
export interface BendMarkProps { bend: BendMark; r: number }
export interface StubMarkProps { stub: StubMark; r: number }

export const sameTubeLook = (x: TubeLook, y: TubeLook): boolean =>
  x === y ||
  (x.key === y.key &&
    x.x === y.x &&
    x.y === y.y &&
    x.fill === y.fill &&
    x.stroke === y.stroke &&
    x.strokeWidth === y.strokeWidth &&
    x.dashed === y.dashed &&
    x.label === y.label &&
    x.labelColour === y.labelColour &&
    x.dim === y.dim);

export const sameLook = (a: TubeMarkProps, b: TubeMarkProps): boolean => a.r === b.r && sameTubeLook(a.look, b.look);

const sameRef = (a: TubeRef, b: TubeRef) => a.row === b.row && a.tube === b.tube;

export const sameBendMark = (x: BendMark, y: BendMark): boolean =>
  x === y ||
  (x.key === y.key &&
    x.d === y.d &&
    x.colour === y.colour &&
    x.faint === y.faint &&
    x.invalid === y.invalid &&
    x.arrow === y.arrow &&
    x.crossover === y.crossover &&
    x.bridge === y.bridge &&
    x.selected === y.selected &&
    sameRef(x.a, y.a) &&
    sameRef(x.b, y.b));

export const sameBend = (p: BendMarkProps, q: BendMarkProps): boolean => p.r === q.r && sameBendMark(p.bend, q.bend);

export const sameStubMark = (x: StubMark, y: StubMark): boolean =>
  x === y || (x.key === y.key && x.kind === y.kind && x.end === y.end && x.d === y.d && x.head === y.head && x.colour === y.colour && x.faint === y.faint && x.labelX === y.labelX && x.labelY === y.labelY);

export const sameStub = (p: StubMarkProps, q: StubMarkProps): boolean => p.r === q.r && sameStubMark(p.stub, q.stub);

/** Test id of a bend's group and of its crossover mark: the face and both tubes as drawn. */
export const bendTestId = (bend: BendMark): string => `r${bend.a.row}-t${bend.a.tube}-r${bend.b.row}-t${bend.b.tube}`;

/** Dash pattern of a bend: crossovers long dashes (a second layer), broken bends short ones, the faint face finer. */
export function bendDash(bend: BendMark, r: number): string | undefined {
  return bend.faint ? `${r * 0.5} ${r * 0.4}` : bend.invalid ? `${r * 0.6} ${r * 0.3}` : bend.crossover ? `${r * 1.1} ${r * 0.45}` : undefined;
}
