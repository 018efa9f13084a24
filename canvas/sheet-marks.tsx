/**
 * The marks of the tube sheet's changing layers (tubes, bends, stubs, overlays), drawn with react-native-svg, each
 * mark memoised so an edit re-renders only the marks whose look changed. The web build uses sheet-marks.web.tsx
 * instead: the same elements, kept by hand (canvas/dom-marks.ts).
 */
import { memo } from 'react';
import { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/components/ui/theme';
import { bendDash, bendTestId, sameBend, sameLook, sameStub, type BendMarkProps, type StubMarkProps, type TubeMarkProps } from './mark-equality';
import { sheetColours } from './palette';
import type { BendMark, StubMark, TubeLook } from './render-model';

export const TubeMark = memo(function TubeMark({ look, r }: TubeMarkProps) {
  return (
    <G opacity={look.dim ? 0.35 : 1}>
      <Circle
        testID={`tube-${look.key}`}
        cx={look.x}
        cy={look.y}
        r={r}
        fill={look.fill}
        stroke={look.stroke}
        strokeWidth={look.strokeWidth}
        strokeDasharray={look.dashed ? `${r * 0.35} ${r * 0.25}` : undefined}
      />
      {look.label ? (
        <SvgText x={look.x} y={look.y + r * 0.32} fontSize={r * 0.9} textAnchor="middle" fill={look.labelColour} fontFamily={fonts.monoMedium} pointerEvents="none">
          {look.label}
        </SvgText>
      ) : null}
    </G>
  );
}, sameLook);

export const BendMarkShape = memo(function BendMarkShape({ bend, r }: BendMarkProps) {
  const width = bend.faint ? r * 0.35 : r * 0.8;
  const id = bendTestId(bend);
  return (
    <G opacity={bend.faint ? 0.35 : 1} pointerEvents="none" testID={`bend-${bend.end}-${id}`}>
      {bend.selected ? <Path d={bend.d} stroke={sheetColours.selection} strokeWidth={width + r * 0.7} strokeLinecap="round" fill="none" opacity={0.45} /> : null}
      <Path d={bend.d} stroke={bend.colour} strokeWidth={width} strokeLinecap="round" fill="none" strokeDasharray={bendDash(bend, r)} />
      {bend.bridge ? (
        <G testID={`crossover-${bend.end}-${id}`}>
          <Path d={bend.bridge} stroke="#FFFFFF" strokeWidth={r * 0.55} fill="none" strokeLinecap="round" />
          <Path d={bend.bridge} stroke={bend.faint ? bend.colour : '#0E2A33'} strokeWidth={r * 0.25} fill="none" strokeLinecap="round" />
        </G>
      ) : null}
      {bend.arrow && !bend.faint ? <Path d={bend.arrow} fill="#0E2A33" /> : null}
    </G>
  );
}, sameBend);

export const StubMarkShape = memo(function StubMarkShape({ stub, r }: StubMarkProps) {
  return (
    <G opacity={stub.faint ? 0.35 : 1} pointerEvents="none" testID={`stub-${stub.kind}-${stub.key.split(':')[2]}`}>
      <Path d={stub.d} stroke={stub.colour} strokeWidth={r * 0.45} strokeLinecap="round" fill="none" />
      <Path d={stub.head} fill="#0E2A33" />
      <SvgText x={stub.labelX} y={stub.labelY} fontSize={r * 0.85} fill="#0E2A33" fontFamily={fonts.monoMedium}>
        {stub.kind === 'supply' ? 'S' : 'R'}
      </SvgText>
    </G>
  );
}, sameStub);

/** The layers of marks, each a group, in drawing order: bends, then tubes, then header stubs. */
export function BendLayer({ bends, r }: { bends: BendMark[]; r: number }) {
  return (
    <G>
      {bends.map((b) => (
        <BendMarkShape key={b.key} bend={b} r={r} />
      ))}
    </G>
  );
}

export function TubeLayer({ tubes, r }: { tubes: TubeLook[]; r: number }) {
  return (
    <G>
      {tubes.map((t) => (
        <TubeMark key={t.key} look={t} r={r} />
      ))}
    </G>
  );
}

export function StubLayer({ stubs, r }: { stubs: StubMark[]; r: number }) {
  return (
    <G>
      {stubs.map((s) => (
        <StubMarkShape key={s.key} stub={s} r={r} />
      ))}
    </G>
  );
}

/** A ring around a tube (hover, pending first tube of a bend). */
export function RingMark(p: { x: number; y: number; r: number; stroke: string; strokeWidth: number; opacity?: number; testID?: string }) {
  return <Circle cx={p.x} cy={p.y} r={p.r} fill="none" stroke={p.stroke} strokeWidth={p.strokeWidth} opacity={p.opacity} testID={p.testID} pointerEvents="none" />;
}

/** The rubber band of a bend being dragged. */
export function DragLineMark(p: { x1: number; y1: number; x2: number; y2: number; stroke: string; strokeWidth: number }) {
  return <Line x1={p.x1} y1={p.y1} x2={p.x2} y2={p.y2} stroke={p.stroke} strokeWidth={p.strokeWidth} strokeLinecap="round" opacity={0.8} pointerEvents="none" />;
}
