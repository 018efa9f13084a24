/**
 * A read-only tube sheet for versions, comparisons and review links: the circuiting drawn from the editor's pure
 * render model (canvas/render-model, read only), scaled to the width it is given, with compare highlights under
 * the bends, comment markers on top, and an optional tap on a tube (to pin a comment).
 */
import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import { sheetAnalysis } from '@/canvas/analysis';
import { sheetColours } from '@/canvas/palette';
import { buildDrawing, buildSheetLayout, spotOf, type SheetLayout } from '@/canvas/render-model';
import { colors, fonts, palette, space, type } from '@/components/ui/theme';
import type { CoilDocument, SolveResult, TubeRef } from '@/lib/engine/types';
import { traceCircuits } from '@/lib/engine/topology';
import type { CommentPin } from '@/lib/schema/api-versions';
import { pinAnchor, type ChangeTone, type SheetHighlight } from '@/components/review/sheet-marks';
import { sheetScale } from '@/components/review/sheet-scale';

export const TONE_COLOURS: Record<ChangeTone, string> = {
  added: palette.green700,
  removed: palette.red700,
  changed: '#B07800',
};

export interface SheetMarker {
  id: string;
  number: number;
  pin: CommentPin;
  resolved: boolean;
}

export interface StaticSheetProps {
  document: CoilDocument;
  result?: SolveResult | null;
  highlights?: readonly SheetHighlight[];
  markers?: readonly SheetMarker[];
  selectedTube?: TubeRef | null;
  onTubePress?: (tube: TubeRef) => void;
  /** Prefix of the tubes' test ids, so two sheets on one page stay apart. */
  testID?: string;
}

export function StaticSheet({ document, result = null, highlights = [], markers = [], selectedTube = null, onTubePress, testID = 'sheet' }: StaticSheetProps) {
  const [width, setWidth] = useState(0);
  const model = useMemo(() => {
    const layout = buildSheetLayout(document.geometry);
    const topology = traceCircuits(document);
    const analysis = sheetAnalysis(topology, result);
    const drawing = buildDrawing(layout, document.circuiting, analysis, {
      face: 'both',
      selection: selectedTube ? { kind: 'tube', tube: selectedTube } : null,
      temperatures: null,
    });
    return { layout, analysis, drawing };
  }, [document, result, selectedTube]);
  const { layout, drawing, analysis } = model;
  const scale = sheetScale(width, layout.width, layout.height);
  const r = layout.tubeRadius;

  return (
    <View
      style={styles.wrap}
      onLayout={(e) => setWidth(Math.floor(e.nativeEvent.layout.width))}
      testID={testID}
      accessibilityLabel={`Tube sheet, ${layout.rows} rows by ${layout.tubesPerRow} tubes high, ${analysis.circuits.length} circuits`}
    >
      {scale > 0 ? (
        <Svg width={layout.width * scale} height={layout.height * scale} viewBox={`0 0 ${layout.width} ${layout.height}`}>
          <SheetFrame layout={layout} />
          <G>
            {highlights.map((h, i) => (
              <HighlightMark key={`h-${i}`} layout={layout} highlight={h} />
            ))}
          </G>
          <G>
            {drawing.bends.map((b) => (
              <G key={b.key} opacity={b.faint ? 0.4 : 1}>
                <Path d={b.d} stroke={b.colour} strokeWidth={b.faint ? r * 0.35 : r * 0.8} strokeLinecap="round" fill="none" strokeDasharray={b.faint ? `${r * 0.5} ${r * 0.4}` : undefined} />
                {b.arrow && !b.faint ? <Path d={b.arrow} fill={palette.ink900} /> : null}
              </G>
            ))}
          </G>
          <G>
            {drawing.tubes.map((t) => (
              <G key={t.key} opacity={t.dim ? 0.45 : 1}>
                <Circle
                  cx={t.x}
                  cy={t.y}
                  r={r}
                  fill={t.fill}
                  stroke={t.stroke}
                  strokeWidth={t.strokeWidth}
                  strokeDasharray={t.dashed ? `${r * 0.35} ${r * 0.25}` : undefined}
                  testID={`${testID}-tube-r${t.row}-t${t.tube}`}
                  onPress={onTubePress ? () => onTubePress({ row: t.row, tube: t.tube }) : undefined}
                />
                {t.label ? (
                  <SvgText x={t.x} y={t.y + r * 0.32} fontSize={r * 0.9} textAnchor="middle" fill={t.labelColour} fontFamily={fonts.monoMedium} pointerEvents="none">
                    {t.label}
                  </SvgText>
                ) : null}
              </G>
            ))}
          </G>
          <G pointerEvents="none">
            {drawing.stubs.map((s) => (
              <G key={s.key} opacity={s.faint ? 0.4 : 1}>
                <Path d={s.d} stroke={s.colour} strokeWidth={r * 0.45} strokeLinecap="round" fill="none" />
                <Path d={s.head} fill={palette.ink900} />
                <SvgText x={s.labelX} y={s.labelY} fontSize={r * 0.85} fill={palette.ink900} fontFamily={fonts.monoMedium}>
                  {s.kind === 'supply' ? 'S' : 'R'}
                </SvgText>
              </G>
            ))}
          </G>
          {selectedTube ? <SelectionRing layout={layout} tube={selectedTube} /> : null}
          <G>
            {markers.map((m, i) => (
              <Marker key={m.id} layout={layout} marker={m} circuits={analysis.circuits} stackIndex={stackIndex(markers, i, analysis.circuits)} testID={`${testID}-marker-${m.number}`} />
            ))}
          </G>
        </Svg>
      ) : null}
      {highlights.length > 0 ? <HighlightLegend tones={[...new Set(highlights.map((h) => h.tone))]} /> : null}
    </View>
  );
}

/** Markers pinned to the same tube are fanned out so each number stays readable. */
function stackIndex(markers: readonly SheetMarker[], i: number, circuits: readonly { index: number; tubes: TubeRef[] }[]): number {
  const key = (m: SheetMarker) => pinAnchor(m.pin, circuits).map((t) => `${t.row}-${t.tube}`).join('|');
  const mine = key(markers[i]);
  return markers.slice(0, i).filter((m) => key(m) === mine).length;
}

function SheetFrame({ layout }: { layout: SheetLayout }) {
  const { finPack: fp, tubeRadius: r } = layout;
  const arrowY = fp.y - Math.max(layout.transversePitch * 0.9, 14);
  const fontSize = Math.max(r * 0.9, 6);
  return (
    <G pointerEvents="none">
      <Rect x={fp.x} y={fp.y} width={fp.w} height={fp.h} fill={sheetColours.finPack} stroke={sheetColours.finPackEdge} strokeWidth={r * 0.15} rx={r * 0.3} />
      <Line x1={fp.x} y1={arrowY} x2={fp.x + fp.w - r} y2={arrowY} stroke={sheetColours.airArrow} strokeWidth={r * 0.2} />
      <Path d={`M${fp.x + fp.w} ${arrowY}L${fp.x + fp.w - r * 1.4} ${arrowY - r * 0.7}L${fp.x + fp.w - r * 1.4} ${arrowY + r * 0.7}Z`} fill={sheetColours.airArrow} />
      <SvgText x={fp.x} y={arrowY - r * 0.5} fontSize={fontSize} fill={sheetColours.airArrow} fontFamily={fonts.sansMedium}>
        Air
      </SvgText>
      {Array.from({ length: layout.rows }, (_, i) => {
        const s = spotOf(layout, { row: i + 1, tube: 1 })!;
        return (
          <SvgText key={`row-${i}`} x={s.x} y={fp.y - r * 0.35} fontSize={fontSize * 0.85} textAnchor="middle" fill={palette.slate600} fontFamily={fonts.mono}>
            {String(i + 1)}
          </SvgText>
        );
      })}
    </G>
  );
}

function HighlightMark({ layout, highlight }: { layout: SheetLayout; highlight: SheetHighlight }) {
  const r = layout.tubeRadius;
  const colour = TONE_COLOURS[highlight.tone];
  const dash = highlight.tone === 'removed' ? `${r * 0.6} ${r * 0.4}` : undefined;
  if (highlight.kind === 'bend') {
    const a = spotOf(layout, highlight.bend.a);
    const b = spotOf(layout, highlight.bend.b);
    if (!a || !b) return null;
    return (
      <G opacity={0.55} pointerEvents="none">
        <Line x1={a.x} y1={a.y} x2={b.x} y2={b.y} stroke={colour} strokeWidth={r * 2.3} strokeLinecap="round" strokeDasharray={dash} />
      </G>
    );
  }
  const s = spotOf(layout, highlight.stub.tube);
  if (!s) return null;
  return <Circle cx={s.x} cy={s.y} r={r * 1.45} fill="none" stroke={colour} strokeWidth={r * 0.45} strokeDasharray={dash} opacity={0.8} pointerEvents="none" />;
}

function SelectionRing({ layout, tube }: { layout: SheetLayout; tube: TubeRef }) {
  const s = spotOf(layout, tube);
  if (!s) return null;
  const r = layout.tubeRadius;
  return <Circle cx={s.x} cy={s.y} r={r * 1.4} fill="none" stroke={colors.focus} strokeWidth={r * 0.35} pointerEvents="none" />;
}

function Marker({
  layout,
  marker,
  circuits,
  stackIndex: k,
  testID,
}: {
  layout: SheetLayout;
  marker: SheetMarker;
  circuits: readonly { index: number; tubes: TubeRef[] }[];
  stackIndex: number;
  testID: string;
}) {
  const anchor = pinAnchor(marker.pin, circuits);
  const spots = anchor.map((t) => spotOf(layout, t)).filter((s) => s !== undefined);
  if (spots.length === 0) return null;
  const x0 = spots.reduce((sum, s) => sum + s.x, 0) / spots.length;
  const y0 = spots.reduce((sum, s) => sum + s.y, 0) / spots.length;
  const r = Math.max(layout.tubeRadius * 1.15, 6);
  const cx = x0 - layout.tubeRadius * 1.2 - k * r * 1.8;
  const cy = y0 - layout.tubeRadius * 1.2;
  const fill = marker.resolved ? palette.slate500 : colors.accent;
  return (
    <G testID={testID} pointerEvents="none" opacity={marker.resolved ? 0.75 : 1}>
      <Path d={`M${cx} ${cy + r * 0.6}L${x0} ${y0}L${cx + r * 0.6} ${cy}Z`} fill={fill} />
      <Circle cx={cx} cy={cy} r={r} fill={fill} stroke={palette.white} strokeWidth={r * 0.18} />
      <SvgText x={cx} y={cy + r * 0.38} fontSize={r * 1.05} textAnchor="middle" fill={palette.white} fontFamily={fonts.monoMedium}>
        {String(marker.number)}
      </SvgText>
    </G>
  );
}

const LEGEND_TEXT: Record<ChangeTone, string> = {
  added: 'Added',
  removed: 'Removed (dashed)',
  changed: 'Changed',
};

function HighlightLegend({ tones }: { tones: ChangeTone[] }) {
  return (
    <View style={styles.legend}>
      {(['added', 'removed', 'changed'] as const)
        .filter((t) => tones.includes(t))
        .map((t) => (
          <View key={t} style={styles.legendItem}>
            <View style={[styles.swatch, { backgroundColor: TONE_COLOURS[t] }]} />
            <Text style={[type.caption, { color: colors.textMuted }]}>{LEGEND_TEXT[t]}</Text>
          </View>
        ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%', alignItems: 'center', gap: space.sm },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignSelf: 'flex-start' },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 14, height: 6, borderRadius: 3 },
});
