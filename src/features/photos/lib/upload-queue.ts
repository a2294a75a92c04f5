import type { Photo, UploadResult } from '#shared/photos/photo-schemas.ts';
import type { UploadPhotoFile } from '../api/upload-photo.ts';
import { describeUploadError, type UploadProblem } from './upload-errors.ts';

export type UploadStatus =
  /** In the queue, not sent yet. */
  | 'waiting'
  /** Bytes going up. */
  | 'sending'
  /** All bytes sent; the server is decoding and storing it. */
  | 'storing'
  | 'stored'
  /** The same photo is already in the workshop. */
  | 'duplicate'
  | 'failed'
  | 'cancelled';

export type UploadItem = {
  id: string;
  file: File;
  status: UploadStatus;
  loaded: number;
  total: number;
  problem: UploadProblem | null;
  photo: Photo | null;
};

export const FINISHED: readonly UploadStatus[] = ['stored', 'duplicate', 'failed', 'cancelled'];
const ACTIVE: readonly UploadStatus[] = ['sending', 'storing'];

type QueueOptions = {
  upload: UploadPhotoFile;
  /** How many files go up at once; two keeps a phone's upload busy without starving either. */
  concurrency?: number;
  /** After each photo is stored or found to be a duplicate. */
  onResult?: (result: UploadResult) => void;
};

let nextId = 0;

/**
 * The upload queue for one casting, outside React so its rules are easy to
 * test: files wait, go up `concurrency` at a time, and each can be cancelled
 * (the request is aborted) or retried (sent again). The component reads it
 * through useSyncExternalStore.
 */
export function createUploadQueue({ upload, concurrency = 2, onResult }: QueueOptions) {
  let items: readonly UploadItem[] = [];
  const controllers = new Map<string, AbortController>();
  const listeners = new Set<() => void>();

  const emit = () => listeners.forEach((l) => l());
  const patch = (id: string, change: Partial<UploadItem>) => {
    items = items.map((item) => (item.id === id ? { ...item, ...change } : item));
    emit();
  };
  const find = (id: string) => items.find((item) => item.id === id);

  function pump() {
    let running = items.filter((item) => ACTIVE.includes(item.status)).length;
    for (const item of items) {
      if (running >= concurrency) break;
      if (item.status !== 'waiting') continue;
      running += 1;
      void send(item);
    }
  }

  async function send(item: UploadItem) {
    const controller = new AbortController();
    controllers.set(item.id, controller);
    patch(item.id, { status: 'sending', loaded: 0, total: item.file.size, problem: null });
    try {
      const result = await upload(item.file, {
        signal: controller.signal,
        onProgress: ({ loaded, total }) => {
          if (find(item.id)?.status !== 'sending' && find(item.id)?.status !== 'storing') return;
          patch(item.id, { loaded, total, status: total > 0 && loaded >= total ? 'storing' : 'sending' });
        },
      });
      if (controller.signal.aborted) return;
      patch(item.id, { status: result.status, loaded: item.file.size, total: item.file.size, photo: result.photo });
      onResult?.(result);
    } catch (error) {
      if (controller.signal.aborted || (error instanceof DOMException && error.name === 'AbortError')) {
        patch(item.id, { status: 'cancelled' });
      } else {
        patch(item.id, { status: 'failed', problem: describeUploadError(error) });
      }
    } finally {
      if (controllers.get(item.id) === controller) controllers.delete(item.id);
      pump();
    }
  }

  return {
    subscribe(listener: () => void) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    getSnapshot: () => items,

    /** Queues files and starts sending. */
    add(files: readonly File[]) {
      if (!files.length) return;
      items = [
        ...items,
        ...files.map((file) => ({
          id: `upload-${(nextId += 1)}`,
          file,
          status: 'waiting' as const,
          loaded: 0,
          total: file.size,
          problem: null,
          photo: null,
        })),
      ];
      emit();
      pump();
    },

    /** A file turned away before sending (wrong type, too large): shown with its reason, never sent. */
    reject(file: File, problem: UploadProblem) {
      items = [...items, { id: `upload-${(nextId += 1)}`, file, status: 'failed', loaded: 0, total: file.size, problem, photo: null }];
      emit();
    },

    cancel(id: string) {
      const item = find(id);
      if (!item) return;
      if (item.status === 'waiting') {
        patch(id, { status: 'cancelled' });
        return;
      }
      const controller = controllers.get(id);
      if (controller) {
        patch(id, { status: 'cancelled' });
        controller.abort();
      }
    },

    retry(id: string) {
      const item = find(id);
      if (!item || (item.status !== 'failed' && item.status !== 'cancelled')) return;
      patch(id, { status: 'waiting', loaded: 0, problem: null });
      pump();
    },

    remove(id: string) {
      const item = find(id);
      if (!item || !FINISHED.includes(item.status)) return;
      items = items.filter((i) => i.id !== id);
      emit();
    },

    clearFinished() {
      items = items.filter((item) => !FINISHED.includes(item.status));
      emit();
    },
  };
}

export type UploadQueue = ReturnType<typeof createUploadQueue>;
