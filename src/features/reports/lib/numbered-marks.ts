import { findDefectKind } from '#shared/domain/index.ts';
import type { Mark, Photo } from '#shared/photos/photo-schemas.ts';

export type ReportMark = Mark & { number: number; photoNumber: number; label: string };

/**
 * The marks of a report's photos, numbered as the photo page numbers them
 * (in the order they were made, per photo), with a label that names the
 * photo too when there are several: "Photo 2, mark 1 · gas porosity".
 */
export function reportMarks(photos: readonly Pick<Photo, 'id' | 'marks'>[]): ReportMark[] {
  return photos.flatMap((photo, p) =>
    [...photo.marks]
      .sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id.localeCompare(b.id))
      .map((m, i) => {
        const name = findDefectKind(m.kind)?.name.toLowerCase() ?? m.kind;
        const where = photos.length > 1 ? `Photo ${p + 1}, mark ${i + 1}` : `Mark ${i + 1}`;
        return { ...m, number: i + 1, photoNumber: p + 1, label: `${where} · ${name}` };
      }),
  );
}
