import { onlineManager } from '@tanstack/react-query';
import { api, ApiError, isNetworkError, OFFLINE_WRITE_MESSAGE } from '../../components/api/client';

// The API client with no network: writes other than a queued dock check are refused at once, in words; a
// request that finds no server marks the app offline (so queries pause and queued checks wait).
const realFetch = global.fetch;
afterEach(() => {
  global.fetch = realFetch;
  onlineManager.setOnline(true);
  jest.useRealTimers();
});

describe('the API client offline', () => {
  it('refuses a write at once with the offline sentence, and sends nothing', async () => {
    const fetch = jest.fn();
    global.fetch = fetch;
    onlineManager.setOnline(false);
    const err = await api('/pairings', { method: 'POST', body: {} }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect((err as ApiError).message).toBe(OFFLINE_WRITE_MESSAGE);
    expect(isNetworkError(err)).toBe(true);
    expect(fetch).not.toHaveBeenCalled();
  });

  it('lets a queued dock check through to the network', async () => {
    const fetch = jest.fn().mockResolvedValue(new Response('{"id":"x"}', { status: 201 }));
    global.fetch = fetch;
    onlineManager.setOnline(false);
    await expect(api('/receiving-checks', { method: 'POST', body: {}, queued: true })).resolves.toEqual({ id: 'x' });
    expect(fetch).toHaveBeenCalledTimes(1);
  });

  it('counts the app offline when a request finds no server', async () => {
    global.fetch = jest.fn().mockRejectedValue(new TypeError('Failed to fetch'));
    expect(onlineManager.isOnline()).toBe(true);
    const err = await api('/me').catch((e: unknown) => e);
    expect(isNetworkError(err)).toBe(true);
    expect(onlineManager.isOnline()).toBe(false);
  });

  it('gives up on a request that hangs, after its timeout', async () => {
    global.fetch = jest.fn(
      (_url: string, init: RequestInit) => new Promise((_resolve, reject) => init.signal!.addEventListener('abort', () => reject(new DOMException('aborted', 'AbortError')))),
    ) as never;
    const started = Date.now();
    const err = await api('/me', { timeoutMs: 50 }).catch((e: unknown) => e);
    expect(isNetworkError(err)).toBe(true);
    expect(Date.now() - started).toBeLessThan(2000);
  });
});
