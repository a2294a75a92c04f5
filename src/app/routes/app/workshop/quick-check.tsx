import { useQuery, useQueryClient, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate, useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ALLOYS, type DefectKindId } from '#shared/domain/index.ts';
import { Button } from '#src/components/ui/button.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SelectField } from '#src/components/ui/select-field.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { useCreateQuickCheck } from '#src/features/diagnosis/api/use-create-quick-check.ts';
import { LikelyCausesPanel } from '#src/features/diagnosis/components/likely-causes-panel.tsx';
import { QuickCheckQuestions } from '#src/features/diagnosis/components/quick-check-questions.tsx';
import { castingQueries } from '#src/features/photos/api/casting-queries.ts';
import { photoQueries } from '#src/features/photos/api/photo-queries.ts';
import { PhotoUploader } from '#src/features/photos/components/photo-uploader.tsx';
import { PhotoWorkspace } from '#src/features/photos/components/photo-workspace.tsx';
import { ReportCreateForm } from '#src/features/reports/components/report-create-form.tsx';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    return null;
  };

/**
 * The quick check: a heat stub and one casting for the photo, the photo and
 * its marks, then only the questions that matter for the marked kinds, the
 * likely causes, and "Ask a mentor". The step lives in the address, so a
 * reload or the back button keeps the caster's place.
 */
export default function QuickCheckPage() {
  const { workshopId = '' } = useParams();
  const [search, setSearch] = useSearchParams();
  const heatId = search.get('heat');
  const castingId = search.get('casting');
  return (
    <>
      <PageHeader title="Quick check" description="From a photo to its likely causes in a few taps: pick the alloy, take the photo, mark the defect, answer a few questions." />
      {heatId && castingId ? (
        <QuickCheckSteps workshopId={workshopId} heatId={heatId} castingId={castingId} />
      ) : (
        <StartStep workshopId={workshopId} onStarted={(qc) => setSearch({ heat: qc.heatId, casting: qc.castingId })} />
      )}
    </>
  );
}

function StartStep({ workshopId, onStarted }: { workshopId: string; onStarted: (qc: { heatId: string; castingId: string }) => void }) {
  const create = useCreateQuickCheck(workshopId);
  const [alloy, setAlloy] = useState('');
  return (
    <form
      className="flex max-w-xl flex-col gap-3"
      aria-label="Start a quick check"
      onSubmit={(e) => {
        e.preventDefault();
        create.mutate(alloy ? { alloy } : {}, { onSuccess: onStarted });
      }}
    >
      <p className="text-body text-ink">Step 1 of 4: the alloy. A heat poured now is logged for the photo; you can fill in the rest of the heat later.</p>
      <SelectField label="Alloy" value={alloy} onChange={(e) => setAlloy(e.target.value)}>
        <option value="">Same as my last heat</option>
        {ALLOYS.map((a) => (
          <option key={a.designation} value={a.designation}>
            {a.designation}
          </option>
        ))}
      </SelectField>
      {create.error ? (
        <Notice tone="danger" role="alert" title="The quick check did not start">
          <p>{create.error.message}</p>
        </Notice>
      ) : null}
      <Button type="submit" variant="primary" pending={create.isPending} pendingLabel="Starting…" className="self-start">
        Start the quick check
      </Button>
    </form>
  );
}

function QuickCheckSteps({ workshopId, heatId, castingId }: { workshopId: string; heatId: string; castingId: string }) {
  const user = useCurrentUser();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  const photos = useQuery(photoQueries.list(workshopId, { castingId }));
  const first = photos.data?.items[0];
  // The embedded photo page keeps this photo's marks fresh as they are made.
  const photo = useQuery({ ...photoQueries.detail(workshopId, first?.id ?? ''), enabled: Boolean(first) });
  const members = useQuery(memberQueries.list(workshopId));
  const [asking, setAsking] = useState(false);
  if (!user || !workshop) return null;
  const marks = photo.data?.marks ?? [];
  const kinds = [...new Set(marks.map((m) => m.kind))] as DefectKindId[];
  // A new or changed mark remounts the questions and the ranking, which then read afresh (their diagnosis is never fresh for long).
  const marksKey = marks.map((m) => `${m.id}:${m.kind}:${m.severity}`).join('|');
  const refresh = () => queryClient.invalidateQueries({ queryKey: castingQueries.heats() });
  const heatFormHref = paths.heatEdit.getHref(workshopId, heatId);
  const mentors = (members.data ?? []).filter((m) => m.role === 'mentor' || m.role === 'admin').map((m) => ({ userId: m.userId, displayName: m.displayName }));

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="qc-photo-heading" className="flex flex-col gap-3">
        <h2 id="qc-photo-heading" className="text-title font-semibold text-ink">
          Step 2 of 4: the photo
        </h2>
        {first ? <p className="text-body text-sound">Photo added.</p> : <PhotoUploader workshopId={workshopId} castingId={castingId} />}
      </section>

      {first ? (
        <section aria-labelledby="qc-mark-heading" className="flex flex-col gap-3">
          <h2 id="qc-mark-heading" className="text-title font-semibold text-ink">
            Step 3 of 4: mark the defects
          </h2>
          <p className="text-body text-ink-muted">Tap “Mark a defect”, then tap the spot on the photo and pick what it is.</p>
          <QueryBoundary loading={<SkeletonGroup label="Loading the photo" lines={4} />}>
            <PhotoWorkspace workshopId={workshopId} photoId={first.id} actor={{ id: user.id, role: workshop.role }} />
          </QueryBoundary>
        </section>
      ) : null}

      {kinds.length > 0 ? (
        <>
          <QueryBoundary key={marksKey} loading={<SkeletonGroup label="Loading the questions" lines={4} />}>
            <QuickCheckQuestions
              workshopId={workshopId}
              heatId={heatId}
              castingId={castingId}
              kinds={kinds}
              temperatureUnit={user.temperatureUnit}
              heatFormHref={heatFormHref}
              onRecorded={refresh}
            />
          </QueryBoundary>
          <section aria-labelledby="qc-causes-heading" className="flex flex-col gap-3">
            <h2 id="qc-causes-heading" className="text-title font-semibold text-ink">
              Step 4 of 4: the likely causes
            </h2>
            <LikelyCausesPanel
              key={marksKey}
              workshopId={workshopId}
              heatId={heatId}
              castingId={castingId}
              temperatureUnit={user.temperatureUnit}
              canRecord
              heatFormHref={heatFormHref}
              onRecorded={refresh}
            />
            {asking ? (
              <div className="flex flex-col gap-2 rounded-md border border-line p-3">
                <h2 className="text-title font-semibold text-ink">Ask a mentor</h2>
                <ReportCreateForm
                  workshopId={workshopId}
                  castingId={castingId}
                  photos={photo.data ? [photo.data] : []}
                  mentors={mentors}
                  onCreated={(report) => navigate(paths.report.getHref(workshopId, report.id))}
                />
              </div>
            ) : (
              <Button variant="primary" className="self-start" onClick={() => setAsking(true)}>
                Ask a mentor
              </Button>
            )}
          </section>
        </>
      ) : first ? (
        <Notice tone="info" title="Mark a defect to see its likely causes">
          <p>The questions and the ranking follow from the kinds you mark.</p>
        </Notice>
      ) : null}
    </div>
  );
}
