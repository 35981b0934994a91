// Multipart uploads with progress. `api()` sends JSON; a file goes as FormData through XMLHttpRequest, the one
// browser API that reports upload progress (fetch does not), with the same bearer token and error shape.
import { ApiError, getApiToken, type ApiErrorBody } from './client';

const base = process.env.EXPO_PUBLIC_API_URL ?? '';

/** A file the person chose: on the web the browser's File; in the native app a local uri. */
export interface PickedFile {
  name: string;
  size: number | null;
  mimeType: string | null;
  uri: string;
  file?: File;
}

/** Adds the chosen file to a form under `field`. */
export function appendFile(form: FormData, field: string, picked: PickedFile): void {
  if (picked.file) form.append(field, picked.file, picked.name);
  // React Native's FormData takes a { uri, name, type } part and streams the file itself.
  else form.append(field, { uri: picked.uri, name: picked.name, type: picked.mimeType ?? 'application/octet-stream' } as unknown as Blob);
}

export interface UploadOptions {
  /** From 0 to 1 as the bytes leave; 1 once all are sent and the server is working on them. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
}

/** POSTs a multipart form to /api<path>; answers the JSON body, or throws an ApiError like `api()` does. */
export function upload<T>(path: string, form: FormData, { onProgress, signal }: UploadOptions = {}): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${base}/api${path}`);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getApiToken();
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    if (onProgress) {
      xhr.upload.onprogress = (e) => {
        if (e.lengthComputable && e.total > 0) onProgress(Math.min(1, e.loaded / e.total));
      };
      xhr.upload.onload = () => onProgress(1);
    }
    xhr.onload = () => {
      const data = readJson(xhr.responseText);
      if (xhr.status >= 200 && xhr.status < 300) {
        resolve(data as T);
        return;
      }
      const err = (data as { error?: ApiErrorBody } | null)?.error;
      reject(new ApiError(xhr.status, err?.code ?? 'http_error', err?.message ?? `The server answered ${xhr.status}.`, err?.details ?? null));
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'The upload did not reach the server. Check the connection and try again.', null));
    xhr.onabort = () => reject(new ApiError(0, 'aborted', 'The upload was stopped.', null));
    signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(form);
  });
}

function readJson(text: string): unknown {
  if (!text) return null;
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}
