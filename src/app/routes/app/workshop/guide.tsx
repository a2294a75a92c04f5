import { BookOpen } from 'lucide-react';
import { DefectGroupLegend } from '#src/components/ui/defect-group-legend.tsx';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';

export default function GuidePage() {
  return (
    <>
      <PageHeader title="Guide" description="The defect guide and the alloy library." />
      <div className="flex flex-col gap-6">
        <EmptyState
          icon={BookOpen}
          title="Start with the seven defect groups"
          firstStep={<p>Learn the seven groups below: every mark you make on a photo belongs to one of them, and carries its shape and code.</p>}
        >
          <p>
            The guide will describe each defect, from gas porosity and shrinkage to cold shuts and misruns: how it looks, how to tell it from
            the defects it resembles, its likely causes and the fix to try. The alloy library will hold each alloy's pouring range and
            heat-treatment plans.
          </p>
        </EmptyState>
        <section aria-labelledby="groups-title" className="flex flex-col gap-3">
          <h2 id="groups-title" className="text-title font-semibold">
            Defect groups
          </h2>
          <p className="max-w-prose text-body text-ink-muted">
            Each group has its own outline colour, label shape and two-letter code, so marks stay apart in any light and in print.
          </p>
          <DefectGroupLegend />
        </section>
      </div>
    </>
  );
}
