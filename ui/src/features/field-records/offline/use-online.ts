import { useSyncExternalStore } from 'react';
import { useServerUnreachable } from '../../../lib/server-reach';

function subscribe(onChange: () => void): () => void {
  window.addEventListener('online', onChange);
  window.addEventListener('offline', onChange);
  return () => {
    window.removeEventListener('online', onChange);
    window.removeEventListener('offline', onChange);
  };
}

/**
 * Whether the server can be reached, kept current: the browser says it has a connection and the
 * last call to the server was answered (lib/server-reach says why both are needed).
 */
export function useOnline(): boolean {
  const linked = useSyncExternalStore(
    subscribe,
    () => navigator.onLine,
    () => true,
  );
  const unreachable = useServerUnreachable();
  return linked && !unreachable;
}
