import { useEffect, useRef } from 'react';
import { actionFor, type ShortcutAction } from '@/lib/editor/shortcuts';

/** Typing in a field keeps its keys: Backspace edits text there, it does not delete a device. */
function typing(target: EventTarget | null): boolean {
  const el = target as HTMLElement | null;
  if (!el || typeof el.tagName !== 'string') return false;
  return el.tagName === 'INPUT' || el.tagName === 'TEXTAREA' || el.isContentEditable;
}

/** Window-level shortcuts while the editor is on screen and no dialog is open. */
export function useEditorShortcuts(enabled: boolean, handle: (action: ShortcutAction) => void) {
  const latest = useRef(handle);
  latest.current = handle;
  useEffect(() => {
    if (!enabled || typeof window === 'undefined' || typeof window.addEventListener !== 'function') return;
    const onKey = (e: KeyboardEvent) => {
      const action = actionFor(e);
      if (!action) return;
      const editing = typing(e.target);
      // In a field only the document-wide ones apply (and Mod+Z undoes the field's own text).
      if (editing && action !== 'save') return;
      e.preventDefault();
      latest.current(action);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [enabled]);
}
