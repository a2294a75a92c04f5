import { uploadResponseSchema, type UploadResult } from '#shared/photos/photo-schemas.ts';
import { ApiError, apiErrorFrom, csrfTokenForRequest } from '#src/lib/api-client.ts';
import { photosBase } from './photo-queries.ts';

export type UploadProgress = { loaded: number; total: number };

export type UploadOptions = {
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
};

/** Sends one photo; resolves with its result or rejects with ApiError (or an AbortError DOMException). */
export type UploadPhotoFile = (file: File, options: UploadOptions) => Promise<UploadResult>;

function abortError() {
  return new DOMException('The upload was cancelled', 'AbortError');
}

function parseBody(text: string): unknown {
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return text;
  }
}

/**
 * One XMLHttpRequest carrying one file (field `photos`), because fetch has no
 * upload progress: each file gets its own bar, its own cancel and retry.
 */
function sendOnce(url: string, file: File, token: string | undefined, { onProgress, signal }: UploadOptions) {
  return new Promise<{ status: number; body: unknown; retryAfter: string | null }>((resolve, reject) => {
    if (signal?.aborted) {
      reject(abortError());
      return;
    }
    const xhr = new XMLHttpRequest();
    const onAbort = () => xhr.abort();
    signal?.addEventListener('abort', onAbort, { once: true });
    const done = () => signal?.removeEventListener('abort', onAbort);

    xhr.open('POST', url);
    xhr.withCredentials = true;
    xhr.setRequestHeader('accept', 'application/json');
    if (token) xhr.setRequestHeader('x-csrf-token', token);
    xhr.upload.onprogress = (event: ProgressEvent) => {
      onProgress?.({ loaded: event.loaded, total: event.lengthComputable ? event.total : file.size });
    };
    xhr.onload = () => {
      done();
      resolve({ status: xhr.status, body: parseBody(xhr.responseText), retryAfter: xhr.getResponseHeader('retry-after') });
    };
    xhr.onerror = () => {
      done();
      reject(
        new ApiError({ status: 0, code: 'network-error', message: 'Pourscope could not be reached. Check the connection and try again.' }),
      );
    };
    xhr.onabort = () => {
      done();
      reject(abortError());
    };
    const form = new FormData();
    form.append('photos', file, file.name);
    xhr.send(form);
  });
}

/** The uploader for one casting: POST /castings/:castingId/photos, one file per request. */
export function photoUploader(workshopId: string, castingId: string): UploadPhotoFile {
  const url = `/api${photosBase(workshopId)}/castings/${encodeURIComponent(castingId)}/photos`;
  return async (file, options) => {
    let answer = await sendOnce(url, file, await csrfTokenForRequest(), options);
    // The session was regenerated elsewhere (another tab signed in): take the new token once.
    if (answer.status === 403 && apiErrorFrom(answer.status, answer.body, null).code === 'csrf-invalid') {
      answer = await sendOnce(url, file, await csrfTokenForRequest({ fresh: true }), options);
    }
    if (answer.status < 200 || answer.status >= 300) throw apiErrorFrom(answer.status, answer.body, answer.retryAfter);
    const [result] = uploadResponseSchema.parse(answer.body).results;
    if (!result) throw new ApiError({ status: answer.status, code: 'empty-answer', message: 'The server did not say what it stored.' });
    return result;
  };
}
