import type { LoginResponse, PublicUser } from '@friable/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { setAccountLocale } from '../../../lib/person-locale';
import { session } from '../../../lib/session';
import { meQueryOptions, useMe } from '../api/get-me';
import { logout } from '../api/logout';

interface AuthState {
  /** True while this browser holds a session (it may still be checked, or turn out expired). */
  signedIn: boolean;
  user: PublicUser | undefined;
  /** True while a held session is being checked with the server. */
  checking: boolean;
  /** Set when the session ended on its own (expired, or the account was deactivated). */
  endedReason: string | null;
  signIn(response: LoginResponse): void;
  signOut(reason?: string): void;
}

const AuthContext = createContext<AuthState | null>(null);

export function AuthProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [signedIn, setSignedIn] = useState(() => session.isOpen());
  const [endedReason, setEndedReason] = useState<string | null>(null);
  const me = useMe(signedIn);

  const signOut = useCallback(
    (reason?: string) => {
      // Signing out by choice ends the session on the server (which clears the httpOnly cookie); a session
      // that ended by itself has nothing left to end.
      if (!reason && session.isOpen()) void logout().catch(() => undefined);
      session.close();
      setSignedIn(false);
      setEndedReason(reason ?? null);
      queryClient.clear();
    },
    [queryClient],
  );

  const signIn = useCallback(
    (response: LoginResponse) => {
      session.open(response);
      queryClient.setQueryData(meQueryOptions().queryKey, response.user);
      setEndedReason(null);
      setSignedIn(true);
    },
    [queryClient],
  );

  // Numbers are read and written the person's way: their account's locale once it says one, else the browser's.
  const user = me.data as (PublicUser & { locale?: string | null }) | undefined;
  useEffect(() => {
    setAccountLocale(user?.locale);
  }, [user?.locale]);

  useEffect(() => {
    session.onEnded(() => signOut('Your session has ended. Please sign in again.'));
    return () => session.onEnded(null);
  }, [signOut]);

  const value = useMemo<AuthState>(
    () => ({ signedIn, user: me.data, checking: signedIn && me.isPending, endedReason, signIn, signOut }),
    [signedIn, me.data, me.isPending, endedReason, signIn, signOut],
  );
  return <AuthContext.Provider value={value}>{children}</AuthContext.Provider>;
}

export function useAuth(): AuthState {
  const state = useContext(AuthContext);
  if (!state) throw new Error('useAuth must be used inside <AuthProvider>');
  return state;
}
