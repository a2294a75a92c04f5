import { Wrench } from 'lucide-react';
import { Caution } from '#src/components/ui/caution.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';

export default function EquipmentPage() {
  return (
    <>
      <PageHeader title="Equipment" description="Furnaces, crucibles and thermocouples." />
      <div className="flex flex-col gap-6">
        <EmptyState
          icon={Wrench}
          title="No equipment yet"
          firstStep={<p>List the furnace you melt in and every crucible you use, with its size, so heats can name them.</p>}
        >
          <p>
            Each furnace keeps its furnace offset: how far its own reading sits from a checked probe, so the temperatures in your heats can be
            trusted. Each crucible keeps its crucible life: the heats it has been through, and its inspections.
          </p>
        </EmptyState>
        <Caution heading="Inspect crucibles before each melt" safetySection="crucibles">
          A crucible that is cracked, thinned, was dropped or got wet is retired.
        </Caution>
      </div>
    </>
  );
}
