import type { StepKey } from '@/features/replays/step-keys';

/** Keyboard shortcuts exist on the web only; on a device the Previous and Next buttons do the same. */
export function useStepKeys(_bindings: Partial<Record<StepKey, () => void>>) {}
