import { ClipboardList } from 'lucide-react';
import { useParams } from 'react-router-dom';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';

export default function ReportsPage() {
  const { workshopId = '' } = useParams();
  return (
    <>
      <PageHeader title="Reports" description="Defect reports: questions about castings, and their answers." />
      <EmptyState
        icon={ClipboardList}
        title="No defect reports yet"
        firstStep={
          <p>
            Mark the defect on a photo in the <TextLink to={paths.gallery.getHref(workshopId)}>gallery</TextLink>, then start a report from
            that photo.
          </p>
        }
      >
        <p>
          A report asks “what went wrong with this casting?”. It holds the casting's photos and marks, the likely causes read from its heat,
          each with its evidence and a fix to try.
        </p>
        <p>
          A report moves from draft to submitted, in review and resolved. Students' reports go to their mentors' review queue, where a mentor
          comments and records the confirmed cause.
        </p>
      </EmptyState>
    </>
  );
}
