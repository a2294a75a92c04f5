import { useParams } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { CalculatorIndex } from '#src/features/calculators/components/calculator-index.tsx';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';

export default function CalculatorsPage() {
  const { workshopId = '' } = useParams();
  const user = useCurrentUser();
  const units = user ? `°${user.temperatureUnit} and ${user.massUnit}` : 'your units';
  return (
    <>
      <PageHeader
        title="Calculators"
        description={`Figures worked out from your own inputs, each with its formula and where it comes from. They work in ${units}; change that in the account menu, top right.`}
      />
      <CalculatorIndex workshopId={workshopId} />
    </>
  );
}
