import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { HeatImportPanel } from '#src/features/heats/components/heat-import-panel.tsx';
import { workshopQueries } from '#src/features/workshops/api/workshop-queries.ts';

export default function HeatImportPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const { data: workshops } = useSuspenseQuery(workshopQueries.list());
  const workshop = workshops.find((w) => w.id === workshopId);
  if (!user || !workshop) return null;
  return (
    <>
      <PageHeader
        title="Import heats"
        description="From a spreadsheet: the heat log’s own CSV export, or your own columns matched to ours."
        actions={<TextLink to={paths.heats.getHref(workshopId)}>Back to the heat log</TextLink>}
      />
      <HeatImportPanel
        workshopId={workshopId}
        units={{ temperatureUnit: user.temperatureUnit, massUnit: user.massUnit }}
        related={{ invalidateAlso: [equipmentQueries.all()] }}
      />
    </>
  );
}
