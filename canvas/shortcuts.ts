/** Keyboard shortcuts of the editor on wide screens; the help sheet lists this same table. */
import type { Tool } from './session';

export type ShortcutAction =
  | { kind: 'tool'; tool: Tool }
  | { kind: 'switch-face' }
  | { kind: 'overlay-faces' }
  | { kind: 'temperature' }
  | { kind: 'fit' }
  | { kind: 'undo' }
  | { kind: 'redo' }
  | { kind: 'cancel' }
  | { kind: 'help' };

export const shortcutTable: { keys: string; what: string }[] = [
  { keys: 'B', what: 'Bend tool: tap two tubes, or drag from one to the other' },
  { keys: 'S', what: 'Supply stub tool' },
  { keys: 'R', what: 'Return stub tool' },
  { keys: 'E', what: 'Erase tool' },
  { keys: 'V', what: 'Select tool: tap a tube to see its circuit and water temperatures' },
  { keys: 'F', what: 'Switch between the connection end and the opposite end' },
  { keys: 'O', what: 'Show both ends at once (the other end faint)' },
  { keys: 'T', what: 'Temperature colours on or off' },
  { keys: '0', what: 'Fit the sheet to the screen' },
  { keys: 'Ctrl/Cmd + Z', what: 'Undo' },
  { keys: 'Shift + Ctrl/Cmd + Z', what: 'Redo' },
  { keys: 'Esc', what: 'Cancel the bend being drawn, clear the selection' },
  { keys: '?', what: 'This list' },
];

export interface KeyInput { key: string; ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean }

/** Which action a key press asks for, or null. Pure, so it is tested without a browser. */
export function shortcutFor(e: KeyInput): ShortcutAction | null {
  const mod = e.ctrlKey || e.metaKey;
  const k = e.key.toLowerCase();
  if (mod && k === 'z') return e.shiftKey ? { kind: 'redo' } : { kind: 'undo' };
  if (mod && k === 'y') return { kind: 'redo' };
  if (mod || e.altKey) return null;
  switch (k) {
    case 'b':
      return { kind: 'tool', tool: 'bend' };
    case 's':
      return { kind: 'tool', tool: 'supply' };
    case 'r':
      return { kind: 'tool', tool: 'return' };
    case 'e':
      return { kind: 'tool', tool: 'erase' };
    case 'v':
      return { kind: 'tool', tool: 'select' };
    case 'f':
      return { kind: 'switch-face' };
    case 'o':
      return { kind: 'overlay-faces' };
    case 't':
      return { kind: 'temperature' };
    case '0':
      return { kind: 'fit' };
    case 'escape':
      return { kind: 'cancel' };
    case '?':
      return { kind: 'help' };
    default:
      return null;
  }
}
