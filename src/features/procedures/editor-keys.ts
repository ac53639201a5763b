import type { KeyPress } from '@/lib/shortcut-keys';

/** The editor's keyboard shortcuts: one list for the key handling and for the "Keys" help the diagram shows. */

export type EditorKey = 'undo' | 'redo' | 'zoomIn' | 'zoomOut' | 'fit' | 'up' | 'down' | 'left' | 'right' | 'delete';

export const SHORTCUTS: readonly { key: EditorKey; keys: string; does: string }[] = [
  { key: 'undo', keys: 'Ctrl+Z', does: 'Undo' },
  { key: 'redo', keys: 'Ctrl+Shift+Z or Ctrl+Y', does: 'Redo' },
  { key: 'zoomIn', keys: '+', does: 'Zoom in (or the scroll wheel)' },
  { key: 'zoomOut', keys: '−', does: 'Zoom out' },
  { key: 'fit', keys: '0', does: 'Fit the diagram' },
  { key: 'down', keys: '↓', does: 'Select the check the first outcome leads to' },
  { key: 'up', keys: '↑', does: 'Select the check that leads here' },
  { key: 'left', keys: '← →', does: 'Select the previous or next check of the same parent' },
  { key: 'delete', keys: 'Delete', does: 'Delete the selected check (asks first)' },
];

const ARROWS: Record<string, EditorKey> = { ArrowUp: 'up', ArrowDown: 'down', ArrowLeft: 'left', ArrowRight: 'right' };

/** Which shortcut a key press is, if any (⌘ counts as Ctrl on a Mac). */
export function keyOf(e: KeyPress): EditorKey | null {
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key.toLowerCase();
  if (mod && !e.altKey) {
    if (key === 'z') return e.shiftKey ? 'redo' : 'undo';
    if (key === 'y') return 'redo';
    return null;
  }
  if (e.altKey) return null;
  if (e.key === '+' || e.key === '=') return 'zoomIn';
  if (e.key === '-' || e.key === '_') return 'zoomOut';
  if (e.key === '0') return 'fit';
  if (e.key === 'Delete' || e.key === 'Backspace') return 'delete';
  return ARROWS[e.key] ?? null;
}
