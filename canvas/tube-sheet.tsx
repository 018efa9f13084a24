/**
 * The tube sheet drawn to scale in SVG, in layers (ARCHITECTURE.md section 4): the static sheet (fin pack, air
 * arrow, row and tube numbers; drawn once per geometry), the bends and stubs, the tubes (memoised one by one so an
 * edit re-renders only the tubes whose look changed), and the overlay (the bend being drawn).
 */
import { memo } from 'react';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/components/ui/theme';
import type { TubeRef } from '@/lib/engine/types';
import { sheetColours } from './palette';
import { spotOf, type BendMark, type SheetDrawing, type SheetLayout, type StubMark, type TubeLook } from './render-model';

/** Screen pixels per sheet millimetre at zoom 1. */
export const PX_PER_MM = 1.25;

const SheetBase = memo(function SheetBase({ layout }: { layout: SheetLayout }) {
  const { finPack: fp, tubeRadius: r } = layout;
  const arrowY = fp.y - Math.max(layout.transversePitch * 0.9, 14);
  const fontSize = Math.max(r * 0.9, 6);
  const numbers: TubeRef[] = [];
  const step = layout.tubesPerRow <= 24 ? 1 : layout.tubesPerRow <= 48 ? 4 : 6;
  for (let t = 1; t <= layout.tubesPerRow; t += t === 1 && step > 1 ? step - 1 : step) numbers.push({ row: 1, tube: t });
  return (
    <G>
      <Rect x={fp.x} y={fp.y} width={fp.w} height={fp.h} fill={sheetColours.finPack} stroke={sheetColours.finPackEdge} strokeWidth={r * 0.15} rx={r * 0.3} />
      <Line x1={fp.x} y1={arrowY} x2={fp.x + fp.w - r} y2={arrowY} stroke={sheetColours.airArrow} strokeWidth={r * 0.2} />
      <Path
        d={`M${fp.x + fp.w} ${arrowY}L${fp.x + fp.w - r * 1.4} ${arrowY - r * 0.7}L${fp.x + fp.w - r * 1.4} ${arrowY + r * 0.7}Z`}
        fill={sheetColours.airArrow}
      />
      <SvgText x={fp.x} y={arrowY - r * 0.5} fontSize={fontSize} fill={sheetColours.airArrow} fontFamily={fonts.sansMedium}>
        Air
      </SvgText>
      {Array.from({ length: layout.rows }, (_, i) => {
        const s = spotOf(layout, { row: i + 1, tube: 1 })!;
        return (
          <SvgText key={`row-${i}`} x={s.x} y={fp.y - r * 0.35} fontSize={fontSize * 0.85} textAnchor="middle" fill="#4A5A60" fontFamily={fonts.mono}>
            {String(i + 1)}
          </SvgText>
        );
      })}
      {numbers.map((n) => {
        const s = spotOf(layout, n)!;
        return (
          <SvgText key={`tube-${n.tube}`} x={fp.x - r * 0.3} y={s.y + fontSize * 0.3} fontSize={fontSize * 0.8} textAnchor="end" fill="#4A5A60" fontFamily={fonts.mono}>
            {String(n.tube)}
          </SvgText>
        );
      })}
    </G>
  );
});

const sameLook = (a: { look: TubeLook; r: number }, b: { look: TubeLook; r: number }) => {
  const x = a.look;
  const y = b.look;
  return (
    a.r === b.r &&
    x.key === y.key &&
    x.x === y.x &&
    x.y === y.y &&
    x.fill === y.fill &&
    x.stroke === y.stroke &&
    x.strokeWidth === y.strokeWidth &&
    x.dashed === y.dashed &&
    x.label === y.label &&
    x.labelColour === y.labelColour &&
    x.dim === y.dim
  );
};

const Tube = memo(function Tube({ look, r }: { look: TubeLook; r: number }) {
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

const sameRef = (a: TubeRef, b: TubeRef) => a.row === b.row && a.tube === b.tube;

/** Marks are rebuilt on every edit; comparing their fields lets React skip the ones that look the same. */
const sameBend = (p: { bend: BendMark; r: number }, q: { bend: BendMark; r: number }) => {
  const x = p.bend;
  const y = q.bend;
  return (
    p.r === q.r &&
    x.key === y.key &&
    x.d === y.d &&
    x.colour === y.colour &&
    x.faint === y.faint &&
    x.invalid === y.invalid &&
    x.arrow === y.arrow &&
    x.crossover === y.crossover &&
    x.bridge === y.bridge &&
    x.selected === y.selected &&
    sameRef(x.a, y.a) &&
    sameRef(x.b, y.b)
  );
};

const sameStub = (p: { stub: StubMark; r: number }, q: { stub: StubMark; r: number }) => {
  const x = p.stub;
  const y = q.stub;
  return p.r === q.r && x.key === y.key && x.d === y.d && x.head === y.head && x.colour === y.colour && x.faint === y.faint && x.labelX === y.labelX && x.labelY === y.labelY;
};

const Bend = memo(function Bend({ bend, r }: { bend: BendMark; r: number }) {
  const width = bend.faint ? r * 0.35 : r * 0.8;
  const id = `r${bend.a.row}-t${bend.a.tube}-r${bend.b.row}-t${bend.b.tube}`;
  // Crossovers are dashed with long dashes (a second layer); broken bends use short ones.
  const dash = bend.faint ? `${r * 0.5} ${r * 0.4}` : bend.invalid ? `${r * 0.6} ${r * 0.3}` : bend.crossover ? `${r * 1.1} ${r * 0.45}` : undefined;
  return (
    <G opacity={bend.faint ? 0.35 : 1} pointerEvents="none" testID={`bend-${bend.end}-${id}`}>
      {bend.selected ? <Path d={bend.d} stroke={sheetColours.selection} strokeWidth={width + r * 0.7} strokeLinecap="round" fill="none" opacity={0.45} /> : null}
      <Path d={bend.d} stroke={bend.colour} strokeWidth={width} strokeLinecap="round" fill="none" strokeDasharray={dash} />
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

const Stub = memo(function Stub({ stub, r }: { stub: StubMark; r: number }) {
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

export interface TubeSheetProps {
  layout: SheetLayout;
  drawing: SheetDrawing;
  pendingTube: TubeRef | null;
  hover: TubeRef | null;
  dragFrom: TubeRef | null;
  dragTo: { x: number; y: number } | null;
}

/** Memoised: panning and zooming move the wrapper around it and never re-render the drawing. */
export const TubeSheet = memo(function TubeSheet({ layout, drawing, pendingTube, hover, dragFrom, dragTo }: TubeSheetProps) {
  const r = layout.tubeRadius;
  const pending = pendingTube ? spotOf(layout, pendingTube) : undefined;
  const hovered = hover ? spotOf(layout, hover) : undefined;
  const from = dragFrom ? spotOf(layout, dragFrom) : undefined;
  return (
    <Svg
      width={layout.width * PX_PER_MM}
      height={layout.height * PX_PER_MM}
      viewBox={`0 0 ${layout.width} ${layout.height}`}
      testID="tube-sheet"
      accessibilityLabel={`Tube sheet, ${layout.rows} rows by ${layout.tubesPerRow} tubes high`}
    >
      <SheetBase layout={layout} />
      <G>
        {drawing.bends.map((b) => (
          <Bend key={b.key} bend={b} r={r} />
        ))}
      </G>
      <G>
        {drawing.tubes.map((t) => (
          <Tube key={t.key} look={t} r={r} />
        ))}
      </G>
      <G>
        {drawing.stubs.map((s) => (
          <Stub key={s.key} stub={s} r={r} />
        ))}
      </G>
      {hovered ? <Circle cx={hovered.x} cy={hovered.y} r={r * 1.25} fill="none" stroke={sheetColours.selection} strokeWidth={r * 0.12} opacity={0.6} pointerEvents="none" /> : null}
      {pending ? <Circle cx={pending.x} cy={pending.y} r={r * 1.35} fill="none" stroke={sheetColours.pending} strokeWidth={r * 0.3} testID="pending-tube" pointerEvents="none" /> : null}
      {from && dragTo ? (
        <Line x1={from.x} y1={from.y} x2={dragTo.x} y2={dragTo.y} stroke={sheetColours.pending} strokeWidth={r * 0.5} strokeLinecap="round" opacity={0.8} pointerEvents="none" />
      ) : null}
    </Svg>
  );
});
