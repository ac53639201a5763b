import { useEffect } from 'react';

/** Ctrl+Z / Ctrl+Shift+Z (⌘ on a Mac) undo and redo document edits, except while typing in a field. */
export function useUndoKeys(onUndo: () => void, onRedo: () => void) {
  useEffect(() => {
    const listener = (event: KeyboardEvent) => {
      if (!(event.ctrlKey || event.metaKey) || event.key.toLowerCase() !== 'z') return;
      const target = event.target as HTMLElement | null;
      if (target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA')) return;
      event.preventDefault();
      if (event.shiftKey) onRedo();
      else onUndo();
    };
    window.addEventListener('keydown', listener);
    return () => window.removeEventListener('keydown', listener);
  }, [onUndo, onRedo]);
}
