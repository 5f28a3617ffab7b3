import { useSyncExternalStore } from 'react';

/**
 * Whether the last call to the server got an answer. `navigator.onLine` only knows about the
 * device's own link: on a plant's wireless network the link is up while the server is out of
 * reach, and a browser can report itself online after a reload without a network. A fetch that
 * fails without an answer is the sign both cases share.
 */
let unreachable = false;
const listeners = new Set<() => void>();

/** How often a screen waiting on an unreachable server asks it again. */
export const SERVER_RETRY_MS = 5000;

/** Record how the last call to the server ended: answered (any status) or no answer at all. */
export function noteServerAnswer(answered: boolean): void {
  if (unreachable === !answered) return;
  unreachable = !answered;
  for (const l of listeners) l();
}

export function serverUnreachable(): boolean {
  return unreachable;
}

function subscribe(onChange: () => void): () => void {
  listeners.add(onChange);
  return () => listeners.delete(onChange);
}

/** Call `onBack` each time the server answers again after a call that went unanswered. */
export function subscribeServerBack(onBack: () => void): () => void {
  return subscribe(() => {
    if (!unreachable) onBack();
  });
}

/** True while the last call to the server went unanswered; kept current. */
export function useServerUnreachable(): boolean {
  return useSyncExternalStore(subscribe, serverUnreachable, () => false);
}
