import { useEffect, useRef } from 'react';
import { STEP_KEYS, type StepKey } from '@/features/replays/step-keys';

/**
 * ← / → step through a replay, Home and End jump to its first step and its finding. Keys typed into a
 * field (a comment) stay there, and combinations with Ctrl, Alt, Meta or Shift are left to the browser.
 */
export function useStepKeys(bindings: Partial<Record<StepKey, () => void>>) {
  const current = useRef(bindings);
  current.current = bindings;
  useEffect(() => {
    const listener = (event: KeyboardEvent) => {
      if (event.ctrlKey || event.altKey || event.metaKey || event.shiftKey) return;
      const target = event.target as HTMLElement | null;
      if (target && (target.tagName === 'INPUT' || target.tagName === 'TEXTAREA' || target.tagName === 'SELECT' || target.isContentEditable)) return;
      // A focused area that scrolls sideways (the diagram) keeps its arrow keys for scrolling.
      if ((event.key === 'ArrowLeft' || event.key === 'ArrowRight') && target && target.scrollWidth > target.clientWidth) return;
      const key = STEP_KEYS.find((k) => k.key === event.key)?.action;
      const action = key ? current.current[key] : undefined;
      if (!action) return;
      event.preventDefault();
      action();
    };
    window.addEventListener('keydown', listener);
    return () => window.removeEventListener('keydown', listener);
  }, []);
}
