import type { KeyResolver } from '@/lib/shortcut-keys';

/** Keyboard shortcuts exist on the web only; on a device the buttons do the same. */
export function useShortcutKeys<K extends string>(_resolve: KeyResolver<K>, _bindings: Partial<Record<K, () => void>>) {}
