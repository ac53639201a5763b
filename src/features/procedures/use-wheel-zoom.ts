import type { RefObject } from 'react';
import type { View } from 'react-native';

/** The scroll wheel exists on the web only; on a device the zoom buttons do the same. */
export function useWheelZoom(_target: RefObject<View | null>, _onZoom: (deltaY: number, point: { x: number; y: number }) => void) {}
