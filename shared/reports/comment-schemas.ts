import { z } from 'zod';

// Comments on a defect report: threaded by parentId, optionally pinned to one
// mark on one photo, in the Markdown slice of markdown-lite.ts. The raw text
// is stored; responses carry it and the rendered HTML.

/** Authors may fix a comment for this long after posting it. */
export const COMMENT_EDIT_WINDOW_MS = 15 * 60_000;
export const COMMENT_MAX_CHARS = 5000;

export const reportCommentsParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop'), reportId: z.uuid('Unknown report') });
export const commentParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop'), commentId: z.uuid('Unknown comment') });
export const photoCommentsParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop'), photoId: z.uuid('Unknown photo') });

const bodySchema = z.string().trim().min(1, 'Write something').max(COMMENT_MAX_CHARS, `At most ${COMMENT_MAX_CHARS} characters`);
/** Members picked in a mention picker; "@Display Name" in the text counts too. */
const mentionIdsSchema = z.array(z.uuid('Unknown member')).max(20, 'At most 20 mentions');

export const commentCreateSchema = z
  .object({
    body: bodySchema,
    /** The comment this one answers; it must be on the same report. */
    parentId: z.uuid('Unknown comment').optional(),
    /** A mark on a photo of the report's casting. */
    markId: z.uuid('Unknown mark').optional(),
    mentionIds: mentionIdsSchema.optional(),
  })
  .strict();
export type CommentCreateInput = z.infer<typeof commentCreateSchema>;

export const commentUpdateSchema = z.object({ body: bodySchema, mentionIds: mentionIdsSchema.optional() }).strict();
export type CommentUpdateInput = z.infer<typeof commentUpdateSchema>;

export const commentSchema = z.object({
  id: z.uuid(),
  reportId: z.uuid(),
  parentId: z.uuid().nullable(),
  authorId: z.uuid().nullable(),
  authorName: z.string().nullable(),
  /** As typed. */
  body: z.string(),
  /** Safe HTML of the body. */
  html: z.string(),
  markId: z.uuid().nullable(),
  photoId: z.uuid().nullable(),
  mentions: z.array(z.object({ userId: z.uuid(), displayName: z.string() })),
  createdAt: z.string(),
  editedAt: z.string().nullable(),
  /** Until when the author may still edit it. */
  editableUntil: z.string(),
});
export type Comment = z.infer<typeof commentSchema>;

/** GET /reports/:reportId/comments: oldest first; build the thread from parentId. */
export const commentListSchema = z.object({ items: z.array(commentSchema) });
