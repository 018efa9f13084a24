/**
 * The circuit editor: toolbar, the tube sheet in a pan/zoom viewport, the temperature legend and the tube read-out.
 * Results come in as props (the workspace fetches them); the editor only draws and dispatches commands.
 */
import { memo, useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import { colors, space, type } from '@/components/ui/theme';
import { Sheet } from '@/components/ui/sheet';
import type { Bend, CoilDocument, EndFace, SolveResult, TubeRef } from '@/lib/engine/types';
import { sheetAnalysis, tubeTemperatures } from './analysis';
import { viridis } from './colormap';
import { buildDrawing, buildSheetLayout, tubeKey } from './render-model';
import { activeFace, type FaceShown, type Selection, type Tool } from './session';
import { shortcutFor, shortcutTable } from './shortcuts';
import type { EditorStore } from './store';
import { EditorToolbar } from './toolbar';
import { PX_PER_MM, TubeSheet } from './tube-sheet';
import { useEditor, useView } from './use-editor';
import { useSheetGestures } from './use-sheet-gestures';
import { traceOf } from './trace-cache';
import { createViewStore, fitView } from './view-store';

export interface CircuitEditorProps {
  store: EditorStore;
  /** A solve result, or null (none yet, stale, or invalid). */
  result: SolveResult | null;
  /**
   * The document `result` was solved for. The editor draws the store's document at once, ahead of the workspace
   * (which follows in a deferred render), so it shows `result` only while that is the document on screen.
   */
  resultDocument: CoilDocument | null;
  formatTemperature: (celsius: number) => string;
  /** Keyboard shortcuts are offered on wide screens. */
  keyboard: boolean;
}

export function CircuitEditor({ store, result: resultGiven, resultDocument, formatTemperature, keyboard }: CircuitEditorProps) {
  const view = useMemo(() => createViewStore(), []);
  const document = useEditor(store, (s) => s.document);
  const { geometry, circuiting } = document;
  // The trace is cached per document, so the live solve reuses it when the workspace catches up.
  const topology = traceOf(document);
  const result = resultDocument === document ? resultGiven : null;
  const session = useEditor(store, (s) => s.session);
  const canUndo = useEditor(store, (s) => s.past.length > 0);
  const canRedo = useEditor(store, (s) => s.future.length > 0);
  const { zoom, panX, panY, dragTo, hover } = useView(view, (s) => s);
  const [dragFrom, setDragFrom] = useState<TubeRef | null>(null);
  const [temperatureOn, setTemperatureOn] = useState(false);
  const [helpOpen, setHelpOpen] = useState(false);
  const viewportRef = useRef<View>(null);
  const viewportSize = useRef({ w: 0, h: 0 });

  const layout = useMemo(() => buildSheetLayout(geometry), [geometry]);
  const temperatures = useMemo(() => tubeTemperatures(result), [result]);
  const analysis = useMemo(() => sheetAnalysis(topology, result), [topology, result]);
  const drawing = useMemo(
    () => buildDrawing(layout, circuiting, analysis, { face: session.face, selection: session.selection, temperatures: temperatureOn ? temperatures : null }),
    [layout, circuiting, analysis, session.face, session.selection, temperatureOn, temperatures],
  );

  const fit = useCallback(() => {
    const { w, h } = viewportSize.current;
    if (w > 0 && h > 0) view.getState().setView(fitView(layout.width * PX_PER_MM, layout.height * PX_PER_MM, w, h));
  }, [layout, view]);
  useEffect(fit, [fit]); // a new geometry re-fits

  const onLayout = (e: LayoutChangeEvent) => {
    const { width, height } = e.nativeEvent.layout;
    const first = viewportSize.current.w === 0;
    viewportSize.current = { w: width, h: height };
    if (first) fit();
  };

  const gestures = useSheetGestures(store, view, layout, viewportRef, setDragFrom);

  useEffect(() => {
    if (!keyboard || Platform.OS !== 'web' || typeof window === 'undefined') return;
    const onKey = (e: KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      if (target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.isContentEditable)) return;
      const action = shortcutFor(e);
      if (!action) return;
      e.preventDefault();
      const s = store.getState();
      switch (action.kind) {
        case 'tool':
          s.setTool(action.tool);
          break;
        case 'switch-face':
          s.setFace(s.session.face === 'connection' ? 'opposite' : 'connection');
          break;
        case 'overlay-faces':
          s.setFace(s.session.face === 'both' ? 'connection' : 'both');
          break;
        case 'temperature':
          setTemperatureOn((on) => !on);
          break;
        case 'fit':
          fit();
          break;
        case 'undo':
          s.undo();
          break;
        case 'redo':
          s.redo();
          break;
        case 'cancel':
          gestures.cancel();
          break;
        case 'help':
          setHelpOpen(true);
          break;
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [keyboard, store, fit, gestures]);

  // Stable handlers, so the memoised toolbar skips the re-render of an edit.
  const toolbarActions = useMemo(
    () => ({
      onTool: (t: Tool) => store.getState().setTool(t),
      onFace: (f: FaceShown) => store.getState().setFace(f),
      onUndo: () => store.getState().undo(),
      onRedo: () => store.getState().redo(),
      onTemperature: () => setTemperatureOn((on) => !on),
      onHelp: () => setHelpOpen(true),
    }),
    [store],
  );
  const infoTube =
    session.selection?.kind === 'tube' ? session.selection.tube : session.selection?.kind === 'bend' ? null : (session.pendingTube ?? hover);
  const readoutBend = useMemo(
    () => selectedBend(session.selection, circuiting.bends, activeFace(session.face)),
    [session.selection, circuiting.bends, session.face],
  );
  const onCrossover = useCallback(
    (bend: BendRef, crossover: boolean) => store.getState().dispatch('setCrossover', { end: bend.end, a: bend.a, b: bend.b, crossover }),
    [store],
  );
  const showTemperature = temperatureOn && drawing.temperatureRange !== null;
  // Stable props for the viewport and its wrapper, so an edit does not make react-native-web re-resolve them.
  const pointerHandlers = useMemo(
    () =>
      ({
        onPointerDown: gestures.onPointerDown,
        onPointerMove: gestures.onPointerMove,
        onPointerUp: gestures.onPointerUp,
        onPointerCancel: gestures.onPointerCancel,
        onPointerLeave: () => view.getState().setHover(null),
      }) as object,
    [gestures, view],
  );
  const wrapperStyle = useMemo(() => [styles.wrapper, { transform: [{ translateX: panX }, { translateY: panY }, { scale: zoom }] }], [panX, panY, zoom]);
  const readout = useMemo(() => readoutText(infoTube, session.tool === 'select' ? readoutBend : null, session.selection?.kind === 'bend', drawing, temperatures, formatTemperature), [
    infoTube,
    session.tool,
    readoutBend,
    session.selection,
    drawing,
    temperatures,
    formatTemperature,
  ]);

  return (
    <View style={styles.root} testID="circuit-editor">
      <EditorToolbar
        tool={session.tool}
        face={session.face}
        canUndo={canUndo}
        canRedo={canRedo}
        temperature={showTemperature}
        temperatureAvailable={temperatures !== null}
        onTool={toolbarActions.onTool}
        onFace={toolbarActions.onFace}
        onUndo={toolbarActions.onUndo}
        onRedo={toolbarActions.onRedo}
        onFit={fit}
        onTemperature={toolbarActions.onTemperature}
        onHelp={keyboard ? toolbarActions.onHelp : undefined}
        compact={!keyboard}
      />
      <View
        ref={viewportRef}
        style={styles.viewport}
        onLayout={onLayout}
        testID="sheet-viewport"
        {...pointerHandlers}
      >
        <View style={wrapperStyle}>
          <TubeSheet layout={layout} drawing={drawing} pendingTube={session.pendingTube} hover={hover} dragFrom={dragFrom} dragTo={dragTo} />
        </View>
        <Text style={[type.caption, styles.faceTag]} pointerEvents="none" testID="face-shown">
          {session.face === 'connection' ? 'Connection end' : session.face === 'opposite' ? 'Opposite end' : 'Both ends (opposite end faint)'}
        </Text>
        {showTemperature && drawing.temperatureRange ? (
          <TemperatureLegend min={drawing.temperatureRange.min} max={drawing.temperatureRange.max} format={formatTemperature} />
        ) : null}
      </View>
      <TubeReadout text={readout.text} detailed={readout.detailed} bend={session.tool === 'select' ? readoutBend : null} onCrossover={onCrossover} />
      {keyboard ? (
        <Sheet open={helpOpen} title="Keyboard shortcuts" onClose={() => setHelpOpen(false)} testID="shortcuts-sheet">
          {shortcutTable.map((s) => (
            <View key={s.keys} style={styles.keyRow}>
              <Text style={[type.number, styles.keyCell]}>{s.keys}</Text>
              <Text style={[type.small, styles.keyWhat]}>{s.what}</Text>
            </View>
          ))}
        </Sheet>
      ) : null}
    </View>
  );
}

type BendRef = { end: EndFace; a: TubeRef; b: TubeRef; crossover?: boolean };

const endWords: Record<EndFace, string> = { connection: 'connection end', opposite: 'opposite end' };
const tubeWords = (t: TubeRef) => `row ${t.row} tube ${t.tube}`;

/** The bend a selection points at: the picked bend, or the bend on the face being drawn at the picked tube. */
function selectedBend(selection: Selection, bends: Bend[], face: EndFace): BendRef | null {
  if (selection?.kind === 'bend') {
    return bends.find((b) => b.end === selection.end && sameTubeEnds(b, selection.a, selection.b)) ?? null;
  }
  if (selection?.kind === 'tube') {
    const t = selection.tube;
    return bends.find((b) => b.end === face && (sameRef(b.a, t) || sameRef(b.b, t))) ?? null;
  }
  return null;
}
const sameRef = (x: TubeRef, y: TubeRef) => x.row === y.row && x.tube === y.tube;
const sameTubeEnds = (b: Bend, a: TubeRef, c: TubeRef) => (sameRef(b.a, a) && sameRef(b.b, c)) || (sameRef(b.a, c) && sameRef(b.b, a));

/** The read-out line: the tube's circuit, pass and water temperatures, or the picked bend, or a hint. */
function readoutText(
  tube: TubeRef | null,
  bend: BendRef | null,
  bendPicked: boolean,
  drawing: ReturnType<typeof buildDrawing>,
  temperatures: ReturnType<typeof tubeTemperatures>,
  format: (c: number) => string,
): { text: string; detailed: boolean } {
  const parts: string[] = [];
  if (tube) {
    const key = tubeKey(tube);
    const place = drawing.place.get(key);
    const t = temperatures?.get(key);
    parts.push(`Row ${tube.row}, tube ${tube.tube}`);
    parts.push(place ? `circuit ${place.circuit}, pass ${place.pass}` : 'not in a complete circuit');
    if (t?.waterIn_C !== undefined && t.waterOut_C !== undefined) parts.push(`water in ${format(t.waterIn_C)}, out ${format(t.waterOut_C)}`);
  } else if (bend && bendPicked) {
    parts.push(`Bend ${tubeWords(bend.a)} to ${tubeWords(bend.b)}, ${endWords[bend.end]}${bend.crossover ? ', crossover' : ''}`);
  }
  const text = parts.length > 0 ? parts.join(' · ') : 'Tap a tube with Select to see its circuit and water temperatures; tap a bend to mark it as a crossover.';
  return { text, detailed: parts.length > 0 };
}

/** Memoised on the text: most edits leave the read-out as it was. */
const TubeReadout = memo(function TubeReadout({
  text,
  detailed,
  bend,
  onCrossover,
}: {
  text: string;
  /** True when the text describes a tube or bend (not the hint). */
  detailed: boolean;
  /** A bend to offer the crossover mark for (Select tool), or null. */
  bend: BendRef | null;
  onCrossover: (bend: BendRef, crossover: boolean) => void;
}) {
  return (
    <View style={styles.readoutBar}>
      <Text style={[detailed ? type.small : type.caption, styles.readout]} testID="tube-readout" accessibilityLiveRegion="polite">
        {text}
      </Text>
      {bend ? (
        <Pressable
          role="button"
          onPress={() => onCrossover(bend, !bend.crossover)}
          style={({ pressed }) => [styles.readoutButton, pressed && { backgroundColor: colors.border }]}
          accessibilityLabel={`${bend.crossover ? 'Unmark' : 'Mark'} the bend ${tubeWords(bend.a)} to ${tubeWords(bend.b)} on the ${endWords[bend.end]} as a crossover`}
          testID="toggle-crossover"
        >
          <Text style={[type.smallStrong, { color: colors.primary }]}>{bend.crossover ? 'Unmark crossover' : 'Mark as crossover'}</Text>
        </Pressable>
      ) : null}
    </View>
  );
});

function TemperatureLegend({ min, max, format }: { min: number; max: number; format: (c: number) => string }) {
  const steps = 10;
  return (
    <View style={styles.legend} pointerEvents="none" testID="temperature-legend" accessibilityLabel={`Mean water temperature from ${format(min)} to ${format(max)}`}>
      <Text style={[type.caption, { color: colors.text }]}>Mean water temperature</Text>
      <View style={styles.legendBar}>
        {Array.from({ length: steps }, (_, i) => (
          <View key={i} style={{ flex: 1, backgroundColor: viridis(i / (steps - 1)) }} />
        ))}
      </View>
      <View style={styles.legendEnds}>
        <Text style={[type.number, styles.legendText]}>{format(min)}</Text>
        <Text style={[type.number, styles.legendText]}>{format(max)}</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, minHeight: 0, backgroundColor: colors.background },
  viewport: { flex: 1, minHeight: 120, overflow: 'hidden', position: 'relative', backgroundColor: '#FBFAF7', touchAction: 'none', cursor: 'crosshair' } as object,
  wrapper: { position: 'absolute', left: 0, top: 0, transformOrigin: '0 0' } as object,
  faceTag: { position: 'absolute', right: space.sm, top: space.sm, color: colors.textMuted, backgroundColor: 'rgba(255,255,255,0.85)', paddingHorizontal: space.xs },
  readoutBar: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.sm, paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.surface, borderTopWidth: 1, borderTopColor: colors.border },
  readout: { flexGrow: 1, flexShrink: 1, flexBasis: 200, paddingVertical: space.xs, color: colors.text },
  readoutButton: { minHeight: 36, justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: 4, borderWidth: 1, borderColor: colors.border },
  legend: { position: 'absolute', left: space.sm, bottom: space.sm, width: 200, padding: space.sm, backgroundColor: 'rgba(255,255,255,0.92)', borderRadius: 6, gap: space.xxs },
  legendBar: { flexDirection: 'row', height: 10, borderRadius: 2, overflow: 'hidden' },
  legendEnds: { flexDirection: 'row', justifyContent: 'space-between' },
  legendText: { fontSize: 12, color: colors.text },
  keyRow: { flexDirection: 'row', gap: space.md, paddingVertical: space.xs },
  keyCell: { width: 150, color: colors.text },
  keyWhat: { flex: 1, color: colors.text },
});
