import { useQueryClient } from '@tanstack/react-query';
import { useState, useSyncExternalStore } from 'react';
import { invalidateAfterUpload } from '../api/photo-invalidation.ts';
import { photoUploader, type UploadPhotoFile } from '../api/upload-photo.ts';
import { createUploadQueue } from '../lib/upload-queue.ts';

/**
 * The upload queue of one casting. Each stored photo refreshes the casting's
 * photos, the gallery and the search index. Key the component by casting, so
 * a different casting gets a fresh queue.
 */
export function useUploadQueue(workshopId: string, castingId: string, upload?: UploadPhotoFile) {
  const queryClient = useQueryClient();
  const [queue] = useState(() =>
    createUploadQueue({
      upload: upload ?? photoUploader(workshopId, castingId),
      onResult: () => void invalidateAfterUpload(queryClient, workshopId, castingId),
    }),
  );
  const items = useSyncExternalStore(queue.subscribe, queue.getSnapshot, queue.getSnapshot);
  return { queue, items };
}
