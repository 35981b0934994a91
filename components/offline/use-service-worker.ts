// Native builds have no service worker: the app is installed from a store and its shell is on the device.
export interface ServiceWorkerState {
  /** A new version is installed and waits for the page to let it take over. */
  ready: boolean;
  /** Let the waiting version take over, then reload into it. */
  apply: () => void;
}

export function useServiceWorker(): ServiceWorkerState {
  return { ready: false, apply: () => undefined };
}
