/** The signed-in session: the bearer token and when it expires, kept in localStorage. */
export interface Session {
  accessToken: string;
  expiresAt: string;
}

const KEY = 'tiermode.session';
const listeners = new Set<() => void>();
// useSyncExternalStore needs the same object back while nothing changed.
let cached: { raw: string; session: Session | null } | null = null;

function parse(raw: string): Session | null {
  try {
    const session = JSON.parse(raw) as Session;
    return typeof session.accessToken === 'string' && typeof session.expiresAt === 'string'
      ? session
      : null;
  } catch {
    return null;
  }
}

/** The current session, or null when there is none or it has expired. */
export function readSession(now: Date = new Date()): Session | null {
  const raw = window.localStorage.getItem(KEY);
  if (!raw) return null;
  if (cached?.raw !== raw) cached = { raw, session: parse(raw) };
  const { session } = cached;
  return session && Date.parse(session.expiresAt) > now.getTime() ? session : null;
}

export function writeSession(session: Session): void {
  window.localStorage.setItem(KEY, JSON.stringify(session));
  listeners.forEach((listener) => listener());
}

export function clearSession(): void {
  window.localStorage.removeItem(KEY);
  listeners.forEach((listener) => listener());
}

/** For useSyncExternalStore: re-render when the session is written or cleared. */
export function subscribeSession(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
