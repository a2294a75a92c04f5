import { ChartLine } from 'lucide-react';
import { useParams } from 'react-router-dom';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';

export default function InsightsPage() {
  const { workshopId = '' } = useParams();
  return (
    <>
      <PageHeader title="Insights" description="Patterns across the workshop's heats and castings." />
      <EmptyState
        icon={ChartLine}
        title="Nothing to compare yet"
        firstStep={
          <p>
            Log <TextLink to={paths.heats.getHref(workshopId)}>heats</TextLink> with their castings and marked photos. Insights appear once
            there are several heats to compare.
          </p>
        }
      >
        <p>
          Insights will set your heats side by side: which defects come with which alloys and pouring temperatures, how long crucibles last,
          and whether a fix you tried made a difference.
        </p>
      </EmptyState>
    </>
  );
}
