import { Calculator } from 'lucide-react';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';

export default function CalculatorsPage() {
  return (
    <>
      <PageHeader title="Calculators" description="Figures worked out from your own inputs." />
      <EmptyState
        icon={Calculator}
        title="No calculators here yet"
        firstStep={<p>Check your units in the account menu, top right: every calculator will work in the temperature and weight units you choose.</p>}
      >
        <p>
          The calculators will work out the figures casters need before a pour: how much metal a mould takes, charge make-up for a target
          alloy, shrinkage allowance for a pattern, and riser size. Each result sits beside the inputs it came from, with its unit.
        </p>
      </EmptyState>
    </>
  );
}
