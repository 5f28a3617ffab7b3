import { useCallback, useSyncExternalStore } from 'react';

type Choice = 'open' | 'collapsed';

const storageKey = (userId: string) => `holdfast.nav.${userId}`;
const listeners = new Set<() => void>();

function read(userId: string): Choice | null {
  try {
    const v = localStorage.getItem(storageKey(userId));
    return v === 'open' || v === 'collapsed' ? v : null;
  } catch {
    return null; // storage blocked: the default applies
  }
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  window.addEventListener('storage', listener);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', listener);
  };
}

/**
 * Whether the side navigation is collapsed on wide screens. The user's own choice is kept on this
 * device, per user; without one, pages that want the width (the sheet editor) start collapsed and
 * the others open.
 */
export function useNavCollapsed(
  userId: string,
  compactByDefault: boolean,
): [collapsed: boolean, toggle: () => void] {
  const choice = useSyncExternalStore(subscribe, () => read(userId));
  const collapsed = choice === null ? compactByDefault : choice === 'collapsed';
  const toggle = useCallback(() => {
    try {
      localStorage.setItem(storageKey(userId), collapsed ? 'open' : 'collapsed');
    } catch {
      // storage blocked: nothing to remember
    }
    for (const l of listeners) l();
  }, [userId, collapsed]);
  return [collapsed, toggle];
}
