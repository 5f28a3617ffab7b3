import { useSyncExternalStore } from 'react';
import type { Role, Session, User } from '@holdfast/shared';

export type SessionStatus = 'restoring' | 'signed-in' | 'signed-out';
/** Why the last session ended: the user chose to, or the refresh token was refused. */
export type SessionEndReason = 'signed-out' | 'expired';

export interface SessionState {
  status: SessionStatus;
  user: User | null;
  endReason: SessionEndReason | null;
}

const initial: SessionState = { status: 'restoring', user: null, endReason: null };

let state: SessionState = initial;
// The access token lives only in memory: never in storage, where a script could read it later.
let accessToken: string | null = null;
const listeners = new Set<() => void>();

function setState(next: SessionState) {
  state = next;
  for (const listener of listeners) listener();
}

/** The one place that knows who is signed in. The API client writes it; React reads it. */
export const sessionStore = {
  getState: (): SessionState => state,
  getAccessToken: (): string | null => accessToken,
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  start(session: Session) {
    accessToken = session.accessToken;
    setState({ status: 'signed-in', user: session.user, endReason: null });
  },
  updateUser(user: User) {
    if (state.status === 'signed-in') setState({ ...state, user });
  },
  end(reason: SessionEndReason) {
    accessToken = null;
    setState({ status: 'signed-out', user: null, endReason: reason });
  },
  /** Tests only: back to the state of a fresh page load. */
  reset(next: Partial<SessionState> = {}, token: string | null = null) {
    accessToken = token;
    setState({ ...initial, ...next });
  },
};

export function useSession(): SessionState {
  return useSyncExternalStore(sessionStore.subscribe, sessionStore.getState, sessionStore.getState);
}

/** The signed-in user. Use inside the signed-in part of the app only. */
export function useCurrentUser(): User {
  const { user } = useSession();
  if (!user) throw new Error('useCurrentUser called outside a signed-in area');
  return user;
}

/** True when the user holds one of the roles. The server decides; this only shapes the UI. */
export function hasRole(user: Pick<User, 'role'> | null | undefined, ...roles: Role[]): boolean {
  return !!user && roles.includes(user.role);
}
