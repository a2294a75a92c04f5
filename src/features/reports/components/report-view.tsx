import { useQueries, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState, type ReactNode } from 'react';
import { findDefectKind } from '#shared/domain/index.ts';
import type { Diagnosis } from '#shared/reports/diagnosis-schemas.ts';
import { REPORT_STATE_LABELS } from '#shared/reports/report-states.ts';
import type { ReportDetail } from '#shared/reports/report-schemas.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate, formatDateTime } from '#src/lib/format.ts';
import { followUpQueries, reportQueries } from '../api/report-queries.ts';
import { useCreateComment, useLinkFollowUpHeat, useReportTransition, useUpdateComment } from '../api/report-mutations.ts';
import { reportMarks } from '../lib/numbered-marks.ts';
import { CommentThread, type MentionCandidate } from './comment-thread.tsx';
import { ReportActions } from './report-actions.tsx';
import { ReportPhoto } from './report-photo.tsx';
import { StateBadge } from './state-badge.tsx';

type ReportViewProps = {
  workshopId: string;
  reportId: string;
  currentUserId: string;
  members: readonly MentionCandidate[];
  /** The likely-causes panel, composed by the page from the diagnosis feature. */
  renderDiagnosis: (diagnosis: Diagnosis, heading: string) => ReactNode;
};

const EVENT_WORDS: Record<string, string> = {
  create: 'wrote the draft',
  edit: 'edited the draft',
  submit: 'submitted it',
  withdraw: 'withdrew it to edit',
  start_review: 'started the review',
  resolve: 'resolved it',
  reopen: 'reopened it',
  link_follow_up: 'linked a follow-up heat',
};

/** One defect report: photos with marks, the question, its history, what the viewer can do, the causes and the comments. */
export function ReportView({ workshopId, reportId, currentUserId, members, renderDiagnosis }: ReportViewProps) {
  const { data: report } = useSuspenseQuery(reportQueries.detail(workshopId, reportId));
  const photoResults = useQueries({ queries: report.photoIds.map((id) => reportQueries.photo(workshopId, id)) });
  const photos = photoResults.flatMap((r) => (r.data ? [r.data] : []));
  const marks = useMemo(() => reportMarks(photos), [photos]);
  const [highlightMarkId, setHighlightMarkId] = useState<string | null>(null);
  const transition = useReportTransition(workshopId, reportId);
  const isAuthor = report.authorId === currentUserId;

  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-center gap-3">
        <StateBadge state={report.state} />
        <span className="text-body text-ink-muted">
          By {isAuthor ? 'you' : report.authorName}, {formatDateTime(report.createdAt)} ·{' '}
          <TextLink to={paths.casting.getHref(workshopId, report.heatId, report.castingId)}>the casting</TextLink>
        </span>
      </div>

      <ReportActions
        allowedActions={report.allowedActions}
        rankedVariables={report.current.causes.map((c) => c.variable)}
        onTransition={(input) => transition.mutateAsync(input)}
        pending={transition.isPending}
      />

      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_28rem]">
        <div className="flex min-w-0 flex-col gap-6">
          <section aria-labelledby="report-photos-heading" className="flex flex-col gap-3">
            <h2 id="report-photos-heading" className="text-title font-semibold text-ink">
              Photos and marks
            </h2>
            {report.photoIds.length === 0 ? <p className="text-body text-ink-muted">No photos on this report.</p> : null}
            <div className="grid gap-4 md:grid-cols-2">
              {photos.map((photo, i) => (
                <ReportPhoto
                  key={photo.id}
                  photo={photo}
                  marks={marks.filter((m) => m.photoId === photo.id)}
                  highlightMarkId={highlightMarkId}
                  caption={`Photo ${i + 1}`}
                />
              ))}
            </div>
          </section>

          <section aria-labelledby="question-heading" className="flex flex-col gap-2">
            <h2 id="question-heading" className="text-title font-semibold text-ink">
              The question
            </h2>
            <p className="whitespace-pre-wrap text-body text-ink">{report.question || 'No question written; the photos and marks say it.'}</p>
          </section>

          {report.confirmedCauses.length > 0 ? <ConfirmedCauses report={report} /> : null}
          {isAuthor && report.state === 'resolved' ? <FollowUp workshopId={workshopId} report={report} currentUserId={currentUserId} beforePhotos={photos} /> : null}
          {!isAuthor && report.followUp ? <FollowUp workshopId={workshopId} report={report} currentUserId={currentUserId} beforePhotos={photos} readOnly /> : null}

          <QueryBoundary loading={<SkeletonGroup label="Loading the comments" lines={3} />}>
            <Comments
              workshopId={workshopId}
              reportId={reportId}
              marks={marks}
              members={members}
              currentUserId={currentUserId}
              highlightMarkId={highlightMarkId}
              onShowMark={(id) => {
                setHighlightMarkId((current) => (current === id ? null : id));
                document.getElementById('report-photos-heading')?.scrollIntoView?.({ block: 'start', behavior: 'smooth' });
              }}
            />
          </QueryBoundary>
        </div>

        <div className="flex min-w-0 flex-col gap-6">
          {report.changed && report.snapshot ? (
            <Notice tone="info" title="The ranking has changed since it was submitted">
              <p>New data, rules or reviews moved the causes. Both rankings are shown: the one the mentor first saw, and today's.</p>
            </Notice>
          ) : null}
          <div className={report.changed && report.snapshot ? 'grid gap-4 2xl:grid-cols-2' : ''}>
            {report.changed && report.snapshot ? (
              <div>{renderDiagnosis(report.snapshot, `At submit, ${formatDate(report.snapshot.diagnosedAt)}`)}</div>
            ) : null}
            <div>{renderDiagnosis(report.current, report.changed && report.snapshot ? 'Likely causes now' : 'Likely causes')}</div>
          </div>
          <History report={report} />
        </div>
      </div>
    </div>
  );
}

function Comments(props: {
  workshopId: string;
  reportId: string;
  marks: ReturnType<typeof reportMarks>;
  members: readonly MentionCandidate[];
  currentUserId: string;
  highlightMarkId: string | null;
  onShowMark: (id: string) => void;
}) {
  const { data: comments } = useSuspenseQuery(reportQueries.comments(props.workshopId, props.reportId));
  const create = useCreateComment(props.workshopId, props.reportId);
  const update = useUpdateComment(props.workshopId, props.reportId);
  return (
    <CommentThread
      comments={comments}
      marks={props.marks}
      members={props.members}
      currentUserId={props.currentUserId}
      highlightMarkId={props.highlightMarkId}
      onShowMark={props.onShowMark}
      onPost={(input) => create.mutateAsync(input)}
      onEdit={(commentId, input) => update.mutateAsync({ commentId, input })}
    />
  );
}

function ConfirmedCauses({ report }: { report: ReportDetail }) {
  return (
    <section aria-labelledby="confirmed-heading" className="flex flex-col gap-3 rounded-md border-2 border-sound-line bg-sound-bg p-3" data-testid="confirmed-causes">
      <h2 id="confirmed-heading" className="text-title font-semibold text-ink">
        Confirmed cause{report.confirmedCauses.length > 1 ? 's' : ''}
      </h2>
      {report.resolutionNote ? <p className="whitespace-pre-wrap text-body text-ink">{report.resolutionNote}</p> : null}
      <ul className="flex flex-col gap-2">
        {report.confirmedCauses.map((c) => (
          <li key={c.variable} className="rounded-md bg-surface-raised p-2">
            <p className="font-semibold text-ink">{c.name}</p>
            {c.note ? <p className="text-body text-ink">{c.note}</p> : null}
            {c.fixesToTry.length > 0 ? (
              <>
                <p className="text-caption font-semibold tracking-wide text-ink-muted uppercase">Fix to try</p>
                <ul className="list-disc pl-5 text-body text-ink">
                  {c.fixesToTry.map((f, i) => (
                    <li key={i}>{f}</li>
                  ))}
                </ul>
              </>
            ) : null}
            <p className="text-caption text-ink-muted">Confirmed by {c.confirmedByName ?? 'a reviewer'}, {formatDate(c.createdAt)}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}

function History({ report }: { report: ReportDetail }) {
  return (
    <section aria-labelledby="history-heading" className="flex flex-col gap-2">
      <h2 id="history-heading" className="text-title font-semibold text-ink">
        History
      </h2>
      <ol className="flex flex-col gap-2 border-l-2 border-line pl-3">
        {report.events.map((e) => (
          <li key={e.id} className="text-body text-ink">
            <span className="font-semibold">{e.actorName ?? 'Someone'}</span> {EVENT_WORDS[e.action] ?? e.action}
            {e.fromState && e.fromState !== e.toState ? ` (${REPORT_STATE_LABELS[e.fromState]} → ${REPORT_STATE_LABELS[e.toState]})` : ''}
            <span className="block text-caption text-ink-muted">{formatDateTime(e.createdAt)}</span>
            {e.note ? <span className="block whitespace-pre-wrap text-caption text-ink">“{e.note}”</span> : null}
          </li>
        ))}
      </ol>
    </section>
  );
}

function FollowUp({
  workshopId,
  report,
  currentUserId,
  beforePhotos,
  readOnly = false,
}: {
  workshopId: string;
  report: ReportDetail;
  currentUserId: string;
  beforePhotos: readonly import('#shared/photos/photo-schemas.ts').Photo[];
  readOnly?: boolean;
}) {
  const heats = useQuery({ ...followUpQueries.heats(workshopId, currentUserId), enabled: !readOnly });
  const after = useQuery({ ...followUpQueries.photos(workshopId, report.followUp?.heatId ?? ''), enabled: Boolean(report.followUp) });
  const link = useLinkFollowUpHeat(workshopId, report.id);
  const [heatId, setHeatId] = useState('');
  const candidates = (heats.data ?? []).filter((h) => h.id !== report.heatId);
  return (
    <section aria-labelledby="follow-up-heading" className="flex flex-col gap-3">
      <h2 id="follow-up-heading" className="text-title font-semibold text-ink">
        Follow-up heat
      </h2>
      {report.followUp ? (
        <p className="text-body text-ink">
          <TextLink to={paths.heat.getHref(workshopId, report.followUp.heatId)}>The heat poured {formatDateTime(report.followUp.pouredAt)}</TextLink>:{' '}
          {report.followUp.defectKinds.length === 0
            ? 'no defects marked on its castings (sound, or not marked yet).'
            : `marked ${report.followUp.defectKinds.map((k) => findDefectKind(k)?.name.toLowerCase() ?? k).join(', ')}.`}
        </p>
      ) : (
        <p className="text-body text-ink-muted">Pour again with the fix and link that heat here to show whether it worked.</p>
      )}
      {!readOnly ? (
        <form
          className="flex flex-wrap items-end gap-2"
          aria-label="Link the follow-up heat"
          onSubmit={(e) => {
            e.preventDefault();
            if (heatId) link.mutate({ heatId });
          }}
        >
          <SelectField label="Your heat after the fix" value={heatId} onChange={(e) => setHeatId(e.target.value)}>
            <option value="">Pick a heat…</option>
            {candidates.map((h) => (
              <option key={h.id} value={h.id}>
                {h.alloy}, poured {formatDateTime(h.pouredAt)}
              </option>
            ))}
          </SelectField>
          <Button type="submit" pending={link.isPending}>
            Link the heat
          </Button>
          {report.followUp ? (
            <Button variant="quiet" onClick={() => link.mutate({ heatId: null })}>
              Unlink
            </Button>
          ) : null}
        </form>
      ) : null}
      {report.followUp ? (
        <div className="grid gap-4 md:grid-cols-2" aria-label="Before and after">
          <div>
            <h3 className="font-semibold text-ink">Before</h3>
            {beforePhotos.slice(0, 1).map((p) => (
              <ReportPhoto key={p.id} photo={p} marks={reportMarks([p])} caption="The reported casting" />
            ))}
          </div>
          <div>
            <h3 className="font-semibold text-ink">After</h3>
            {(after.data ?? []).slice(0, 1).map((p) => (
              <ReportPhoto key={p.id} photo={p} marks={reportMarks([p])} caption="The follow-up casting" />
            ))}
            {after.data && after.data.length === 0 ? <p className="text-body text-ink-muted">No photos of the follow-up heat yet.</p> : null}
          </div>
        </div>
      ) : null}
    </section>
  );
}
