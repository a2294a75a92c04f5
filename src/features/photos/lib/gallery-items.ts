import type { DefectKindId } from '#shared/domain/index.ts';
import type { Photo, PhotoIndexItem } from '#shared/photos/photo-schemas.ts';
import { photoLabel } from './photo-labels.ts';

/** One tile of the gallery, whether it came from the server's list or the search index. */
export type GalleryItem = {
  id: string;
  label: string;
  thumbUrl: string;
  thumb: { width: number; height: number };
  createdAt: string;
  casterName: string | null;
  alloy: string | null;
  /** Null for index records, which carry the kinds marked but not the count. */
  markCount: number | null;
  kinds: DefectKindId[];
};

export function itemFromPhoto(photo: Photo): GalleryItem {
  return {
    id: photo.id,
    label: photoLabel(photo),
    thumbUrl: photo.urls.thumb,
    thumb: photo.thumb,
    createdAt: photo.createdAt,
    casterName: photo.casterName,
    alloy: photo.alloy,
    markCount: photo.marks.length,
    kinds: [...new Set(photo.marks.map((m) => m.kind))],
  };
}

export function itemFromIndex(item: PhotoIndexItem): GalleryItem {
  return {
    id: item.id,
    label: photoLabel(item),
    thumbUrl: item.thumbUrl,
    thumb: item.thumb,
    createdAt: item.createdAt,
    casterName: item.casterName,
    alloy: item.alloy,
    markCount: null,
    kinds: item.kinds,
  };
}
