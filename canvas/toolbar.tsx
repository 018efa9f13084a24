/** The editor's toolbar: drawing tools, the end face shown, undo/redo, fit, temperature colours and help. */
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/components/ui/theme';
import type { FaceShown, Tool } from './session';

function ToolButton({ label, hint, active = false, disabled = false, onPress, testID }: { label: string; hint: string; active?: boolean; disabled?: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable
      role="button"
      accessibilityLabel={hint}
      aria-pressed={active}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [styles.btn, active && styles.btnOn, pressed && !active && styles.btnPressed, disabled && styles.btnOff]}
    >
      <Text numberOfLines={1} style={[type.smallStrong, { color: active ? colors.textOnDark : colors.text }]}>
        {label}
      </Text>
    </Pressable>
  );
}

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
  /** Phones: one row that scrolls sideways inside the bar, so the sheet keeps the height. */
  compact?: boolean;
}

export function EditorToolbar(p: ToolbarProps) {
  const groups = (
    <>
      <View style={styles.group} role="toolbar" accessibilityLabel="Drawing tools">
        {tools.map((t) => (
          <ToolButton key={t.tool} label={t.label} hint={t.hint} active={p.tool === t.tool} onPress={() => p.onTool(t.tool)} testID={`tool-${t.tool}`} />
        ))}
      </View>
      <View style={styles.group} role="toolbar" accessibilityLabel="End face shown">
        {faces.map((f) => (
          <ToolButton key={f.face} label={p.compact ? f.short : f.label} hint={f.hint} active={p.face === f.face} onPress={() => p.onFace(f.face)} testID={`face-${f.face}`} />
        ))}
      </View>
      <View style={styles.group}>
        <ToolButton label="Undo" hint="Undo (Ctrl/Cmd+Z)" disabled={!p.canUndo} onPress={p.onUndo} testID="undo" />
        <ToolButton label="Redo" hint="Redo (Shift+Ctrl/Cmd+Z)" disabled={!p.canRedo} onPress={p.onRedo} testID="redo" />
        <ToolButton label="Fit" hint="Fit the sheet to the screen (0)" onPress={p.onFit} testID="fit" />
        <ToolButton
          label="Temperatures"
          hint={p.temperatureAvailable ? 'Colour tubes by mean water temperature (T)' : 'Temperature colours need a valid, solved circuiting'}
          active={p.temperature}
          disabled={!p.temperatureAvailable}
          onPress={p.onTemperature}
          testID="overlay-temperature"
        />
        {p.onHelp ? <ToolButton label="Keys" hint="Keyboard shortcuts (?)" onPress={p.onHelp} testID="shortcuts-help" /> : null}
      </View>
    </>
  );
  if (p.compact) {
    return (
      <ScrollView horizontal style={styles.compactBar} contentContainerStyle={styles.compactContent} accessibilityLabel="Editor tools" showsHorizontalScrollIndicator={false}>
        {groups}
      </ScrollView>
    );
  }
  return (
    <View style={styles.bar} accessibilityLabel="Editor tools">
      {groups}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, padding: space.sm, backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.border },
  compactBar: { flexGrow: 0, backgroundColor: colors.surface, borderBottomWidth: 1, borderBottomColor: colors.border },
  compactContent: { flexDirection: 'row', gap: space.sm, padding: space.xs },
  group: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xxs, padding: space.xxs, borderRadius: radius.sm, backgroundColor: colors.surfaceMuted },
  btn: { minHeight: 36, minWidth: 36, paddingHorizontal: space.sm, justifyContent: 'center', alignItems: 'center', borderRadius: radius.sm - 2 },
  btnOn: { backgroundColor: colors.primary },
  btnPressed: { backgroundColor: colors.border },
  btnOff: { opacity: 0.45 },
});
