import { z } from 'zod';
import { defectKindIdSchema, meltVariableIdSchema } from '../domain/index.ts';
import { diagnosisSchema, diagnosisSnapshotSchema } from './diagnosis-schemas.ts';
import { REPORT_ACTIONS, REPORT_STATES } from './report-states.ts';

// A defect report ("report"): a caster's question about one casting, with the
// photos it concerns, its history, the reviewer's confirmed causes and a
// follow-up heat to see whether the fix worked.

export const reportStateSchema = z.enum(REPORT_STATES);
export const reportActionSchema = z.enum(REPORT_ACTIONS);

export const reportParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop'), reportId: z.uuid('Unknown report') });
export const studentParamsSchema = z.object({ workshopId: z.uuid('Unknown workshop'), userId: z.uuid('Unknown member') });

const titleSchema = z.string().trim().min(3, 'Give the report a title of at least 3 characters').max(120, 'At most 120 characters');
const questionSchema = z.string().trim().max(4000, 'At most 4000 characters');
const noteSchema = z.string().trim().max(4000, 'At most 4000 characters');
const photoIdsSchema = z.array(z.uuid('Unknown photo')).max(50, 'At most 50 photos');

export const reportCreateSchema = z
  .object({
    castingId: z.uuid('Unknown casting'),
    title: titleSchema,
    question: questionSchema.default(''),
    /** Photos of the casting the report concerns; every photo of the casting when left out. */
    photoIds: photoIdsSchema.optional(),
    /** A mentor the author asks in particular, besides their assigned mentors. */
    requestedMentorId: z.uuid('Unknown member').nullable().optional(),
  })
  .strict();
export type ReportCreateInput = z.output<typeof reportCreateSchema>;

/** PATCH: the author edits a draft. */
export const reportUpdateSchema = z
  .object({
    title: titleSchema.optional(),
    question: questionSchema.optional(),
    photoIds: photoIdsSchema.optional(),
    requestedMentorId: z.uuid('Unknown member').nullable().optional(),
  })
  .strict()
  .refine((v) => Object.values(v).some((x) => x !== undefined), 'Nothing to change');
export type ReportUpdateInput = z.output<typeof reportUpdateSchema>;

export const confirmedCauseInputSchema = z
  .object({
    variable: meltVariableIdSchema,
    note: noteSchema.default(''),
    fixesToTry: z.array(z.string().trim().min(3, 'At least 3 characters').max(300, 'At most 300 characters')).max(10).default([]),
  })
  .strict();
export type ConfirmedCauseInput = z.output<typeof confirmedCauseInputSchema>;

/** POST /reports/:reportId/transitions: one move of the state table, with what that move needs. */
export const reportTransitionSchema = z.discriminatedUnion('action', [
  z.object({ action: z.literal('submit'), note: noteSchema.optional() }).strict(),
  z.object({ action: z.literal('withdraw'), note: noteSchema.optional() }).strict(),
  z.object({ action: z.literal('start_review'), note: noteSchema.optional() }).strict(),
  z
    .object({
      action: z.literal('resolve'),
      /** The resolution: what the reviewer concluded, for the author. */
      note: noteSchema.min(1, 'Say what you concluded'),
      causes: z
        .array(confirmedCauseInputSchema)
        .min(1, 'Confirm at least one cause')
        .max(5, 'At most 5 confirmed causes')
        .superRefine((causes, ctx) => {
          causes.forEach((c, i) => {
            if (causes.findIndex((d) => d.variable === c.variable) !== i) {
              ctx.addIssue({ code: 'custom', path: [i, 'variable'], message: 'Each cause once' });
            }
          });
        }),
    })
    .strict(),
  z.object({ action: z.literal('reopen'), note: noteSchema.min(1, 'Say why it is reopened') }).strict(),
]);
export type ReportTransitionInput = z.output<typeof reportTransitionSchema>;

/** PUT /reports/:reportId/follow-up-heat: the author's next heat after trying the fix; null unlinks it. */
export const followUpHeatSchema = z.object({ heatId: z.uuid('Unknown heat').nullable(), note: noteSchema.optional() }).strict();
export type FollowUpHeatInput = z.output<typeof followUpHeatSchema>;

export const REPORT_PAGE_MAX = 100;
export const reportListQuerySchema = z.object({
  state: reportStateSchema.optional(),
  /** Reports written by this member. */
  studentId: z.uuid('Unknown member').optional(),
  /** Reports this mentor may review: their students' and those asking for them. */
  mentorId: z.uuid('Unknown member').optional(),
  /** Reports whose casting has a mark of this kind. */
  defect: defectKindIdSchema.optional(),
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(REPORT_PAGE_MAX, `At most ${REPORT_PAGE_MAX} a page`).default(25),
});
export type ReportListQuery = z.output<typeof reportListQuerySchema>;

// ── responses ───────────────────────────────────────────────────────────────

export const reportRowSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  state: reportStateSchema,
  authorId: z.uuid(),
  authorName: z.string(),
  castingId: z.uuid(),
  heatId: z.uuid(),
  requestedMentorId: z.uuid().nullable(),
  /** Defect kinds marked on the casting's photos. */
  defectKinds: z.array(defectKindIdSchema),
  commentCount: z.number().int(),
  /** The top cause when it was submitted. */
  topCause: meltVariableIdSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
  submittedAt: z.string().nullable(),
  resolvedAt: z.string().nullable(),
});
export type ReportRow = z.infer<typeof reportRowSchema>;

export const reportPageSchema = z.object({ items: z.array(reportRowSchema), nextCursor: z.string().nullable() });
export type ReportPage = z.infer<typeof reportPageSchema>;

export const reportEventSchema = z.object({
  id: z.uuid(),
  /** A move of the state table, or `create`, `edit`, `link_follow_up`. */
  action: z.string(),
  fromState: reportStateSchema.nullable(),
  toState: reportStateSchema,
  actorId: z.uuid().nullable(),
  actorName: z.string().nullable(),
  note: z.string().nullable(),
  createdAt: z.string(),
});
export type ReportEvent = z.infer<typeof reportEventSchema>;

export const confirmedCauseSchema = z.object({
  variable: meltVariableIdSchema,
  /** The variable's plain name. */
  name: z.string(),
  note: z.string(),
  fixesToTry: z.array(z.string()),
  confirmedBy: z.uuid().nullable(),
  confirmedByName: z.string().nullable(),
  createdAt: z.string(),
});
export type ConfirmedCause = z.infer<typeof confirmedCauseSchema>;

export const reportDetailSchema = z.object({
  id: z.uuid(),
  workshopId: z.uuid(),
  castingId: z.uuid(),
  heatId: z.uuid(),
  authorId: z.uuid(),
  authorName: z.string(),
  title: z.string(),
  question: z.string(),
  state: reportStateSchema,
  requestedMentorId: z.uuid().nullable(),
  /** Assigned and requested mentors: who may review it besides admins. */
  mentorIds: z.array(z.uuid()),
  photoIds: z.array(z.uuid()),
  resolutionNote: z.string().nullable(),
  confirmedCauses: z.array(confirmedCauseSchema),
  followUp: z
    .object({
      heatId: z.uuid(),
      pouredAt: z.string(),
      /** Defects marked on the follow-up heat's castings: empty means it came out sound (or is not marked yet). */
      defectKinds: z.array(defectKindIdSchema),
    })
    .nullable(),
  events: z.array(reportEventSchema),
  /** What the actor may do now (see report-states.ts). */
  allowedActions: z.array(reportActionSchema),
  canEdit: z.boolean(),
  /** The diagnosis kept at submit time; null for a draft. */
  snapshot: diagnosisSnapshotSchema.nullable(),
  /** The casting's diagnosis now, with today's rules, data and history. */
  current: diagnosisSchema,
  /** Whether the current ranking differs from the snapshot's (order or status of the causes). */
  changed: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
  submittedAt: z.string().nullable(),
  resolvedAt: z.string().nullable(),
});
export type ReportDetail = z.infer<typeof reportDetailSchema>;

export const reviewQueueSchema = z.object({
  items: z.array(reportRowSchema),
  counts: z.object({ submitted: z.number().int(), in_review: z.number().int() }),
});
export type ReviewQueue = z.infer<typeof reviewQueueSchema>;

export const studentOverviewSchema = z.object({
  student: z.object({ userId: z.uuid(), displayName: z.string(), role: z.string() }),
  heatCount: z.number().int(),
  reports: z.array(reportRowSchema),
  reportCounts: z.object({ draft: z.number().int(), submitted: z.number().int(), in_review: z.number().int(), resolved: z.number().int() }),
  /** Marks per defect kind per month of the pour, oldest month first. */
  defectTrend: z.array(z.object({ month: z.string(), kind: defectKindIdSchema, count: z.number().int() })),
});
export type StudentOverview = z.infer<typeof studentOverviewSchema>;
