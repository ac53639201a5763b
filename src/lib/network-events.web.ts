/** Web: the browser says when the network comes back. */
export function onNetworkBack(listener: () => void): () => void {
  window.addEventListener('online', listener);
  return () => window.removeEventListener('online', listener);
}
