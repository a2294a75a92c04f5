import type { Mark, Photo, PhotoIndexItem, UploadResult } from '#shared/photos/photo-schemas.ts';
import { testId } from './data.ts';

/** A photo as the API sends it, parsed by photoSchema in the client. */
export function buildPhoto(overrides: Partial<Photo> = {}): Photo {
  const id = overrides.id ?? testId();
  const workshopId = overrides.workshopId ?? testId();
  const base = `/api/workshops/${workshopId}/photos/${id}/image`;
  return {
    id,
    workshopId,
    castingId: testId(),
    heatId: testId(),
    uploadedBy: null,
    casterId: null,
    casterName: 'Ray Dunmore',
    title: null,
    notes: null,
    fileName: 'ingot.jpg',
    alloy: 'A356.0',
    mouldMaterial: 'graphite',
    capturedAt: null,
    createdAt: '2026-11-28T18:30:00.000Z',
    original: { width: 4000, height: 3000 },
    display: { width: 1600, height: 1200 },
    thumb: { width: 400, height: 300 },
    urls: { original: `${base}/original`, display: `${base}/display`, thumb: `${base}/thumb` },
    marks: [],
    ...overrides,
  };
}

export function buildMark(overrides: Partial<Mark> = {}): Mark {
  return {
    id: testId(),
    photoId: testId(),
    authorId: null,
    authorName: 'Ray Dunmore',
    kind: 'gas_porosity',
    severity: 2,
    shape: 'point',
    x: 0.5,
    y: 0.5,
    width: null,
    height: null,
    note: null,
    createdAt: '2026-11-28T19:00:00.000Z',
    updatedAt: '2026-11-28T19:00:00.000Z',
    ...overrides,
  };
}

export function buildIndexItem(overrides: Partial<PhotoIndexItem> = {}): PhotoIndexItem {
  const id = overrides.id ?? testId();
  return {
    id,
    title: null,
    notes: null,
    alloy: 'A356.0',
    casterName: 'Ray Dunmore',
    mouldMaterial: 'graphite',
    kinds: [],
    createdAt: '2026-11-28T18:30:00.000Z',
    thumbUrl: `/api/workshops/w/photos/${id}/image/thumb`,
    thumb: { width: 400, height: 300 },
    ...overrides,
  };
}

export function buildUploadResult(fileName: string, overrides: Partial<UploadResult> = {}): UploadResult {
  return { fileName, status: 'stored', photo: buildPhoto({ fileName }), ...overrides };
}
