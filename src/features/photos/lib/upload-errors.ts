import { isApiError } from '#src/lib/api-client.ts';
import { formatWait } from '#src/lib/format.ts';

export const MAX_UPLOAD_BYTES = 25 * 1024 * 1024;

export type UploadProblem = {
  /** A few words: what went wrong. */
  title: string;
  /** What to do about it. */
  detail: string;
  /** Whether sending the same file again can work. */
  canRetry: boolean;
};

/**
 * A failed upload in our words. The server's message names the file; the
 * queue row already does, so each known code gets its own sentence here and
 * the server's text is kept only for codes we do not know.
 */
export function describeUploadError(error: unknown): UploadProblem {
  if (!isApiError(error)) {
    return { title: 'Not uploaded', detail: 'Something went wrong in the browser. Try again.', canRetry: true };
  }
  switch (error.code) {
    case 'image-unsupported-type':
      return { title: 'Not a photo we can read', detail: 'Send a JPEG, PNG, WebP or HEIC photo.', canRetry: false };
    case 'upload-limit-file-size':
      return { title: 'Too large', detail: 'A photo can be at most 25 MB. Send a smaller copy.', canRetry: false };
    case 'image-too-many-pixels':
      return {
        title: 'Too many pixels',
        detail: 'The image has more than 100 megapixels. Scale it down (8000 × 6000 px is plenty) and send it again.',
        canRetry: false,
      };
    case 'image-unreadable':
      return {
        title: 'Damaged file',
        detail: 'The photo is incomplete or damaged. Copy it from the camera or phone again and send the new copy.',
        canRetry: false,
      };
    case 'storage-unavailable':
      return {
        title: 'Photo store not answering',
        detail: `Nothing was saved. Try again${error.retryAfterSeconds ? ` in ${formatWait(error.retryAfterSeconds)}` : ' shortly'}.`,
        canRetry: true,
      };
    case 'forbidden':
      return {
        title: 'Not your casting',
        detail: 'Photos go on your own castings. Ask the caster or an admin to add this one.',
        canRetry: false,
      };
    case 'casting-not-found':
      return { title: 'Casting not found', detail: 'It may have been deleted. Open the heat again.', canRetry: false };
    case 'network-error':
      return { title: 'Connection lost', detail: 'Pourscope could not be reached. Check the connection and try again.', canRetry: true };
    default:
      return {
        title: 'Not uploaded',
        detail: error.message || 'Try again.',
        canRetry: error.status === 0 || error.status >= 500 || error.status === 429,
      };
  }
}

/** For files the dropzone turns away before sending. */
export function describeRejection(codes: readonly string[]): UploadProblem {
  if (codes.includes('file-too-large')) {
    return { title: 'Too large', detail: 'A photo can be at most 25 MB. Send a smaller copy.', canRetry: false };
  }
  if (codes.includes('file-invalid-type')) {
    return { title: 'Not a photo', detail: 'Only photos can go here: JPEG, PNG, WebP or HEIC.', canRetry: false };
  }
  return { title: 'Not added', detail: 'This file cannot be uploaded.', canRetry: false };
}

/** "3.4 MB", "640 kB": file sizes in decimal units, as phones and cameras show them. */
export function formatBytes(bytes: number): string {
  if (bytes >= 1_000_000) return `${(bytes / 1_000_000).toFixed(1)} MB`;
  if (bytes >= 1_000) return `${Math.round(bytes / 1_000)} kB`;
  return `${bytes} B`;
}
