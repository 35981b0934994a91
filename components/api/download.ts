// Files the API serves behind the bearer token (exports, templates, attachments). A plain link cannot carry
// the token, so the file is fetched as a blob and handed to the browser through an object URL.
import { Platform } from 'react-native';
import { ApiError, getApiToken, type ApiErrorBody } from './client';

const base = process.env.EXPO_PUBLIC_API_URL ?? '';
// Long enough for a new tab to read the blob; the URL is then released.
const REVOKE_AFTER_MS = 60_000;

/** GET /api<path> as a blob, with the file name the server suggests (Content-Disposition). */
export async function fetchFile(path: string): Promise<{ blob: Blob; fileName: string | null }> {
  const token = getApiToken();
  let res: Response;
  try {
    res = await fetch(`${base}/api${path}`, { headers: token ? { Authorization: `Bearer ${token}` } : {} });
  } catch {
    throw new ApiError(0, 'network', 'The server could not be reached. Check the connection and try again.', null);
  }
  if (!res.ok) {
    let err: ApiErrorBody | undefined;
    try {
      err = ((await res.json()) as { error?: ApiErrorBody }).error;
    } catch {
      err = undefined;
    }
    throw new ApiError(res.status, err?.code ?? 'http_error', err?.message ?? `The server answered ${res.status}.`, err?.details ?? null);
  }
  return { blob: await res.blob(), fileName: fileNameOf(res.headers.get('Content-Disposition')) };
}

/** The name in Content-Disposition: the UTF-8 `filename*` (RFC 8187) when there is one, else the plain (ASCII) one. */
function fileNameOf(disposition: string | null): string | null {
  if (!disposition) return null;
  const extended = /filename\*\s*=\s*UTF-8''([^;\s]+)/i.exec(disposition);
  if (extended) {
    try {
      return decodeURIComponent(extended[1]);
    } catch {
      // A malformed escape: the plain name below.
    }
  }
  const plain = /filename\s*=\s*"?([^";]+)"?/i.exec(disposition);
  return plain ? plain[1] : null;
}

function requireWeb(): void {
  if (Platform.OS !== 'web' || typeof document === 'undefined') {
    throw new ApiError(0, 'not_supported', 'Saving files works in the web app; open Bungwise in a browser to download this file.', null);
  }
}

function release(url: string): void {
  setTimeout(() => URL.revokeObjectURL(url), REVOKE_AFTER_MS);
}

/** Saves the file to the device (the browser's download). */
export async function saveFile(path: string, fallbackName: string): Promise<void> {
  requireWeb();
  const { blob, fileName } = await fetchFile(path);
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName ?? fallbackName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  release(url);
}

/** Shows the file in a new tab (PDFs and photos); falls back to saving it when the browser blocks the tab. */
export async function openFile(path: string, fallbackName: string): Promise<void> {
  requireWeb();
  const { blob, fileName } = await fetchFile(path);
  const url = URL.createObjectURL(blob);
  // Not the 'noopener' feature: with it window.open always answers null and a blocked tab could not be told apart.
  const tab = window.open(url, '_blank');
  if (tab) tab.opener = null;
  else {
    const a = document.createElement('a');
    a.href = url;
    a.download = fileName ?? fallbackName;
    document.body.appendChild(a);
    a.click();
    a.remove();
  }
  release(url);
}
