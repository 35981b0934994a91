import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { useState, type ReactNode } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { ApiError } from './api/client';
import { registerDockQueue } from './data/dock-queue';
import { canPersist, persistOptions } from './offline/persist';
import { SessionProvider } from './session';

function makeClient(): QueryClient {
  const client = new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // A 4xx will not change by asking again; a network hiccup or 503 might.
        retry: (count, err) => count < 2 && !(err instanceof ApiError && err.status >= 400 && err.status < 500),
      },
    },
  });
  registerDockQueue(client);
  return client;
}

export function AppProviders({ children }: { children: ReactNode }) {
  const [client] = useState(makeClient);
  const [persist] = useState(() => (canPersist() ? persistOptions() : null));
  const inner = <SessionProvider>{children}</SessionProvider>;
  return (
    <SafeAreaProvider>
      {persist ? (
        // Checks kept from an earlier visit are sent once the cache is back.
        <PersistQueryClientProvider client={client} persistOptions={persist} onSuccess={() => client.resumePausedMutations()}>
          {inner}
        </PersistQueryClientProvider>
      ) : (
        <QueryClientProvider client={client}>{inner}</QueryClientProvider>
      )}
    </SafeAreaProvider>
  );
}
