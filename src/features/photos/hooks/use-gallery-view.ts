import { useSearchParams } from 'react-router-dom';
import { galleryViewToParams, parseGalleryView, type GalleryView } from '../lib/gallery-filters.ts';

/**
 * The gallery's filters and search text, kept in the URL so a view can be
 * shared or bookmarked. Filter changes add a history entry (Back undoes
 * them); typing in the search replaces the current one.
 */
export function useGalleryView() {
  const [params, setParams] = useSearchParams();
  const view = parseGalleryView(params);
  const update = (change: Partial<GalleryView>, { replace = false }: { replace?: boolean } = {}) => {
    setParams((current) => galleryViewToParams({ ...parseGalleryView(current), ...change }, current), { replace });
  };
  const clear = () => setParams(galleryViewToParams({}, params), { replace: false });
  return { view, update, clear };
}
