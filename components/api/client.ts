// The typed API client: every screen's data goes through here (via the query modules in components/data).
import { isOnline, reportUnreachable } from '../offline/network';
export interface ApiErrorBody {
  code: string;
  message: string;
  details: unknown;
}

export interface FieldProblem {
  field: string;
  messages: string[];
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: unknown,
  ) {
    super(message);
  }

  /** Field-level problems from a 400 or 409, keyed by field name. */
  fieldMessages(): Record<string, string> {
    const out: Record<string, string> = {};
    if (Array.isArray(this.details)) {
      for (const d of this.details as FieldProblem[]) {
        if (d && typeof d.field === 'string') out[d.field] = (d.messages ?? []).join('; ');
      }
    }
    return out;
  }
}

let token: string | null = null;
let onUnauthorized: (() => void) | null = null;

export function setApiToken(next: string | null): void {
  token = next;
}

/** The bearer token of the signed-in session, for requests that cannot go through `api()` (uploads, file downloads). */
export function getApiToken(): string | null {
  return token;
}

export function setUnauthorizedHandler(handler: (() => void) | null): void {
  onUnauthorized = handler;
}

const base = process.env.EXPO_PUBLIC_API_URL ?? '';

/** How long a request may take before the network counts as gone (a dock's Wi-Fi can hang rather than fail). */
export const REQUEST_TIMEOUT_MS = 15_000;

export const OFFLINE_WRITE_MESSAGE = 'There is no network, so this change was not sent. Only dock checks are kept on this phone and sent later; try again when the network is back.';

/** No answer from the server (no network, or it timed out): the one kind of failure worth trying again later. */
export const isNetworkError = (err: unknown): boolean => err instanceof ApiError && (err.code === 'network' || err.code === 'offline');

export async function api<T>(path: string, init: { method?: string; body?: unknown; queued?: boolean; timeoutMs?: number } = {}): Promise<T> {
  const method = init.method ?? 'GET';
  // Offline, a write other than a queued dock check is refused at once, in words, instead of hanging.
  if (method !== 'GET' && !init.queued && !isOnline()) throw new ApiError(0, 'offline', OFFLINE_WRITE_MESSAGE, null);
  let res: Response;
  const abort = new AbortController();
  const timer = setTimeout(() => abort.abort(), init.timeoutMs ?? REQUEST_TIMEOUT_MS);
  try {
    res = await fetch(`${base}/api${path}`, {
      method,
      headers: {
        Accept: 'application/json',
        ...(init.body !== undefined ? { 'Content-Type': 'application/json' } : {}),
        ...(token ? { Authorization: `Bearer ${token}` } : {}),
      },
      body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
      signal: abort.signal,
    });
  } catch {
    reportUnreachable(base);
    throw new ApiError(0, 'network', 'The server could not be reached. Check the connection and try again.', null);
  } finally {
    clearTimeout(timer);
  }
  const text = await res.text();
  const data = text ? safeJson(text) : null;
  if (!res.ok) {
    const err = (data as { error?: ApiErrorBody } | null)?.error;
    if (res.status === 401 && token && onUnauthorized) onUnauthorized();
    throw new ApiError(res.status, err?.code ?? 'http_error', err?.message ?? `The server answered ${res.status}.`, err?.details ?? null);
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
