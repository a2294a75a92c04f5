import { Link } from 'react-router-dom';
import { paths } from '#src/config/paths.ts';
import { formatDate } from '#src/lib/format.ts';
import type { GalleryItem } from '../lib/gallery-items.ts';
import { GroupBadges } from './group-shape.tsx';
import { PhotoThumb } from './photo-thumb.tsx';

type GalleryGridProps = {
  workshopId: string;
  items: readonly GalleryItem[];
  /** Opens the lightbox at this tile. */
  onOpen: (index: number) => void;
  label: string;
};

/**
 * Thumbnails in boxes reserved from their stored sizes. The picture opens the
 * lightbox, which steps through these results; the name opens the photo page.
 */
export function GalleryGrid({ workshopId, items, onOpen, label }: GalleryGridProps) {
  return (
    <ul className="grid grid-cols-2 items-start gap-3 sm:grid-cols-3 lg:grid-cols-4 2xl:grid-cols-5" aria-label={label}>
      {items.map((item, index) => (
        <li key={item.id} className="flex flex-col gap-1.5">
          <button
            type="button"
            onClick={() => onOpen(index)}
            className="block w-full rounded-md"
            aria-label={`Look at ${item.label} larger`}
          >
            <PhotoThumb src={item.thumbUrl} size={item.thumb} />
          </button>
          <Link to={paths.photo.getHref(workshopId, item.id)} className="text-body font-medium text-ink underline decoration-line-strong underline-offset-2 hover:decoration-ink">
            {item.label}
          </Link>
          <span className="text-caption text-ink-muted">
            {[item.casterName, item.alloy, formatDate(item.createdAt)].filter(Boolean).join(' · ')}
            {item.markCount !== null ? (
              <>
                {' · '}
                <span className="figures">{item.markCount}</span> {item.markCount === 1 ? 'mark' : 'marks'}
              </>
            ) : null}
          </span>
          <GroupBadges kinds={item.kinds} />
        </li>
      ))}
    </ul>
  );
}
