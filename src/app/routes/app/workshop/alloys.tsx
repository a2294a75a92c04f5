import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { can } from '#shared/auth/permissions.ts';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { alloyQueries } from '#src/features/alloys/api/alloy-queries.ts';
import { AlloyLibrary } from '#src/features/alloys/components/alloy-library.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    await queryClient.ensureQueryData(alloyQueries.list(params.workshopId ?? ''));
    return null;
  };

export default function AlloysPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const { data: entries } = useSuspenseQuery(alloyQueries.list(workshopId));
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <>
      <PageHeader
        title="Alloy library"
        description="Freezing points, pouring ranges, density and shrinkage of each alloy, with where every value comes from."
      />
      <AlloyLibrary
        workshopId={workshopId}
        entries={entries}
        units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }}
        mayEdit={can({ id: user.id, role: workshop.role }, 'create', 'alloy')}
      />
    </>
  );
}
