import { useEffect, useRef } from 'react';
import { type EditorKey, keyOf } from '@/features/procedures/editor-keys';

/** Runs the bound action for each shortcut pressed, except while typing in a field. */
export function useEditorKeys(bindings: Partial<Record<EditorKey, () => void>>) {
  const current = useRef(bindings);
  current.current = bindings;
  useEffect(() => {
    const listener = (event: KeyboardEvent) => {
      const target = event.target as HTMLElement | null;
      if (target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.tagName === 'SELECT' || target.isContentEditable)) return;
      const key = keyOf(event);
      const action = key ? current.current[key] : undefined;
      if (!action) return;
      event.preventDefault();
      action();
    };
    window.addEventListener('keydown', listener);
    return () => window.removeEventListener('keydown', listener);
  }, []);
}
