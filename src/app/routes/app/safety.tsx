import { PageHeader } from '#src/components/ui/page-header.tsx';
import { SafetyGuide } from '#src/features/safety/components/safety-guide.tsx';

export default function SafetyPage() {
  return (
    <>
      <PageHeader title="Safety" />
      <SafetyGuide />
    </>
  );
}
