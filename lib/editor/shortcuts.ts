/**
 * The editor's keyboard shortcuts (wide screens), one table for the handler and the help sheet.
 * Mod is Ctrl, or ⌘ on a Mac.
 */
export type ShortcutAction = 'undo' | 'redo' | 'delete' | 'arrange' | 'fit' | 'zoomIn' | 'zoomOut' | 'zoomReset' | 'escape' | 'help' | 'save' | 'selectAll' | 'nudgeLeft' | 'nudgeRight' | 'nudgeUp' | 'nudgeDown';

export const SHORTCUTS: readonly { action: ShortcutAction; keys: string; does: string }[] = [
  { action: 'undo', keys: 'Mod+Z', does: 'Undo' },
  { action: 'redo', keys: 'Mod+Shift+Z or Mod+Y', does: 'Redo' },
  { action: 'delete', keys: 'Delete or Backspace', does: 'Delete what is selected (devices take their cables)' },
  { action: 'arrange', keys: 'Shift+A', does: 'Auto-arrange: hosts, switches and arrays in bands' },
  { action: 'fit', keys: 'F', does: 'Fit the whole design on screen' },
  { action: 'zoomIn', keys: '+ or =', does: 'Zoom in' },
  { action: 'zoomOut', keys: '−', does: 'Zoom out' },
  { action: 'zoomReset', keys: '0', does: 'Zoom to 100 %' },
  { action: 'selectAll', keys: 'Mod+A', does: 'Select every device' },
  { action: 'nudgeLeft', keys: 'Arrow keys', does: 'Move the selected devices one grid step' },
  { action: 'escape', keys: 'Escape', does: 'Drop the cable being drawn, then the selection' },
  { action: 'save', keys: 'Mod+S', does: 'Save version' },
  { action: 'help', keys: '?', does: 'Show this help' },
];

export type KeyLike = { key: string; ctrlKey: boolean; metaKey: boolean; shiftKey: boolean; altKey: boolean };

/** Which action a key press means, or null. */
export function actionFor(e: KeyLike): ShortcutAction | null {
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  if (mod && key === 'z') return e.shiftKey ? 'redo' : 'undo';
  if (mod && key === 'y') return 'redo';
  if (mod && key === 's') return 'save';
  if (mod && key === 'a') return 'selectAll';
  if (mod || e.altKey) return null;
  switch (key) {
    case 'Delete':
    case 'Backspace':
      return 'delete';
    case 'a':
      return e.shiftKey ? 'arrange' : null;
    case 'f':
      return 'fit';
    case '+':
    case '=':
      return 'zoomIn';
    case '-':
    case '_':
      return 'zoomOut';
    case '0':
      return 'zoomReset';
    case 'Escape':
      return 'escape';
    case '?':
      return 'help';
    case 'ArrowLeft':
      return 'nudgeLeft';
    case 'ArrowRight':
      return 'nudgeRight';
    case 'ArrowUp':
      return 'nudgeUp';
    case 'ArrowDown':
      return 'nudgeDown';
    default:
      return null;
  }
}
