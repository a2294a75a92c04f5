import { useQuery, useQueryClient } from '@tanstack/react-query';
import { ChevronLeft, ChevronRight, ExternalLink } from 'lucide-react';
import { useRef, type KeyboardEvent, type PointerEvent } from 'react';
import { ButtonLink, Button } from '#src/components/ui/button.tsx';
import { paths } from '#src/config/paths.ts';
import { photoQueries } from '../api/photo-queries.ts';
import { useLabelScale } from '../hooks/use-label-scale.ts';
import type { GalleryItem } from '../lib/gallery-items.ts';
import { numberMarks } from '../lib/photo-labels.ts';
import { DefectKindTag } from './group-shape.tsx';
import { MarkOverlay } from './mark-overlay.tsx';
import { ModalDialog } from './modal-dialog.tsx';
import { PhotoCanvas } from './photo-canvas.tsx';

type PhotoLightboxProps = {
  workshopId: string;
  items: readonly GalleryItem[];
  index: number;
  onIndexChange: (index: number) => void;
  onClose: () => void;
  /** More results exist beyond the last one (the next page loads when it is reached). */
  hasMore?: boolean;
  onNeedMore?: () => void;
};

const SWIPE_PX = 60;

/**
 * One photo of the current results, large, with its marks: ← and → (or a
 * swipe) step through them, Esc closes, and the photo page is a link away.
 */
export function PhotoLightbox({ workshopId, items, index, onIndexChange, onClose, hasMore, onNeedMore }: PhotoLightboxProps) {
  const item = items[index];
  const queryClient = useQueryClient();
  const { data: photo } = useQuery({ ...photoQueries.detail(workshopId, item?.id ?? ''), enabled: Boolean(item) });
  const swipe = useRef<{ x: number; id: number } | null>(null);
  const { boxRef } = useLabelScale(photo?.display.width ?? item?.thumb.width ?? 1);

  if (!item) return null;
  const last = index === items.length - 1;
  const go = (to: number) => {
    if (to >= items.length && hasMore) onNeedMore?.();
    if (to < 0 || to >= items.length) return;
    onIndexChange(to);
    const after = items[to + 1];
    if (after) void queryClient.prefetchQuery(photoQueries.detail(workshopId, after.id));
    if (to >= items.length - 3 && hasMore) onNeedMore?.();
  };

  const onKeyDown = (event: KeyboardEvent<HTMLDialogElement>) => {
    if (event.key === 'ArrowRight') {
      event.preventDefault();
      go(index + 1);
    } else if (event.key === 'ArrowLeft') {
      event.preventDefault();
      go(index - 1);
    }
  };
  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    if (event.pointerType !== 'mouse') swipe.current = { x: event.clientX, id: event.pointerId };
  };
  const onPointerUp = (event: PointerEvent<HTMLDivElement>) => {
    const start = swipe.current;
    swipe.current = null;
    if (!start || start.id !== event.pointerId) return;
    const dx = event.clientX - start.x;
    if (dx <= -SWIPE_PX) go(index + 1);
    else if (dx >= SWIPE_PX) go(index - 1);
  };

  const marks = photo ? numberMarks(photo.marks) : [];
  const ratio = item.thumb.width / item.thumb.height;

  return (
    <ModalDialog
      title={
        <>
          {item.label}{' '}
          <span className="figures text-body font-normal text-ink-muted">
            ({index + 1} of {items.length}
            {hasMore ? '+' : ''})
          </span>
        </>
      }
      onClose={onClose}
      onKeyDown={onKeyDown}
      className="lg:w-[min(92vw,80rem)] lg:max-h-[94dvh]"
    >
      <div className="flex flex-col gap-3 p-3 lg:p-4">
        <div
          className="mx-auto w-full overflow-hidden rounded-md bg-graphite-980 touch-pan-y"
          style={{ maxWidth: `calc(70dvh * ${ratio})` }}
          onPointerDown={onPointerDown}
          onPointerUp={onPointerUp}
          onPointerCancel={() => (swipe.current = null)}
        >
          <PhotoCanvas
            key={item.id}
            src={photo?.urls.display ?? item.thumbUrl}
            placeholderSrc={photo ? item.thumbUrl : undefined}
            alt={`${item.label}${marks.length ? `, ${marks.length} ${marks.length === 1 ? 'mark' : 'marks'}` : ''}`}
            size={item.thumb}
            boxRef={boxRef}
          >
            {photo ? <MarkOverlay size={photo.display} marks={marks} /> : null}
          </PhotoCanvas>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <Button icon={<ChevronLeft aria-hidden className="size-5" />} disabled={index === 0} onClick={() => go(index - 1)}>
            Previous
          </Button>
          <Button disabled={last && !hasMore} onClick={() => go(index + 1)}>
            Next
            <ChevronRight aria-hidden className="size-5" />
          </Button>
          <ButtonLink variant="primary" to={paths.photo.getHref(workshopId, item.id)} icon={<ExternalLink aria-hidden className="size-5" />} data-autofocus>
            Open the photo page
          </ButtonLink>
          <span className="text-caption text-ink-muted">← and → step through; Esc closes.</span>
        </div>
        {marks.length ? (
          <ol className="flex flex-wrap gap-x-4 gap-y-2" aria-label="Marks">
            {marks.map((m) => (
              <li key={m.id}>
                <DefectKindTag kind={m.kind} number={m.number} />
              </li>
            ))}
          </ol>
        ) : photo ? (
          <p className="text-caption text-ink-muted">No marks on this photo yet.</p>
        ) : null}
      </div>
    </ModalDialog>
  );
}
