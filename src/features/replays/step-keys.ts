import type { KeyPress, KeyTarget } from '@/lib/shortcut-keys';

export type StepKey = 'previous' | 'next' | 'first' | 'finding';

/** The replay's keyboard shortcuts: the key pressed, what it does, and how the screen names it. */
export const STEP_KEYS: readonly { key: string; action: StepKey; shown: string; does: string }[] = [
  { key: 'ArrowLeft', action: 'previous', shown: '←', does: 'previous' },
  { key: 'ArrowRight', action: 'next', shown: '→', does: 'next' },
  { key: 'Home', action: 'first', shown: 'Home', does: 'first step' },
  { key: 'End', action: 'finding', shown: 'End', does: 'finding' },
];

/**
 * Which step key a press is: plain keys only (combinations with Ctrl, Alt, Meta or Shift are the browser's),
 * and ← / → not while a focused area scrolls sideways.
 */
export function stepKeyOf(press: KeyPress, target: KeyTarget): StepKey | null {
  if (press.ctrlKey || press.altKey || press.metaKey || press.shiftKey) return null;
  if ((press.key === 'ArrowLeft' || press.key === 'ArrowRight') && target.scrollsSideways) return null;
  return STEP_KEYS.find((k) => k.key === press.key)?.action ?? null;
}
