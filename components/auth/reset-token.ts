import { useLocalSearchParams } from 'expo-router';
import { useEffect, useState } from 'react';
import { Platform } from 'react-native';

const IN_FRAGMENT = /(?:^#|&)token=([A-Za-z0-9_-]+)/;

/**
 * The token of an e-mailed reset link. The link carries it in the fragment (`/reset-password#token=…`), which a
 * browser never sends to the server; once read it is taken out of the address bar and the history. A native
 * deep link may carry it as `?token=`.
 */
export function useResetToken(): string | null {
  const params = useLocalSearchParams<{ token?: string }>();
  const [token] = useState<string | null>(() => {
    const fromFragment = Platform.OS === 'web' && typeof window !== 'undefined' ? IN_FRAGMENT.exec(window.location.hash)?.[1] : undefined;
    return fromFragment ?? (typeof params.token === 'string' ? params.token : null);
  });
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof window === 'undefined') return;
    // After the router's own first replace of the address (a parent's effect, so it runs after this one and would
    // put the fragment back).
    const timer = setTimeout(() => {
      if (IN_FRAGMENT.test(window.location.hash)) window.history.replaceState(window.history.state, '', window.location.pathname + window.location.search);
    }, 0);
    return () => clearTimeout(timer);
  }, []);
  return token;
}
