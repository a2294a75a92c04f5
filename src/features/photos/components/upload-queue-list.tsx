import { CircleAlert, CircleCheck, Copy, RotateCcw, X } from 'lucide-react';
import { Button } from '#src/components/ui/button.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { cn } from '#src/lib/cn.ts';
import { formatBytes } from '../lib/upload-errors.ts';
import type { UploadItem } from '../lib/upload-queue.ts';

type UploadQueueListProps = {
  workshopId: string;
  items: readonly UploadItem[];
  onCancel: (id: string) => void;
  onRetry: (id: string) => void;
  onRemove: (id: string) => void;
};

const STATUS_WORDS: Record<UploadItem['status'], string> = {
  waiting: 'Waiting',
  sending: 'Sending',
  storing: 'Storing',
  stored: 'Added',
  duplicate: 'Already in the gallery',
  failed: 'Not added',
  cancelled: 'Cancelled',
};

/** One row per file: its bar, what is happening in words, and what can be done. */
export function UploadQueueList({ workshopId, items, onCancel, onRetry, onRemove }: UploadQueueListProps) {
  return (
    <ul aria-label="Photos being added" className="flex flex-col gap-2">
      {items.map((item) => (
        <UploadRow key={item.id} workshopId={workshopId} item={item} onCancel={onCancel} onRetry={onRetry} onRemove={onRemove} />
      ))}
    </ul>
  );
}

function UploadRow({ workshopId, item, onCancel, onRetry, onRemove }: { workshopId: string; item: UploadItem } & Omit<UploadQueueListProps, 'items' | 'workshopId'>) {
  const name = item.file.name || 'photo';
  const percent =
    item.status === 'stored' || item.status === 'duplicate' || item.status === 'storing'
      ? 100
      : item.total > 0
        ? Math.min(100, Math.round((item.loaded / item.total) * 100))
        : 0;
  const active = item.status === 'waiting' || item.status === 'sending' || item.status === 'storing';
  const tone =
    item.status === 'failed' ? 'danger' : item.status === 'stored' ? 'sound' : item.status === 'duplicate' ? 'info' : 'neutral';

  return (
    <li
      className={cn(
        'flex flex-col gap-2 rounded-md border p-3',
        tone === 'danger' ? 'border-danger-line bg-danger-bg' : tone === 'sound' ? 'border-sound-line bg-sound-bg' : 'border-line bg-surface-raised',
      )}
      data-upload-status={item.status}
    >
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        <StatusIcon status={item.status} />
        <span className="min-w-0 flex-1 truncate font-medium text-ink" title={name}>
          {name}
        </span>
        <span className="figures text-caption text-ink-muted">{formatBytes(item.file.size)}</span>
      </div>

      {item.status !== 'failed' && item.status !== 'cancelled' ? (
        <div className="flex items-center gap-3">
          <div
            role="progressbar"
            aria-label={`${name} upload`}
            aria-valuemin={0}
            aria-valuemax={100}
            aria-valuenow={percent}
            aria-valuetext={`${percent} %, ${STATUS_WORDS[item.status].toLowerCase()}`}
            className="h-3 flex-1 overflow-hidden rounded-full border border-line-strong bg-surface-sunken"
          >
            <div
              className={cn('h-full rounded-full transition-[width]', item.status === 'storing' ? 'bg-ink motion-safe:animate-pulse' : 'bg-ink')}
              style={{ width: `${percent}%` }}
            />
          </div>
          <span className="figures w-12 text-right text-caption text-ink">{percent} %</span>
        </div>
      ) : null}

      <p className="text-caption text-ink" aria-live="polite">
        <span className="font-semibold">{STATUS_WORDS[item.status]}</span>
        {item.status === 'sending' ? ` · ${formatBytes(item.loaded)} of ${formatBytes(item.total)}` : null}
        {item.status === 'storing' ? ' · checking and storing the photo' : null}
        {item.status === 'stored' && item.photo ? (
          <>
            {' · '}
            <TextLink to={paths.photo.getHref(workshopId, item.photo.id)}>Open it to mark defects</TextLink>
          </>
        ) : null}
        {item.status === 'duplicate' && item.photo ? (
          <>
            {' · the same photo was added before. '}
            <TextLink to={paths.photo.getHref(workshopId, item.photo.id)}>Open the one in the gallery</TextLink>
          </>
        ) : null}
        {item.status === 'failed' && item.problem ? (
          <>
            {`: ${item.problem.title}. `}
            <span className="font-normal">{item.problem.detail}</span>
          </>
        ) : null}
      </p>

      <div className="flex flex-wrap gap-2">
        {active ? (
          <Button size="sm" icon={<X aria-hidden className="size-4" />} onClick={() => onCancel(item.id)}>
            Cancel<span className="sr-only"> {name}</span>
          </Button>
        ) : null}
        {item.status === 'cancelled' || (item.status === 'failed' && item.problem?.canRetry) ? (
          <Button size="sm" icon={<RotateCcw aria-hidden className="size-4" />} onClick={() => onRetry(item.id)}>
            Retry<span className="sr-only"> {name}</span>
          </Button>
        ) : null}
        {!active ? (
          <Button size="sm" variant="quiet" onClick={() => onRemove(item.id)}>
            Remove from list<span className="sr-only"> {name}</span>
          </Button>
        ) : null}
      </div>
    </li>
  );
}

function StatusIcon({ status }: { status: UploadItem['status'] }) {
  if (status === 'stored') return <CircleCheck aria-hidden className="size-5 shrink-0 text-sound" />;
  if (status === 'duplicate') return <Copy aria-hidden className="size-5 shrink-0 text-info" />;
  if (status === 'failed') return <CircleAlert aria-hidden className="size-5 shrink-0 text-danger" />;
  return <span aria-hidden className="size-5 shrink-0" />;
}
