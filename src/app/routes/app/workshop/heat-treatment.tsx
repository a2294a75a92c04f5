import { Thermometer } from 'lucide-react';
import { Caution } from '#src/components/ui/caution.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';

export default function HeatTreatmentPage() {
  return (
    <>
      <PageHeader title="Heat treatment" description="Heat-treatment plans, and records of what was done." />
      <div className="flex flex-col gap-6">
        <EmptyState
          icon={Thermometer}
          title="No heat-treatment plans yet"
          firstStep={<p>Note which castings you mean to treat when you log their heat; a record will link to those castings.</p>}
        >
          <p>
            A heat-treatment plan lists the steps for an alloy and temper, such as T6: solution treatment, quench and ageing, each with its
            temperature and time. A record logs what the oven actually did for a batch of castings, beside the plan.
          </p>
        </EmptyState>
        <Caution heading="Quench with tongs, into plenty of water" safetySection="quenching">
          Lower the casting at arm’s length; never pour water onto hot metal.
        </Caution>
      </div>
    </>
  );
}
