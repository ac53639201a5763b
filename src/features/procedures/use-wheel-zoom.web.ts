import { type RefObject, useEffect, useRef } from 'react';
import type { View } from 'react-native';

/**
 * The scroll wheel (or a trackpad pinch, which browsers send as a wheel with Ctrl) over the element zooms about
 * the pointer: `onZoom` gets the wheel's deltaY in pixels and the pointer's place in the element.
 */
export function useWheelZoom(target: RefObject<View | null>, onZoom: (deltaY: number, point: { x: number; y: number }) => void) {
  const current = useRef(onZoom);
  current.current = onZoom;
  useEffect(() => {
    const element = target.current as unknown as HTMLElement | null;
    if (!element) return;
    const listener = (event: WheelEvent) => {
      event.preventDefault();
      const box = element.getBoundingClientRect();
      // Lines or pages (Firefox, some mice) count as a notch each.
      const deltaY = event.deltaMode === 0 ? event.deltaY : Math.sign(event.deltaY) * 100;
      current.current(deltaY, { x: event.clientX - box.left, y: event.clientY - box.top });
    };
    // Not passive, so the page does not scroll while the diagram zooms.
    element.addEventListener('wheel', listener, { passive: false });
    return () => element.removeEventListener('wheel', listener);
  }, [target]);
}
