import { useSyncExternalStore } from 'react';

// Where the bearer token lives between visits, and the one notice the sign-in page may show
// after Potlife signed someone out on its own (an expired or refused token).

const TOKEN_KEY = 'potlife.accessToken';
const NOTICE_KEY = 'potlife.signInNotice';

export const SESSION_EXPIRED_NOTICE = 'Your session has expired; please sign in again';

export interface AuthSnapshot {
  token: string | null;
  notice: string | null;
}

type Listener = () => void;

const listeners = new Set<Listener>();

function readStorage(storage: () => Storage, key: string): string | null {
  try {
    return storage().getItem(key);
  } catch {
    return null;
  }
}

function writeStorage(storage: () => Storage, key: string, value: string | null): void {
  try {
    if (value === null) {
      storage().removeItem(key);
    } else {
      storage().setItem(key, value);
    }
  } catch {
    // Storage can be unavailable (private mode, quota); the in-memory snapshot still holds.
  }
}

const local = () => window.localStorage;
const session = () => window.sessionStorage;

let snapshot: AuthSnapshot = {
  token: readStorage(local, TOKEN_KEY),
  notice: readStorage(session, NOTICE_KEY),
};

function update(next: AuthSnapshot): void {
  if (next.token === snapshot.token && next.notice === snapshot.notice) {
    return;
  }
  snapshot = next;
  listeners.forEach((listener) => listener());
}

export function getAccessToken(): string | null {
  return snapshot.token;
}

export function getAuthSnapshot(): AuthSnapshot {
  return snapshot;
}

/** Keeps the token from a sign-in, registration or accepted invitation. */
export function setAccessToken(token: string): void {
  writeStorage(local, TOKEN_KEY, token);
  writeStorage(session, NOTICE_KEY, null);
  update({ token, notice: null });
}

/** The user chose to sign out. */
export function clearAccessToken(): void {
  writeStorage(local, TOKEN_KEY, null);
  writeStorage(session, NOTICE_KEY, null);
  update({ token: null, notice: null });
}

/** The API refused the token: forget it and leave a notice for the sign-in page. */
export function expireSession(): void {
  writeStorage(local, TOKEN_KEY, null);
  writeStorage(session, NOTICE_KEY, SESSION_EXPIRED_NOTICE);
  update({ token: null, notice: SESSION_EXPIRED_NOTICE });
}

export function dismissSignInNotice(): void {
  writeStorage(session, NOTICE_KEY, null);
  update({ ...snapshot, notice: null });
}

export function subscribeToAuth(listener: Listener): () => void {
  listeners.add(listener);
  return () => {
    listeners.delete(listener);
  };
}

// A sign-in or sign-out in another tab applies here too.
if (typeof window !== 'undefined') {
  window.addEventListener('storage', (event) => {
    if (event.key === TOKEN_KEY || event.key === null) {
      update({ ...snapshot, token: readStorage(local, TOKEN_KEY) });
    }
  });
}

export function useAccessToken(): string | null {
  return useSyncExternalStore(subscribeToAuth, getAccessToken, getAccessToken);
}

export function useSignInNotice(): string | null {
  return useSyncExternalStore(
    subscribeToAuth,
    () => snapshot.notice,
    () => snapshot.notice,
  );
}
