import { useSuspenseQuery } from '@tanstack/react-query';
import { FURNACE_KIND_LABELS } from '#shared/heats/equipment-schemas.ts';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { equipmentQueries } from '../api/equipment-queries.ts';

/** The furnace page's heading: name, kind, heats logged on it, notes. */
export function FurnaceSummary({ workshopId, furnaceId }: { workshopId: string; furnaceId: string }) {
  const { data: furnace } = useSuspenseQuery(equipmentQueries.furnaceDetail(workshopId, furnaceId));
  return (
    <>
      <PageHeader
        title={furnace.name}
        description={`${FURNACE_KIND_LABELS[furnace.kind]} furnace · ${furnace.heatCount} ${furnace.heatCount === 1 ? 'heat' : 'heats'} logged`}
        actions={<TextLink to={paths.equipment.getHref(workshopId)}>All equipment</TextLink>}
      />
      {furnace.notes ? <p className="mb-6 max-w-prose text-body whitespace-pre-line text-ink">{furnace.notes}</p> : null}
    </>
  );
}
