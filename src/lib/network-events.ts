/** Native: no network event is wired up yet; callers also retry on a timer. */
export function onNetworkBack(_listener: () => void): () => void {
  return () => undefined;
}
