import { useParams } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { GuideIndex } from '#src/features/guide/components/guide-index.tsx';

export default function GuidePage() {
  const { workshopId = '' } = useParams();
  return (
    <>
      <PageHeader
        title="Defect guide"
        description="How each casting defect looks, where it shows, what causes it and the fix to try. Each group has its own outline colour, label shape and letter, so marks stay apart in any light and in print."
      />
      <GuideIndex workshopId={workshopId} />
    </>
  );
}
