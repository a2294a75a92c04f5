import { createHash, randomUUID } from 'node:crypto';
import { faker } from '@faker-js/faker';
import type { DefectKindId, MeltVariableId } from '../../shared/domain/index.ts';
import type { HeatCreateDraft } from '../../shared/heats/heat-schemas.ts';
import { castingCreateSchema } from '../../shared/heats/heat-schemas.ts';
import type { ReportState } from '../../shared/reports/report-states.ts';
import { withTransaction } from '../../server/db/sequelize.ts';
import { putObject } from '../../server/lib/object-store.ts';
import { diagnoseCasting } from '../../server/modules/diagnosis/diagnosis-service.ts';
import * as heatsRepository from '../../server/modules/heats/heats-repository.ts';
import * as photosRepository from '../../server/modules/photos/photos-repository.ts';
import * as reportsRepository from '../../server/modules/reports/reports-repository.ts';
import { insertHeat } from './heats.ts';

// Photos with marks, castings that carry them, and reports in any state,
// written through the modules' repositories the way the API would have.

export type MarkSpec = { kind: DefectKindId; severity?: 1 | 2 | 3 };

/**
 * A photo row on the casting with the given marks. Its three objects are tiny
 * placeholders put into the store, so the storage sweep finds every row's
 * objects; these tests never decode them.
 */
export async function insertPhotoWithMarks(workshopId: string, castingId: string, uploadedBy: string, marks: readonly MarkSpec[] = []) {
  const id = randomUUID();
  const variants = Object.fromEntries(
    await Promise.all(
      (['original', 'display', 'thumb'] as const).map(async (kind) => {
        const key = `workshops/${workshopId}/photos/${id}/${randomUUID()}-${kind}.jpg`;
        const body = Buffer.from(`placeholder ${kind} ${id}`);
        await putObject(key, body, 'image/jpeg');
        return [kind, { key, width: 640, height: 480, bytes: body.length }];
      }),
    ),
  ) as photosRepository.NewPhoto['variants'];
  await photosRepository.insertPhoto({
    id,
    workshopId,
    castingId,
    uploadedBy,
    sha256: createHash('sha256').update(id).digest('hex'),
    fileName: `${faker.word.noun()}.jpg`,
    sourceFormat: 'jpeg',
    capturedAt: null,
    originalContentType: 'image/jpeg',
    variants,
  });
  const markIds: string[] = [];
  for (const [i, m] of marks.entries()) {
    markIds.push(
      await photosRepository.insertMark(workshopId, id, uploadedBy, { kind: m.kind, severity: m.severity ?? 2, shape: 'point', x: 0.1 + i * 0.05, y: 0.5 }),
    );
  }
  return { photoId: id, markIds };
}

/** A heat of `casterId` (buildHeat's plausible A356 melt, with overrides) with one casting and one marked photo. */
export async function insertMarkedCasting(
  workshopId: string,
  casterId: string,
  opts: { marks?: readonly MarkSpec[]; heat?: Partial<HeatCreateDraft> } = {},
) {
  const heat = await insertHeat({ workshopId, casterId, ...opts.heat });
  const casting = castingCreateSchema.parse({ massG: 640 });
  const castingId = await withTransaction((tx) => heatsRepository.insertCasting(workshopId, heat.id, casting, tx));
  const photo = await insertPhotoWithMarks(workshopId, castingId, casterId, opts.marks ?? [{ kind: 'gas_porosity', severity: 3 }]);
  return { heatId: heat.id, castingId, ...photo };
}

const FLOW: ReportState[] = ['draft', 'submitted', 'in_review', 'resolved'];
const ACTION_INTO: Record<ReportState, string> = { draft: 'create', submitted: 'submit', in_review: 'start_review', resolved: 'resolve' };

/**
 * A report by `authorId` in `state`, with the history and the snapshot the
 * API would have left: submitted and later states carry the diagnosis of
 * their casting, a resolved one its confirmed causes.
 */
export async function insertReport(opts: {
  workshopId: string;
  authorId: string;
  castingId?: string;
  state?: ReportState;
  title?: string;
  requestedMentorId?: string | null;
  reviewerId?: string;
  confirmed?: readonly MeltVariableId[];
  marks?: readonly MarkSpec[];
  heat?: Partial<HeatCreateDraft>;
}) {
  const state = opts.state ?? 'draft';
  const casting = opts.castingId
    ? { castingId: opts.castingId }
    : await insertMarkedCasting(opts.workshopId, opts.authorId, { marks: opts.marks, heat: opts.heat });
  const photoIds = await reportsRepository.photoIdsOfCasting(opts.workshopId, casting.castingId);
  const snapshot = state === 'draft' ? null : { ...(await diagnoseCasting(opts.workshopId, casting.castingId)), diagnosedAt: new Date().toISOString() };
  const reviewer = opts.reviewerId ?? opts.authorId;
  const id = await withTransaction(async (tx) => {
    const reportId = await reportsRepository.insertReport(
      {
        workshopId: opts.workshopId,
        castingId: casting.castingId,
        authorId: opts.authorId,
        title: opts.title ?? `${faker.word.adjective()} ${faker.word.noun()} casting`,
        question: 'What made these holes?',
        requestedMentorId: opts.requestedMentorId ?? null,
      },
      tx,
    );
    await reportsRepository.setPhotos(reportId, photoIds, tx);
    const steps = FLOW.slice(0, FLOW.indexOf(state) + 1);
    for (const [i, step] of steps.entries()) {
      await reportsRepository.insertEvent(
        {
          reportId,
          actorId: step === 'draft' || step === 'submitted' ? opts.authorId : reviewer,
          action: ACTION_INTO[step],
          fromState: i === 0 ? null : steps[i - 1],
          toState: step,
          note: null,
        },
        tx,
      );
    }
    if (state !== 'draft') {
      await reportsRepository.updateReport(
        opts.workshopId,
        reportId,
        {
          state,
          snapshot,
          submittedAt: new Date(),
          resolvedAt: state === 'resolved' ? new Date() : null,
          resolutionNote: state === 'resolved' ? 'Confirmed at the bench.' : null,
        },
        tx,
      );
    }
    if (state === 'resolved') {
      const confirmed = opts.confirmed ?? ['degassing'];
      await reportsRepository.replaceConfirmedCauses(
        reportId,
        confirmed.map((variable) => ({ variable, note: '', fixesToTry: [] })),
        reviewer,
        tx,
      );
    }
    return reportId;
  });
  return { id, ...casting, state };
}
