import { useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { setApiToken, setUnauthorizedHandler } from './api/client';
import { meRequest, type UserRecord } from './data/session';
import { loadStored, saveStored } from './session-storage';
import { setDeviceTheme } from './theme-web';

interface Session {
  token: string;
  user: UserRecord;
}

interface SessionContextValue {
  session: Session | null;
  ready: boolean;
  begin: (s: Session) => void;
  end: () => void;
  updateUser: (u: UserRecord) => void;
}

const SessionContext = createContext<SessionContextValue | null>(null);

export function SessionProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [session, setSession] = useState<Session | null>(null);
  const [ready, setReady] = useState(false);

  const end = useCallback(() => {
    setApiToken(null);
    saveStored(null);
    setSession(null);
    queryClient.clear();
  }, [queryClient]);

  const begin = useCallback((s: Session) => {
    setApiToken(s.token);
    saveStored(s);
    setSession(s);
  }, []);

  const updateUser = useCallback((user: UserRecord) => {
    setSession((s) => {
      if (!s) return s;
      const next = { ...s, user };
      saveStored(next);
      return next;
    });
  }, []);

  // Restore a stored session, then confirm it with the server (a deactivated user is signed out).
  useEffect(() => {
    const stored = loadStored<Session>();
    if (stored?.token) {
      setApiToken(stored.token);
      setSession(stored);
      meRequest()
        .then(({ user }) => updateUser(user))
        .catch(() => undefined);
    }
    setReady(true);
  }, [updateUser]);

  // The account's colour theme follows the person to each device they sign in on, and stays after sign-out.
  const theme = session?.user.theme;
  useEffect(() => {
    if (theme) setDeviceTheme(theme);
  }, [theme]);

  useEffect(() => {
    setUnauthorizedHandler(end);
    return () => setUnauthorizedHandler(null);
  }, [end]);

  const value = useMemo(() => ({ session, ready, begin, end, updateUser }), [session, ready, begin, end, updateUser]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionContextValue {
  const ctx = useContext(SessionContext);
  if (!ctx) throw new Error('useSession must be used inside SessionProvider');
  return ctx;
}
