import { useQuery } from '@tanstack/react-query';
import { Images } from 'lucide-react';
import { Link } from 'react-router-dom';
import type { DefectKind } from '#shared/domain/index.ts';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { Skeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { isApiError } from '#src/lib/api-client.ts';
import { GUIDE_PHOTO_LIMIT, guidePhotoQueries } from '../api/guide-photo-queries.ts';

/** The gallery, filtered to one defect kind. */
export const galleryHrefFor = (workshopId: string, kind: DefectKind['id']) =>
  `${paths.gallery.getHref(workshopId)}?kind=${encodeURIComponent(kind)}`;

/**
 * Up to eight of the workshop's own photos marked with this defect, each in
 * a box reserved from its stored size so nothing jumps as they load. A
 * failure here never takes the guide page down with it.
 */
export function KindPhotos({ workshopId, kind }: { workshopId: string; kind: DefectKind }) {
  const photos = useQuery(guidePhotoQueries.examples(workshopId, kind.id));
  const galleryHref = galleryHrefFor(workshopId, kind.id);

  return (
    <section aria-labelledby="kind-photos" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="kind-photos" className="text-title font-semibold text-ink">
          In your workshop's photos
        </h2>
        <ButtonLink to={galleryHref} size="sm" icon={<Images aria-hidden className="size-4" />}>
          Gallery: every photo marked {kind.shortName.toLowerCase()}
        </ButtonLink>
      </div>
      {photos.isPending ? (
        <div role="status" className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          <span className="sr-only">Loading photos</span>
          {Array.from({ length: 4 }, (_, i) => (
            <Skeleton key={i} className="aspect-[4/3] w-full" />
          ))}
        </div>
      ) : photos.isError ? (
        <Notice tone="danger" title="The photos did not load">
          <p>{isApiError(photos.error) ? photos.error.message : 'Try again in a moment.'}</p>
        </Notice>
      ) : photos.data.items.length === 0 ? (
        <Notice tone="info" title={`No photo is marked ${kind.shortName.toLowerCase()} yet`}>
          <p>
            When you see it on a casting, photograph it, open the photo in the gallery and mark it: it will show here, beside this
            description, for the next caster who meets it.
          </p>
        </Notice>
      ) : (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-4" aria-label={`Photos marked ${kind.shortName}`}>
          {photos.data.items.slice(0, GUIDE_PHOTO_LIMIT).map((photo) => {
            const label = photo.title ?? `${kind.shortName} on a casting${photo.alloy ? ` of ${photo.alloy}` : ''}`;
            return (
              <li key={photo.id}>
                <Link to={paths.photo.getHref(workshopId, photo.id)} className="flex flex-col gap-1 text-ink no-underline">
                  <span
                    className="relative block w-full overflow-hidden rounded-md bg-surface-sunken"
                    style={{ aspectRatio: `${photo.thumb.width} / ${photo.thumb.height}` }}
                  >
                    <img
                      src={photo.urls.thumb}
                      alt=""
                      width={photo.thumb.width}
                      height={photo.thumb.height}
                      loading="lazy"
                      decoding="async"
                      className="absolute inset-0 h-full w-full object-cover"
                    />
                  </span>
                  <span className="truncate text-caption font-medium text-link underline">{label}</span>
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
