import { useQuery, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { accessFor } from '#shared/auth/permissions.ts';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { insightQueries } from '#src/features/insights/api/insight-queries.ts';
import { InsightsView } from '#src/features/insights/components/insights-view.tsx';
import { parseInsightView } from '#src/features/insights/lib/insight-filters.ts';
import { memberQueries, workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';

/** The panels' data starts loading with the page; each panel shows its own skeleton until it lands. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const workshopId = params.workshopId ?? '';
    const { kind, ...filters } = parseInsightView(new URL(request.url).searchParams);
    void queryClient.prefetchQuery(insightQueries.defectFrequency(workshopId, filters));
    void queryClient.prefetchQuery(insightQueries.mouldPreheatBand(workshopId, { ...filters, kind }));
    if (filters.alloy) void queryClient.prefetchQuery(insightQueries.pourBand(workshopId, { ...filters, alloy: filters.alloy, kind }));
    void queryClient.prefetchQuery(insightQueries.yieldTrend(workshopId, filters));
    void queryClient.prefetchQuery(insightQueries.crucibleCycles(workshopId, filters));
    void queryClient.prefetchQuery(insightQueries.furnaceOffset(workshopId, filters));
    void queryClient.prefetchQuery(memberQueries.list(workshopId));
    return null;
  };

export default function InsightsPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  // The caster filter offers the people whose heats the reader may see: an
  // admin everyone, a mentor themselves and their students. If the members
  // do not load, the filter is simply left out.
  const members = useQuery(memberQueries.list(workshopId));
  const casters = useMemo(() => {
    if (!user || !workshop) return [];
    const access = accessFor({ id: user.id, role: workshop.role }, 'read', 'heat');
    return (members.data ?? [])
      .filter((m) => access.includes('any') || m.userId === user.id || (access.includes('mentee') && m.mentorIds.includes(user.id)))
      .map((m) => ({ id: m.userId, name: m.userId === user.id ? `${m.displayName} (you)` : m.displayName }))
      .sort((a, b) => a.name.localeCompare(b.name));
  }, [members.data, user, workshop]);
  if (!user || !workshop) return null;
  return (
    <>
      <PageHeader
        title="Insights"
        description="Patterns across the heats you can see: which defects come with which pour temperatures and mould preheats, how yield moves, how crucibles wear and how each furnace runs against its setpoint."
      />
      <InsightsView workshopId={workshopId} unit={user.temperatureUnit} casters={casters} />
    </>
  );
}
