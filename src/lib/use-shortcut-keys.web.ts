import { useEffect, useRef } from 'react';
import type { KeyResolver } from '@/lib/shortcut-keys';

const FIELDS = new Set(['INPUT', 'TEXTAREA', 'SELECT']);

/**
 * Runs the action bound to each shortcut `resolve` names, except while typing in a field (keys typed into
 * a comment or a reading stay there). Bindings may change on every render; the listener is set once.
 */
export function useShortcutKeys<K extends string>(resolve: KeyResolver<K>, bindings: Partial<Record<K, () => void>>) {
  const current = useRef({ resolve, bindings });
  current.current = { resolve, bindings };
  useEffect(() => {
    const listener = (event: KeyboardEvent) => {
      const target = event.target instanceof HTMLElement ? event.target : null;
      if (target && (FIELDS.has(target.tagName) || target.isContentEditable)) return;
      // With nothing focused the target is the page itself, which is not an area that keeps its arrows.
      const area = target && target !== document.body && target !== document.documentElement ? target : null;
      const key = current.current.resolve(event, { scrollsSideways: area !== null && area.scrollWidth > area.clientWidth });
      const action = key ? current.current.bindings[key] : undefined;
      if (!action) return;
      event.preventDefault();
      action();
    };
    window.addEventListener('keydown', listener);
    return () => window.removeEventListener('keydown', listener);
  }, []);
}
