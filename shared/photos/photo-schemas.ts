import { z } from 'zod';
import { defectKindIdSchema } from '../domain/defect-kinds.ts';
import { MOLD_MATERIALS } from '../domain/heat-conditions.ts';

export const PHOTO_VARIANTS = ['original', 'display', 'thumb'] as const;
export type PhotoVariant = (typeof PHOTO_VARIANTS)[number];

export const photoParamsSchema = z.object({
  workshopId: z.uuid('Unknown workshop'),
  photoId: z.uuid('Unknown photo'),
});
export const photoVariantParamsSchema = photoParamsSchema.extend({ variant: z.enum(PHOTO_VARIANTS) });
export const castingPhotosParamsSchema = z.object({
  workshopId: z.uuid('Unknown workshop'),
  castingId: z.uuid('Unknown casting'),
});
export const markParamsSchema = photoParamsSchema.extend({ markId: z.uuid('Unknown mark') });

const size = z.object({ width: z.number().int(), height: z.number().int() });

export const markSchema = z.object({
  id: z.uuid(),
  photoId: z.uuid(),
  authorId: z.uuid().nullable(),
  authorName: z.string().nullable(),
  kind: defectKindIdSchema,
  severity: z.union([z.literal(1), z.literal(2), z.literal(3)]),
  shape: z.enum(['point', 'box']),
  x: z.number(),
  y: z.number(),
  width: z.number().nullable(),
  height: z.number().nullable(),
  note: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Mark = z.infer<typeof markSchema>;

const fraction = z.number().min(0, 'Inside the photo').max(1, 'Inside the photo');

/**
 * A new mark: a point (tap) or a box (drag), in fractions of the photo's
 * width and height so it scales with the image.
 */
export const markCreateSchema = z
  .object({
    kind: defectKindIdSchema,
    severity: z.union([z.literal(1), z.literal(2), z.literal(3)]).default(2),
    shape: z.enum(['point', 'box']),
    x: fraction,
    y: fraction,
    width: fraction.positive().optional(),
    height: fraction.positive().optional(),
    note: z.string().trim().max(2000).optional(),
  })
  .superRefine((m, ctx) => {
    if (m.shape === 'box') {
      if (m.width === undefined) ctx.addIssue({ code: 'custom', path: ['width'], message: 'A box needs a width' });
      if (m.height === undefined) ctx.addIssue({ code: 'custom', path: ['height'], message: 'A box needs a height' });
      if (m.width !== undefined && m.x + m.width > 1.000001) ctx.addIssue({ code: 'custom', path: ['width'], message: 'The box runs off the photo' });
      if (m.height !== undefined && m.y + m.height > 1.000001) ctx.addIssue({ code: 'custom', path: ['height'], message: 'The box runs off the photo' });
    } else if (m.width !== undefined || m.height !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['shape'], message: 'A point has no width or height' });
    }
  });
export type MarkCreateInput = z.input<typeof markCreateSchema>;

export const markUpdateSchema = z
  .object({
    kind: defectKindIdSchema,
    severity: z.union([z.literal(1), z.literal(2), z.literal(3)]),
    note: z.string().trim().max(2000).nullable(),
    x: fraction,
    y: fraction,
    width: fraction.positive(),
    height: fraction.positive(),
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change');
export type MarkUpdateInput = z.infer<typeof markUpdateSchema>;

export const photoSchema = z.object({
  id: z.uuid(),
  workshopId: z.uuid(),
  castingId: z.uuid(),
  heatId: z.uuid(),
  uploadedBy: z.uuid().nullable(),
  casterId: z.uuid().nullable(),
  casterName: z.string().nullable(),
  title: z.string().nullable(),
  notes: z.string().nullable(),
  fileName: z.string().nullable(),
  alloy: z.string().nullable(),
  mouldMaterial: z.enum(MOLD_MATERIALS).nullable(),
  capturedAt: z.string().nullable(),
  createdAt: z.string(),
  original: size,
  display: size,
  thumb: size,
  /** Same-origin URLs of the three sizes; they need the session cookie. */
  urls: z.object({ original: z.string(), display: z.string(), thumb: z.string() }),
  marks: z.array(markSchema),
});
export type Photo = z.infer<typeof photoSchema>;

/** One upload's outcome: stored, or already in the workshop (same content). */
export const uploadResultSchema = z.object({
  fileName: z.string(),
  status: z.enum(['stored', 'duplicate']),
  photo: photoSchema,
});
export const uploadResponseSchema = z.object({ results: z.array(uploadResultSchema) });
export type UploadResult = z.infer<typeof uploadResultSchema>;

export const photoUpdateSchema = z
  .object({ title: z.string().trim().max(120).nullable(), notes: z.string().trim().max(4000).nullable() })
  .partial();

const dateOnly = z.iso.date('Use a date like 2026-11-30');

/** Gallery filters; they live in the URL, so every field is a string there. */
export const photoListQuerySchema = z.object({
  kind: defectKindIdSchema.optional(),
  alloy: z.string().trim().max(40).optional(),
  mouldMaterial: z.enum(MOLD_MATERIALS).optional(),
  casterId: z.uuid().optional(),
  castingId: z.uuid().optional(),
  from: dateOnly.optional(),
  to: dateOnly.optional(),
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(40),
});
export type PhotoListQuery = z.infer<typeof photoListQuerySchema>;

export const photoPageSchema = z.object({ items: z.array(photoSchema), nextCursor: z.string().nullable() });
export type PhotoPage = z.infer<typeof photoPageSchema>;

/** The compact per-photo record the gallery's fuzzy search runs over on the client. */
export const photoIndexItemSchema = z.object({
  id: z.uuid(),
  title: z.string().nullable(),
  notes: z.string().nullable(),
  alloy: z.string().nullable(),
  casterName: z.string().nullable(),
  mouldMaterial: z.string().nullable(),
  kinds: z.array(defectKindIdSchema),
  createdAt: z.string(),
  thumbUrl: z.string(),
  thumb: size,
});
export type PhotoIndexItem = z.infer<typeof photoIndexItemSchema>;
