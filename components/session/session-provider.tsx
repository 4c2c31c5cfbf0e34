import { createContext, useContext, useMemo, type ReactNode } from 'react';
import type { Me } from '@/server/schemas';
import { useMeQuery } from '../queries/me';

export type Session =
  | { status: 'loading'; me: null; error: null; retry: () => void }
  | { status: 'signed-out'; me: null; error: null; retry: () => void }
  | { status: 'signed-in'; me: Me; error: null; retry: () => void }
  | { status: 'error'; me: null; error: Error; retry: () => void };

const SessionContext = createContext<Session | null>(null);

type SessionProviderProps = { children: ReactNode };

/** Who is signed in, as GET /api/me says (the session itself is an httpOnly cookie). */
export function SessionProvider({ children }: SessionProviderProps) {
  const query = useMeQuery();
  const { data, error, isPending, refetch } = query;
  const value = useMemo<Session>(() => {
    const retry = () => void refetch();
    if (isPending) return { status: 'loading', me: null, error: null, retry };
    if (error) return { status: 'error', me: null, error, retry };
    if (!data) return { status: 'signed-out', me: null, error: null, retry };
    return { status: 'signed-in', me: data, error: null, retry };
  }, [data, error, isPending, refetch]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): Session {
  const session = useContext(SessionContext);
  if (!session) throw new Error('useSession needs a SessionProvider above it (app/_layout.tsx).');
  return session;
}

/** The signed-in user; only for screens under the (app) guard. */
export function useMe(): Me {
  const session = useSession();
  if (session.status !== 'signed-in') throw new Error('useMe is only for signed-in screens.');
  return session.me;
}
