/** Keyboard shortcuts exist on the web only; on a device the Undo and Redo buttons do the same. */
export function useUndoKeys(_onUndo: () => void, _onRedo: () => void) {}
