import { ApiError, reportUnauthenticated, toApiError, writeToken } from './http';

// File uploads go through XMLHttpRequest, not fetch(): only XHR reports upload progress, and a
// ten-year CSV on a weak allotment signal takes long enough that a grower wants to see it move.

/** 0…1 while the file is being sent; null once it has arrived and the server is working on it. */
export type UploadProgress = (fraction: number | null) => void;

function parse(text: string): unknown {
  try {
    return text ? (JSON.parse(text) as unknown) : undefined;
  } catch {
    return undefined;
  }
}

function sendOnce(path: string, form: FormData, token: string, onProgress?: UploadProgress): Promise<{ status: number; payload: unknown }> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', path);
    xhr.setRequestHeader('accept', 'application/json');
    xhr.setRequestHeader('x-csrf-token', token);
    xhr.withCredentials = true;
    xhr.upload.addEventListener('progress', (e) => onProgress?.(e.lengthComputable ? e.loaded / e.total : null));
    xhr.upload.addEventListener('load', () => onProgress?.(null));
    xhr.addEventListener('load', () => resolve({ status: xhr.status, payload: parse(xhr.responseText) }));
    xhr.addEventListener('error', () => reject(new ApiError(0, 'NETWORK', "Can't reach Spurwood. Check your signal and try again.")));
    xhr.addEventListener('abort', () => reject(new ApiError(0, 'ABORTED', 'The upload was stopped.')));
    xhr.send(form);
  });
}

/** POSTs a file (field `file`) with text fields beside it; answers like http.post. */
export async function uploadFile<T>(path: string, file: File, fields: Record<string, string>, onProgress?: UploadProgress): Promise<T> {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  form.append('file', file, file.name);
  let answer = await sendOnce(path, form, await writeToken(), onProgress);
  let error = answer.status >= 400 ? toApiError(answer.status, answer.payload) : null;
  if (error && error.status === 403 && /csrf/i.test(error.code)) {
    // The token belongs to the session; after a server restart one fresh token is worth a retry.
    answer = await sendOnce(path, form, await writeToken(true), onProgress);
    error = answer.status >= 400 ? toApiError(answer.status, answer.payload) : null;
  }
  if (!error) return answer.payload as T;
  if (error.status === 401) reportUnauthenticated();
  throw error;
}
