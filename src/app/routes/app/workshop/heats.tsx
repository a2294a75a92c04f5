import { Flame } from 'lucide-react';
import { useParams } from 'react-router-dom';
import { Caution } from '#src/components/ui/caution.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';

export default function HeatsPage() {
  const { workshopId = '' } = useParams();
  return (
    <>
      <PageHeader title="Heats" description="The heat log: one entry for each melt." />
      <div className="flex flex-col gap-6">
        <EmptyState
          icon={Flame}
          title="No heats logged yet"
          firstStep={
            <p>
              Add the furnace you melt in and your crucibles under <TextLink to={paths.equipment.getHref(workshopId)}>Equipment</TextLink>, so
              each heat can name them. Then log your next melt here as you go.
            </p>
          }
        >
          <p>
            Each heat records one melt: the alloy, the charge lines (what went into the crucible, and how much), the furnace and crucible
            used, the temperatures you read and the hold time. Every casting poured from the heat links back to it.
          </p>
          <p>When a casting shows a defect, the likely causes are read from these numbers, so the more a heat records, the better the answer.</p>
        </EmptyState>
        <Caution heading="Before you light the furnace" safetySection="moisture">
          Charge only dry metal and preheat every tool and addition that will touch the melt.
        </Caution>
      </div>
    </>
  );
}
