import type { LoginResponse, PublicUser } from '@friable/contracts';
import { useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import { onUnauthorized, tokenStore } from '../../../lib/api-client';
import { setAccountLocale } from '../../../lib/person-locale';
import { useMe } from '../api/get-me';

interface AuthState {
  token: string | null;
  user: PublicUser | undefined;
  /** True while a stored token is being checked with the server. */
  checking: boolean;
  /** Set when the session ended on its own (expired, or the account was deactivated). */
  endedReason: string | null;
  signIn(response: LoginResponse): void;
  signOut(reason?: string): void;
}

const AuthContext = createContext<AuthState | null>(null);

export function AuthProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [token, setToken] = useState<string | null>(() => tokenStore.get());
  const [endedReason, setEndedReason] = useState<string | null>(null);
  const me = useMe(token);

  const signOut = useCallback(
    (reason?: string) => {
      tokenStore.clear();
      setToken(null);
      setEndedReason(reason ?? null);
      queryClient.clear();
    },
    [queryClient],
  );

  const signIn = useCallback(
    (response: LoginResponse) => {
      tokenStore.set(response.accessToken);
      queryClient.setQueryData(['auth', 'me', response.accessToken], response.user);
      setEndedReason(null);
      setToken(response.accessToken);
    },
    [queryClient],
  );

  // Numbers are read and written the person's way: their account's locale once it says one, else the browser's.
  const user = me.data as (PublicUser & { locale?: string | null }) | undefined;
  useEffect(() => {
    setAccountLocale(user?.locale);
  }, [user?.locale]);

  useEffect(() => {
    onUnauthorized(() => signOut('Your session has ended. Please sign in again.'));
    return () => onUnauthorized(null);
  }, [signOut]);

  const value = useMemo<AuthState>(
    () => ({ token, user: me.data, checking: token !== null && me.isPending, endedReason, signIn, signOut }),
    [token, me.data, me.isPending, endedReason, signIn, signOut],
  );
  return <AuthContext.Provider value={value}>{children}</AuthContext.Provider>;
}

export function useAuth(): AuthState {
  const state = useContext(AuthContext);
  if (!state) throw new Error('useAuth must be used inside <AuthProvider>');
  return state;
}
