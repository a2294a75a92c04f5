import type { Mark, Photo } from '#shared/photos/photo-schemas.ts';
import { formatDate } from '#src/lib/format.ts';

export type NumberedMark = Mark & { number: number };

/** Marks in the order they were made; the number on each label is its place here. */
export function numberMarks(marks: readonly Mark[]): NumberedMark[] {
  return [...marks]
    .sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id.localeCompare(b.id))
    .map((m, i) => ({ ...m, number: i + 1 }));
}

/** A name for a photo without a title: what it shows and when. */
export function photoLabel(photo: Pick<Photo, 'title' | 'alloy' | 'createdAt'>): string {
  return photo.title ?? `${photo.alloy ? `${photo.alloy} casting` : 'Casting'}, ${formatDate(photo.createdAt)}`;
}
