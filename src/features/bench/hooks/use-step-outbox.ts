import { useEffect, useSyncExternalStore } from 'react';
import { onNetworkBack } from '@/lib/network-events';
import { flush, snapshot, subscribe } from '../offline/outbox-store';

/** While something waits to be sent, try again this often. */
const RETRY_MS = 5000;

/**
 * The device's step outbox, kept sending: once on mount, whenever the network comes back, and on a timer
 * while any of this member's entries still wait.
 */
export function useStepOutbox(userId: string) {
  const entries = useSyncExternalStore(subscribe, snapshot, snapshot);
  const waiting = entries.some((e) => e.userId === userId && e.state.kind === 'waiting');

  useEffect(() => {
    void flush(userId);
    return onNetworkBack(() => void flush(userId));
  }, [userId]);

  useEffect(() => {
    if (!waiting) return undefined;
    const timer = setInterval(() => void flush(userId), RETRY_MS);
    return () => clearInterval(timer);
  }, [userId, waiting]);

  return entries;
}
