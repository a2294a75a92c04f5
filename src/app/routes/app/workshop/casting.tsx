import { useQuery, useQueryClient, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { ArrowLeft } from 'lucide-react';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import type { Actor } from '#shared/auth/roles.ts';
import type { CurrentUser } from '#shared/auth/auth-schemas.ts';
import { Button, ButtonLink } from '#src/components/ui/button.tsx';
import { ErrorPanel, type ErrorFallbackProps } from '#src/components/ui/error-boundary.tsx';
import { Notice } from '#src/components/ui/notice.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { Skeleton, SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { castingQueries } from '#src/features/photos/api/casting-queries.ts';
import { photoQueries } from '#src/features/photos/api/photo-queries.ts';
import { CastingPhotoGrid } from '#src/features/photos/components/casting-photo-grid.tsx';
import { CastingSummary } from '#src/features/photos/components/casting-summary.tsx';
import { PhotoUploader } from '#src/features/photos/components/photo-uploader.tsx';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';
import { LikelyCausesPanel } from '#src/features/diagnosis/components/likely-causes-panel.tsx';
import { ReportCreateForm } from '#src/features/reports/components/report-create-form.tsx';
import { isApiError } from '#src/lib/api-client.ts';
import { formatDateTime } from '#src/lib/format.ts';

/** Starts the heat and the casting's photos loading with the page; each part shows its skeleton until it arrives. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshopId = params.workshopId ?? '';
    void queryClient.prefetchQuery(castingQueries.heat(workshopId, params.heatId ?? ''));
    void queryClient.prefetchQuery(photoQueries.list(workshopId, { castingId: params.castingId ?? '' }));
    return null;
  };

export default function CastingPage() {
  const { workshopId = '', heatId = '', castingId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <QueryBoundary loading={<CastingSkeleton />} fallback={(props) => <HeatNotOpen {...props} workshopId={workshopId} />}>
      <CastingOverview
        key={castingId}
        workshopId={workshopId}
        heatId={heatId}
        castingId={castingId}
        actor={{ id: user.id, role: workshop.role }}
        user={user}
      />
    </QueryBoundary>
  );
}

function CastingOverview({
  workshopId,
  heatId,
  castingId,
  actor,
  user,
}: {
  workshopId: string;
  heatId: string;
  castingId: string;
  actor: Actor;
  user: CurrentUser;
}) {
  const { data: heat } = useSuspenseQuery(castingQueries.heat(workshopId, heatId));
  const index = heat.castings.findIndex((c) => c.id === castingId);
  const casting = heat.castings[index];
  const heatLog = (
    <ButtonLink to={paths.heat.getHref(workshopId, heatId)} icon={<ArrowLeft aria-hidden className="size-4" />}>
      The heat
    </ButtonLink>
  );
  if (!casting) {
    return (
      <>
        <PageHeader title="Casting not found" actions={heatLog} />
        <Notice tone="info" title="This casting is not part of that heat">
          <p>It may have been removed from the heat. Open the heat again from the heat log.</p>
        </Notice>
      </>
    );
  }
  // Photos go on a casting by whoever may change its heat: its caster, or an admin.
  const mayUpload = can(actor, 'update', 'heat', { ownerId: heat.casterId });

  return (
    <>
      <PageHeader
        title={`Casting ${index + 1} of ${heat.castings.length}`}
        description={`From the ${heat.alloy} heat poured ${formatDateTime(heat.pouredAt)} by ${heat.casterId === user.id ? 'you' : heat.casterName}.`}
        actions={heatLog}
      />
      <div className="grid gap-8 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="flex min-w-0 flex-col gap-8">
          <section aria-labelledby="casting-photos-heading" className="flex flex-col gap-3">
            <h2 id="casting-photos-heading" className="text-title font-semibold text-ink">
              Photos
            </h2>
            <QueryBoundary loading={<PhotoGridSkeleton />}>
              <CastingPhotoGrid workshopId={workshopId} castingId={castingId} />
            </QueryBoundary>
          </section>
          {mayUpload ? (
            <PhotoUploader key={castingId} workshopId={workshopId} castingId={castingId} />
          ) : (
            <Notice tone="info" title="Photos of this casting are added by its caster">
              <p>{heat.casterName} or an admin of the workshop can add photos here. You can mark defects on the photos already added.</p>
            </Notice>
          )}
          <DiagnosisSlot workshopId={workshopId} heatId={heatId} castingId={castingId} mayRecord={mayUpload} user={user} />
        </div>
        <CastingSummary heat={heat} casting={casting} massUnit={user.massUnit} temperatureUnit={user.temperatureUnit} />
      </div>
    </>
  );
}

/**
 * The casting's likely causes (evidence, fix to try, what-if) and, for its
 * caster, the way to ask a mentor about it. Composed here because the
 * diagnosis and reports features never import each other.
 */
function DiagnosisSlot({ workshopId, heatId, castingId, mayRecord, user }: { workshopId: string; heatId: string; castingId: string; mayRecord: boolean; user: CurrentUser }) {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const photos = useQuery(photoQueries.list(workshopId, { castingId }));
  const members = useQuery(memberQueries.list(workshopId));
  const [asking, setAsking] = useState(false);
  const mentors = (members.data ?? []).filter((m) => m.role === 'mentor' || m.role === 'admin').map((m) => ({ userId: m.userId, displayName: m.displayName }));
  return (
    <section aria-label="Diagnosis" className="flex flex-col gap-4">
      <LikelyCausesPanel
        workshopId={workshopId}
        heatId={heatId}
        castingId={castingId}
        temperatureUnit={user.temperatureUnit}
        canRecord={mayRecord}
        heatFormHref={paths.heatEdit.getHref(workshopId, heatId)}
        onRecorded={() => queryClient.invalidateQueries({ queryKey: castingQueries.heats() })}
      />
      {mayRecord ? (
        asking ? (
          <div className="flex flex-col gap-2 rounded-md border border-line p-3">
            <h2 className="text-title font-semibold text-ink">Ask a mentor</h2>
            <ReportCreateForm
              workshopId={workshopId}
              castingId={castingId}
              photos={photos.data?.items ?? []}
              mentors={mentors}
              onCreated={(report) => navigate(paths.report.getHref(workshopId, report.id))}
            />
          </div>
        ) : (
          <Button className="self-start" onClick={() => setAsking(true)}>
            Ask a mentor about this casting
          </Button>
        )
      ) : null}
    </section>
  );
}

function HeatNotOpen({ error, reset, workshopId }: ErrorFallbackProps & { workshopId: string }) {
  if (isApiError(error) && (error.status === 404 || error.status === 400)) {
    return (
      <>
        <PageHeader title="Casting not found" />
        <Notice tone="info" title="This heat is not open to you, or no longer exists">
          <p>
            Casters and students see their own heats; mentors see their students’ heats. The workshop’s photos are all in the{' '}
            <TextLink to={paths.gallery.getHref(workshopId)}>gallery</TextLink>.
          </p>
        </Notice>
      </>
    );
  }
  return <ErrorPanel error={error} reset={reset} title="The casting did not load" />;
}

function PhotoGridSkeleton() {
  return (
    <div role="status" className="grid grid-cols-2 gap-3 sm:grid-cols-3 xl:grid-cols-4">
      <span className="sr-only">Loading the photos</span>
      {Array.from({ length: 4 }, (_, i) => (
        <Skeleton key={i} className="aspect-[4/3] w-full" />
      ))}
    </div>
  );
}

function CastingSkeleton() {
  return (
    <div className="flex flex-col gap-6">
      <Skeleton className="h-9 w-64 max-w-full" />
      <div className="grid gap-8 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <PhotoGridSkeleton />
        <SkeletonGroup label="Loading the casting" lines={6} />
      </div>
    </div>
  );
}
