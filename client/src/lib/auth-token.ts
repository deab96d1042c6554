// The bearer token lives in localStorage so a page reload keeps people signed in.
// Components subscribe (useSyncExternalStore) so a cleared token signs them out everywhere at once.
export const AUTH_TOKEN_KEY = 'endgrain.token';

type Listener = () => void;
const listeners = new Set<Listener>();

function read(): string | null {
  try {
    return window.localStorage.getItem(AUTH_TOKEN_KEY);
  } catch {
    return null; // storage blocked (private mode, policy): behave as signed out
  }
}

function notify(): void {
  for (const listener of listeners) listener();
}

export const authToken = {
  get: read,
  set(token: string): void {
    try {
      window.localStorage.setItem(AUTH_TOKEN_KEY, token);
    } finally {
      notify();
    }
  },
  clear(): void {
    if (read() === null) return;
    try {
      window.localStorage.removeItem(AUTH_TOKEN_KEY);
    } finally {
      notify();
    }
  },
  subscribe(listener: Listener): () => void {
    listeners.add(listener);
    // Another tab signing in or out changes the same key.
    const onStorage = (event: StorageEvent) => {
      if (event.key === AUTH_TOKEN_KEY || event.key === null) listener();
    };
    window.addEventListener('storage', onStorage);
    return () => {
      listeners.delete(listener);
      window.removeEventListener('storage', onStorage);
    };
  },
};
