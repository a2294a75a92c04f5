import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import type { TemperatureUnit } from '#shared/domain/index.ts';
import { ErrorBoundary } from '#src/components/ui/error-boundary.tsx';
import { QueryBoundary } from '#src/components/ui/query-boundary.tsx';
import { SkeletonGroup } from '#src/components/ui/skeleton.tsx';
import { diagnosisQueries } from '../api/diagnosis-queries.ts';
import { useRecordCondition } from '../api/use-record-condition.ts';
import { LikelyCausesView } from './likely-causes-view.tsx';

type LikelyCausesPanelProps = {
  workshopId: string;
  heatId: string;
  castingId: string;
  temperatureUnit: TemperatureUnit;
  /** Whether the viewer may record values on this heat (its caster, an admin). */
  canRecord: boolean;
  heatFormHref: string;
  onRecorded?: () => unknown;
  withWhatIf?: boolean;
};

/** A casting's likely causes, fetched; the casting page, the quick check and the report page use it. */
export function LikelyCausesPanel(props: LikelyCausesPanelProps) {
  return (
    <ErrorBoundary>
      <QueryBoundary loading={<SkeletonGroup label="Ranking the likely causes" lines={5} />}>
        <LoadedPanel {...props} />
      </QueryBoundary>
    </ErrorBoundary>
  );
}

function LoadedPanel({ workshopId, heatId, castingId, temperatureUnit, canRecord, heatFormHref, onRecorded, withWhatIf = true }: LikelyCausesPanelProps) {
  const { data: diagnosis } = useSuspenseQuery(diagnosisQueries.casting(workshopId, castingId));
  const heat = useQuery({ ...diagnosisQueries.heat(workshopId, heatId), enabled: canRecord });
  const record = useRecordCondition(workshopId, { heatId, castingId }, onRecorded);
  return (
    <LikelyCausesView
      diagnosis={diagnosis}
      temperatureUnit={temperatureUnit}
      withWhatIf={withWhatIf}
      recording={
        canRecord
          ? {
              temperatureUnit,
              context: { pouredAt: heat.data?.pouredAt ?? null },
              heatFormHref,
              onRecord: (patches) => record.mutateAsync(patches),
              pending: record.isPending,
            }
          : undefined
      }
    />
  );
}
