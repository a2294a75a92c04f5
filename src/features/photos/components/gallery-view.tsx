import { useInfiniteQuery, useQuery } from '@tanstack/react-query';
import { Images, SearchX } from 'lucide-react';
import { useCallback, useDeferredValue, useMemo, useState } from 'react';
import { Button } from '#src/components/ui/button.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { ErrorPanel } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { Skeleton } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { photoQueries } from '../api/photo-queries.ts';
import { useGalleryView } from '../hooks/use-gallery-view.ts';
import { filtersOf, hasFilters, matchesFilters } from '../lib/gallery-filters.ts';
import { itemFromIndex, itemFromPhoto, type GalleryItem } from '../lib/gallery-items.ts';
import { createPhotoSearch } from '../lib/photo-search.ts';
import { GalleryFilterBar, type CasterOption } from './gallery-filter-bar.tsx';
import { GalleryGrid } from './gallery-grid.tsx';
import { PhotoLightbox } from './photo-lightbox.tsx';

type GalleryViewProps = { workshopId: string; casters: readonly CasterOption[] };

/**
 * The workshop's photos. With search text, the matches come from the photo
 * index (fetched once and searched here, forgiving of misspellings);
 * otherwise from the server's list, newest first, a page at a time as you
 * scroll. The same filters apply to both.
 */
export function GalleryView({ workshopId, casters }: GalleryViewProps) {
  const { view, update, clear } = useGalleryView();
  const filters = filtersOf(view);
  const query = useDeferredValue(view.q?.trim() ?? '');
  const searching = query.length > 0;
  const [indexWanted, setIndexWanted] = useState(false);
  const [open, setOpen] = useState<number | null>(null);

  const list = useInfiniteQuery({ ...photoQueries.infinite(workshopId, filters), enabled: !searching });
  const index = useQuery({ ...photoQueries.index(workshopId), enabled: searching || indexWanted });

  const search = useMemo(() => (index.data ? createPhotoSearch(index.data) : null), [index.data]);
  const casterNames = useMemo(() => new Map(casters.map((c) => [c.id, c.name])), [casters]);
  const seenAlloys = useMemo(
    () => [...new Set((index.data ?? []).map((i) => i.alloy).filter((a): a is string => Boolean(a)))].sort(),
    [index.data],
  );

  let items: GalleryItem[] | null = null;
  if (searching) {
    if (search) items = search(query).filter((i) => matchesFilters(i, filters, casterNames)).map(itemFromIndex);
  } else if (list.data) {
    items = list.data.pages.flatMap((p) => p.items).map(itemFromPhoto);
  }
  const error = searching ? index.error : list.error;
  const hasMore = !searching && Boolean(list.hasNextPage);
  const { fetchNextPage } = list;
  const loadMore = useCallback(() => void fetchNextPage({ cancelRefetch: false }), [fetchNextPage]);

  // The sentinel under the grid asks for the next page as it comes near the screen.
  const sentinel = useCallback(
    (el: HTMLDivElement | null) => {
      if (!el || typeof IntersectionObserver === 'undefined') return;
      const observer = new IntersectionObserver((entries) => {
        if (entries.some((e) => e.isIntersecting)) loadMore();
      }, { rootMargin: '800px 0px' });
      observer.observe(el);
      return () => observer.disconnect();
    },
    [loadMore],
  );

  const filtered = hasFilters(view);

  return (
    <div className="flex flex-col gap-5">
      <GalleryFilterBar
        view={view}
        onChange={(change, options) => {
          setOpen(null);
          update(change, options);
        }}
        onClear={clear}
        casters={casters}
        seenAlloys={seenAlloys}
        onSearchFocus={() => setIndexWanted(true)}
      />

      {error ? (
        <ErrorPanel
          error={error}
          reset={() => void (searching ? index.refetch() : list.refetch())}
          title={searching ? 'The search did not load' : 'The photos did not load'}
        />
      ) : items === null ? (
        <GallerySkeleton />
      ) : items.length === 0 ? (
        searching || filtered ? (
          <NoMatches onClear={clear} query={searching ? query : null} />
        ) : (
          <EmptyGallery workshopId={workshopId} />
        )
      ) : (
        <section aria-labelledby="gallery-results" className="flex flex-col gap-3">
          <h2 id="gallery-results" className="text-body text-ink-muted" aria-live="polite">
            {searching ? (
              <>
                <span className="figures text-ink">{items.length}</span> {items.length === 1 ? 'photo matches' : 'photos match'} “{query}”
              </>
            ) : (
              <>
                Showing <span className="figures text-ink">{items.length}</span> {items.length === 1 ? 'photo' : 'photos'}, newest first
                {hasMore ? '; more below' : ''}
              </>
            )}
          </h2>
          <GalleryGrid workshopId={workshopId} items={items} onOpen={setOpen} label={searching ? 'Search results' : 'Photos'} />
          {hasMore ? (
            <div ref={sentinel} className="flex justify-center pt-2">
              <Button onClick={loadMore} pending={list.isFetchingNextPage} pendingLabel="Loading more photos…">
                Load more photos
              </Button>
            </div>
          ) : null}
          {list.isFetchingNextPage ? <GallerySkeleton count={4} /> : null}
        </section>
      )}

      {open !== null && items?.[open] ? (
        <PhotoLightbox
          workshopId={workshopId}
          items={items}
          index={open}
          onIndexChange={setOpen}
          onClose={() => setOpen(null)}
          hasMore={hasMore}
          onNeedMore={loadMore}
        />
      ) : null}
    </div>
  );
}

export function GallerySkeleton({ count = 8 }: { count?: number }) {
  return (
    <div role="status" className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4 2xl:grid-cols-5">
      <span className="sr-only">Loading photos</span>
      {Array.from({ length: count }, (_, i) => (
        <div key={i} className="flex flex-col gap-2">
          <Skeleton className="aspect-[4/3] w-full" />
          <Skeleton className="h-4 w-3/4" />
          <Skeleton className="h-3 w-1/2" />
        </div>
      ))}
    </div>
  );
}

function NoMatches({ onClear, query }: { onClear: () => void; query: string | null }) {
  return (
    <Notice tone="info" title={query ? `No photos match “${query}”` : 'No photos match these filters'}>
      <div className="flex flex-col items-start gap-3">
        <p>
          {query
            ? 'Try fewer words, the defect’s everyday name (“bubbles”, “crack”), an alloy or a caster’s name.'
            : 'Widen the dates or choose “Any” for one of the filters.'}
        </p>
        <Button size="sm" icon={<SearchX aria-hidden className="size-4" />} onClick={onClear}>
          Clear search and filters
        </Button>
      </div>
    </Notice>
  );
}

function EmptyGallery({ workshopId }: { workshopId: string }) {
  return (
    <EmptyState
      icon={Images}
      title="No photos yet"
      firstStep={
        <p>
          Open a heat in the <TextLink to={paths.heats.getHref(workshopId)}>heat log</TextLink>, choose one of its castings and add
          photos there: straight from the phone’s camera, or several at once from a computer. Photograph each casting as it comes out of
          the mould, and again once it is fettled.
        </p>
      }
    >
      <p>
        Every photo belongs to a casting, and every casting to the heat it was poured from. On a photo you mark each defect you see: an
        outline, a number and the defect’s name, with its severity.
      </p>
      <p>Good light and one casting per photo make marks easier to read. Marked photos are what a defect report is built from.</p>
    </EmptyState>
  );
}
