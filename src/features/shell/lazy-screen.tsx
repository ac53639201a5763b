import { type ComponentType, lazy, Suspense } from 'react';
import { LoadingState } from '@/components/ui/loading-state';

/**
 * A screen whose code is fetched the first time its route opens (a chunk of its own in the web export),
 * so the first page of the app doesn't download and run it. A chunk that can't be fetched throws into the
 * route's error boundary, which offers to try again.
 */
export function lazyScreen(load: () => Promise<ComponentType>) {
  const Screen = lazy(async () => ({ default: await load() }));
  function LazyScreen() {
    return (
      <Suspense fallback={<LoadingState label="Opening…" testID="screen-loading" />}>
        <Screen />
      </Suspense>
    );
  }
  return LazyScreen;
}
