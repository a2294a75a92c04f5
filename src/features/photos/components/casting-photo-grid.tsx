import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { photoQueries } from '../api/photo-queries.ts';
import { GroupBadges } from './group-shape.tsx';
import { PhotoThumb } from './photo-thumb.tsx';
import { photoLabel } from '../lib/photo-labels.ts';

/** The casting's photos, newest first; each opens its photo page. */
export function CastingPhotoGrid({ workshopId, castingId }: { workshopId: string; castingId: string }) {
  const { data } = useSuspenseQuery(photoQueries.list(workshopId, { castingId }));
  if (!data.items.length) {
    return <p className="text-body text-ink-muted">No photos of this casting yet. Add them below; then open one to mark its defects.</p>;
  }
  return (
    <ul className="grid grid-cols-2 items-start gap-3 sm:grid-cols-3 xl:grid-cols-4" aria-label="Photos of this casting">
      {data.items.map((photo) => (
        <li key={photo.id}>
          <Link
            to={paths.photo.getHref(workshopId, photo.id)}
            className="flex flex-col gap-1.5 rounded-md p-1 text-ink no-underline hover:bg-surface-sunken"
          >
            <PhotoThumb src={photo.urls.thumb} size={photo.thumb} />
            <span className="text-body font-medium">{photoLabel(photo)}</span>
            <span className="text-caption text-ink-muted">
              <span className="figures">{photo.marks.length}</span> {photo.marks.length === 1 ? 'mark' : 'marks'}
            </span>
            <GroupBadges kinds={photo.marks.map((m) => m.kind)} />
          </Link>
        </li>
      ))}
    </ul>
  );
}
