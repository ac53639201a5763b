export type StepKey = 'previous' | 'next' | 'first' | 'finding';

/** The replay's keyboard shortcuts: the key pressed, what it does, and how the screen names it. */
export const STEP_KEYS: readonly { key: string; action: StepKey; shown: string; does: string }[] = [
  { key: 'ArrowLeft', action: 'previous', shown: '←', does: 'previous' },
  { key: 'ArrowRight', action: 'next', shown: '→', does: 'next' },
  { key: 'Home', action: 'first', shown: 'Home', does: 'first step' },
  { key: 'End', action: 'finding', shown: 'End', does: 'finding' },
];
