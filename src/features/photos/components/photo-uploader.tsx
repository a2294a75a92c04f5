import { Camera, ImagePlus, ShieldCheck } from 'lucide-react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { Button } from '#src/components/ui/button.tsx';
import { cn } from '#src/lib/cn.ts';
import type { UploadPhotoFile } from '../api/upload-photo.ts';
import { useUploadQueue } from '../hooks/use-upload-queue.ts';
import { describeRejection, MAX_UPLOAD_BYTES } from '../lib/upload-errors.ts';
import { FINISHED } from '../lib/upload-queue.ts';
import { UploadQueueList } from './upload-queue-list.tsx';

/**
 * Every kind of photo a phone or camera makes. `image/*` stands alone (the
 * dropzone drops a wildcard that has extensions beside it), so a phone offers
 * its camera as well as its library; HEIC and HEIF are listed by extension
 * too, since some browsers give them no type. The server decides by content.
 */
export const PHOTO_ACCEPT = {
  'image/*': [],
  'image/heic': ['.heic'],
  'image/heif': ['.heif'],
};

type PhotoUploaderProps = {
  workshopId: string;
  castingId: string;
  /** Replaces the network upload (tests). */
  upload?: UploadPhotoFile;
};

/**
 * Add photos to a casting: drop several at once or choose them, and watch
 * each go up with its own bar, cancel and retry.
 */
export function PhotoUploader({ workshopId, castingId, upload }: PhotoUploaderProps) {
  const { queue, items } = useUploadQueue(workshopId, castingId, upload);

  type Rejected = { file: File; errors: readonly { code: string }[] };
  const onDrop = (accepted: File[], rejections: readonly (FileRejection | Rejected)[]) => {
    queue.add(accepted);
    for (const rejection of rejections) queue.reject(rejection.file, describeRejection(rejection.errors.map((e) => e.code)));
  };
  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    accept: PHOTO_ACCEPT,
    multiple: true,
    maxSize: MAX_UPLOAD_BYTES,
    onDrop,
    // The visible buttons open the picker (and are the keyboard's way in); the zone takes drops.
    noClick: true,
    noKeyboard: true,
  });
  const finished = items.filter((i) => FINISHED.includes(i.status)).length;

  return (
    <section aria-labelledby="upload-heading" className="flex flex-col gap-3">
      <h2 id="upload-heading" className="text-title font-semibold text-ink">
        Add photos
      </h2>
      <div
        {...getRootProps({
          className: cn(
            'flex flex-col items-center gap-3 rounded-lg border-2 border-dashed p-5 text-center lg:p-6',
            isDragActive ? 'border-ink bg-surface-sunken' : 'border-line-strong bg-surface-raised',
          ),
        })}
      >
        <input {...getInputProps({ 'aria-label': 'Photos to add' })} />
        <ImagePlus aria-hidden className="size-10 text-ink-muted" strokeWidth={1.5} />
        <p className="text-body text-ink">
          {isDragActive ? 'Drop to add them to this casting.' : 'Drag photos here, or choose them. Several at once is fine.'}
        </p>
        <div className="flex flex-wrap justify-center gap-3">
          <Button variant="primary" icon={<ImagePlus aria-hidden className="size-5" />} onClick={open}>
            Choose photos
          </Button>
          {/* A phone can go straight to its camera. */}
          <label className="hidden min-h-12 cursor-pointer items-center gap-2 rounded-md border border-line-strong bg-surface-raised px-4 font-semibold text-ink has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus pointer-coarse:inline-flex">
            <Camera aria-hidden className="size-5" />
            Take a photo
            <input
              type="file"
              accept="image/*"
              capture="environment"
              className="sr-only"
              onChange={(event) => {
                const files = [...(event.target.files ?? [])];
                event.target.value = '';
                onDrop(
                  files.filter((f) => f.size <= MAX_UPLOAD_BYTES),
                  files.filter((f) => f.size > MAX_UPLOAD_BYTES).map((file) => ({ file, errors: [{ code: 'file-too-large' }] })),
                );
              }}
            />
          </label>
        </div>
        <p className="text-caption text-ink-muted">JPEG, PNG, WebP or HEIC, up to 25 MB each.</p>
      </div>
      <p className="flex items-center gap-2 text-caption text-ink-muted">
        <ShieldCheck aria-hidden className="size-4 shrink-0" />
        Location data is removed from every photo.
      </p>
      {items.length ? (
        <>
          <UploadQueueList workshopId={workshopId} items={items} onCancel={queue.cancel} onRetry={queue.retry} onRemove={queue.remove} />
          {finished > 0 ? (
            <Button size="sm" variant="quiet" className="self-start" onClick={queue.clearFinished}>
              Clear finished
            </Button>
          ) : null}
        </>
      ) : null}
    </section>
  );
}
