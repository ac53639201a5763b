import type { EditorKey } from '@/features/procedures/editor-keys';

/** Keyboard shortcuts exist on the web only; on a device the buttons do the same. */
export function useEditorKeys(_bindings: Partial<Record<EditorKey, () => void>>) {}
