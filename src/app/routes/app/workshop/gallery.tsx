import { Images } from 'lucide-react';
import { useParams } from 'react-router-dom';
import { EmptyState } from '#src/components/ui/empty-state.tsx';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';

export default function GalleryPage() {
  const { workshopId = '' } = useParams();
  return (
    <>
      <PageHeader title="Gallery" description="Photos of the workshop's castings." />
      <EmptyState
        icon={Images}
        title="No photos yet"
        firstStep={
          <p>
            Log a <TextLink to={paths.heats.getHref(workshopId)}>heat</TextLink>, then photograph each casting from it as it comes out of the
            mould, and again once it is fettled. Good light and one casting per photo make marks easier to read.
          </p>
        }
      >
        <p>
          Every photo belongs to a casting, and every casting to the heat it was poured from. On a photo you mark each defect you see: an
          outline, a number and the defect's name, with its severity.
        </p>
        <p>Marked photos are what a defect report is built from.</p>
      </EmptyState>
    </>
  );
}
