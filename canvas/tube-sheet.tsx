/**
 * The tube sheet drawn to scale in SVG, in layers (ARCHITECTURE.md section 4): the static sheet (fin pack, air
 * arrow, row and tube numbers; drawn once per geometry), the bends and stubs, the tubes (memoised one by one so an
 * edit re-renders only the tubes whose look changed), and the overlay (the bend being drawn). The marks of the
 * changing layers are in sheet-marks.tsx (react-native-svg) and sheet-marks.web.tsx (plain SVG on the web).
 */
import { memo } from 'react';
import Svg, { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { fonts } from '@/components/ui/theme';
import type { TubeRef } from '@/lib/engine/types';
import { sheetColours } from './palette';
import { spotOf, type SheetDrawing, type SheetLayout } from './render-model';
import { BendLayer, DragLineMark, RingMark, StubLayer, TubeLayer } from './sheet-marks';

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
      <BendLayer bends={drawing.bends} r={r} />
      <TubeLayer tubes={drawing.tubes} r={r} />
      <StubLayer stubs={drawing.stubs} r={r} />
      {hovered ? <RingMark x={hovered.x} y={hovered.y} r={r * 1.25} stroke={sheetColours.selection} strokeWidth={r * 0.12} opacity={0.6} /> : null}
      {pending ? <RingMark x={pending.x} y={pending.y} r={r * 1.35} stroke={sheetColours.pending} strokeWidth={r * 0.3} testID="pending-tube" /> : null}
      {from && dragTo ? <DragLineMark x1={from.x} y1={from.y} x2={dragTo.x} y2={dragTo.y} stroke={sheetColours.pending} strokeWidth={r * 0.5} /> : null}
    </Svg>
  );
});
