/**
 * Mark or unmark an existing bend as a crossover (a bend that passes over others, ENGINEERING.md 2.1 T5). The bend
 * keeps its place in the list; a bend that is not there, or already in the asked state, changes nothing.
 */
import type { CoilDocument, EndFace, TubeRef } from '@/lib/engine/types';
import { sameTube } from './tube-ends';

export interface SetCrossoverArgs { end: EndFace; a: TubeRef; b: TubeRef; crossover: boolean }

export function setCrossover(doc: CoilDocument, { end, a, b, crossover }: SetCrossoverArgs): void {
  const bend = doc.circuiting.bends.find(
    (x) => x.end === end && ((sameTube(x.a, a) && sameTube(x.b, b)) || (sameTube(x.a, b) && sameTube(x.b, a))),
  );
  if (!bend || Boolean(bend.crossover) === crossover) return;
  if (crossover) bend.crossover = true;
  else delete bend.crossover;
}
