import { useCallback, useEffect, useState } from 'react';
import { Workbox } from 'workbox-window';
import { SERVICE_WORKER_FILE } from '@/shared/web-delivery';
import type { ServiceWorkerState } from './use-service-worker';

/**
 * Registers the service worker that keeps the app shell for offline starts, after the page has loaded.
 * A new deploy installs in the background and then waits: the open page keeps running the version whose
 * files it already has (so a lazily loaded part of it still loads), and `ready` asks the person to reload.
 * Service workers need a secure context (HTTPS, localhost, or an origin the managed browser treats as
 * secure): elsewhere `navigator.serviceWorker` is missing and nothing is registered, without a message.
 */
export function useServiceWorker(): ServiceWorkerState {
  const [workbox, setWorkbox] = useState<Workbox | null>(null);
  const [ready, setReady] = useState(false);

  useEffect(() => {
    if (__DEV__ || typeof window === 'undefined' || !window.isSecureContext || !('serviceWorker' in navigator)) return;
    const wb = new Workbox(`/${SERVICE_WORKER_FILE}`);
    wb.addEventListener('waiting', () => setReady(true));
    // Registration waits for the load event, so it never competes with the first screen for the network.
    wb.register().catch(() => undefined);
    setWorkbox(wb);
  }, []);

  const apply = useCallback(() => {
    if (!workbox) return;
    workbox.addEventListener('controlling', () => window.location.reload());
    workbox.messageSkipWaiting();
  }, [workbox]);

  return { ready, apply };
}
