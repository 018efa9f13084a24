/** The editor's toolbar: drawing tools, the end face shown, undo/redo, fit, temperature colours and help. */
import { memo, useMemo } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';
import type { FaceShown, Tool } from './session';

/** Memoised, with stable handlers: an edit flips Undo and Redo, and only those buttons re-render. */
const ToolButton = memo(function ToolButton({ label, hint, active = false, disabled = false, compact = false, onPress, testID }: { label: string; hint: string; active?: boolean; disabled?: boolean; compact?: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="button"
      accessibilityLabel={hint}
      aria-pressed={active}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [styles.btn, compact && styles.btnCompact, active && styles.btnOn, pressed && !active && styles.btnPressed, disabled && styles.btnOff]}
    >
      <Text numberOfLines={1} style={[type.smallStrong, { color: active ? colors.textOnDark : colors.text }]}>
        {label}
      </Text>
    </Pressable>
  );
});

const tools: { tool: Tool; label: string; hint: string }[] = [
  { tool: 'bend', label: 'Bend', hint: 'Bend tool: tap two tubes or drag from one to the other (B)' },
  { tool: 'supply', label: 'Supply', hint: 'Supply stub tool (S)' },
  { tool: 'return', label: 'Return', hint: 'Return stub tool (R)' },
  { tool: 'erase', label: 'Erase', hint: 'Erase tool: tap a tube end to remove its bend or stub (E)' },
  { tool: 'select', label: 'Select', hint: 'Select tool: tap a tube to see its circuit (V)' },
];

const faces: { face: FaceShown; label: string; short: string; hint: string }[] = [
  { face: 'connection', label: 'Connection end', short: 'Connection', hint: 'Show the connection end (headers and return bends)' },
  { face: 'opposite', label: 'Opposite end', short: 'Opposite', hint: 'Show the opposite end (hairpins)' },
  { face: 'both', label: 'Both', short: 'Both', hint: 'Show both ends, the opposite end faint; drawing acts on the connection end' },
];

export interface ToolbarProps {
  tool: Tool;
  face: FaceShown;
  canUndo: boolean;
  canRedo: boolean;
  temperature: boolean;
  temperatureAvailable: boolean;
  onTool: (t: Tool) => void;
  onFace: (f: FaceShown) => void;
  onUndo: () => void;
  onRedo: () => void;
  onFit: () => void;
  onTemperature: () => void;
  onHelp?: () => void;
  /** Phones: short labels and tighter buttons; the groups wrap onto a second line rather than scroll sideways. */
  compact?: boolean;
}

export const EditorToolbar = memo(function EditorToolbar(p: ToolbarProps) {
  const c = p.compact ?? false;
  const { onTool, onFace } = p;
  const onToolPress = useMemo(() => new Map(tools.map((t) => [t.tool, () => onTool(t.tool)])), [onTool]);
  const onFacePress = useMemo(() => new Map(faces.map((f) => [f.face, () => onFace(f.face)])), [onFace]);
  return (
    <View style={[styles.bar, c && styles.barCompact]} accessibilityLabel="Editor tools" testID="editor-toolbar">
      <View style={styles.group} role="toolbar" accessibilityLabel="Drawing tools">
        {tools.map((t) => (
          <ToolButton key={t.tool} compact={c} label={t.label} hint={t.hint} active={p.tool === t.tool} onPress={onToolPress.get(t.tool)!} testID={`tool-${t.tool}`} />
        ))}
      </View>
      <View style={styles.group} role="toolbar" accessibilityLabel="End face shown">
        {faces.map((f) => (
          <ToolButton key={f.face} compact={c} label={c ? f.short : f.label} hint={f.hint} active={p.face === f.face} onPress={onFacePress.get(f.face)!} testID={`face-${f.face}`} />
        ))}
      </View>
      <View style={styles.group}>
        <ToolButton compact={c} label="Undo" hint="Undo (Ctrl/Cmd+Z)" disabled={!p.canUndo} onPress={p.onUndo} testID="undo" />
        <ToolButton compact={c} label="Redo" hint="Redo (Shift+Ctrl/Cmd+Z)" disabled={!p.canRedo} onPress={p.onRedo} testID="redo" />
        <ToolButton compact={c} label="Fit" hint="Fit the sheet to the screen (0)" onPress={p.onFit} testID="fit" />
        <ToolButton
          compact={c}
          label={c ? 'Temps' : 'Temperatures'}
          hint={p.temperatureAvailable ? 'Colour tubes by mean water temperature (T)' : 'Temperature colours need a valid, solved circuiting'}
          active={p.temperature}
          disabled={!p.temperatureAvailable}
          onPress={p.onTemperature}
          testID="overlay-temperature"
        />
        {p.onHelp ? <ToolButton label="Keys" hint="Keyboard shortcuts (?)" onPress={p.onHelp} testID="shortcuts-help" /> : null}
      </View>
    </View>
  );
});

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, padding: space.sm, backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.border },
  barCompact: { gap: space.xs, padding: space.xs },
  group: { flexDirection: 'row', flexWrap: 'wrap', flexShrink: 1, maxWidth: '100%', gap: space.xxs, padding: space.xxs, borderRadius: radius.sm, backgroundColor: colors.surfaceMuted },
  btn: { minHeight: 36, minWidth: 36, paddingHorizontal: space.sm, justifyContent: 'center', alignItems: 'center', borderRadius: radius.sm - 2 },
  btnCompact: { paddingHorizontal: space.xs + 2 },
  btnOn: { backgroundColor: colors.primary },
  btnPressed: { backgroundColor: colors.border },
  btnOff: { opacity: 0.45 },
});
