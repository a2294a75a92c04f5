import { useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { ArrowLeft } from 'lucide-react';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ButtonLink } from '#src/components/ui/button.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { PageSkeleton } from '#src/components/ui/skeleton.tsx';
import { paths } from '#src/config/paths.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { heatTreatmentQueries } from '#src/features/heat-treatment/api/heat-treatment-queries.ts';
import { HeatTreatmentSheet } from '#src/features/heat-treatment/components/heat-treatment-sheet.tsx';
import type { TemperatureUnit } from '#shared/domain/index.ts';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    void queryClient.prefetchQuery(heatTreatmentQueries.detail(params.workshopId ?? '', params.heatTreatmentId ?? ''));
    return null;
  };

/** The printable oven sheet of one plan (a print stylesheet keeps only the sheet on paper). */
export default function HeatTreatmentSheetPage() {
  const { workshopId = '', heatTreatmentId = '' } = useParams();
  const user = useCurrentUser();
  if (!user) return null;
  return (
    <div className="flex flex-col gap-4">
      <div className="ht-no-print print:hidden">
        <ButtonLink to={paths.heatTreatmentDetail.getHref(workshopId, heatTreatmentId)} icon={<ArrowLeft aria-hidden className="size-4" />}>
          Plan and record
        </ButtonLink>
      </div>
      <QueryBoundary loading={<PageSkeleton label="Loading the sheet" />}>
        <Sheet workshopId={workshopId} id={heatTreatmentId} unit={user.temperatureUnit} />
      </QueryBoundary>
    </div>
  );
}

function Sheet({ workshopId, id, unit }: { workshopId: string; id: string; unit: TemperatureUnit }) {
  const { data } = useSuspenseQuery(heatTreatmentQueries.detail(workshopId, id));
  return <HeatTreatmentSheet plan={data} unit={unit} />;
}
