import { useQuery, type QueryClient } from '@tanstack/react-query';
import { ArrowLeft } from 'lucide-react';
import { data, Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { PageHeader } from '#src/components/ui/page-header.tsx';
import { paths } from '#src/config/paths.ts';
import { alloyQueries } from '#src/features/alloys/api/alloy-queries.ts';
import { useCurrentUser } from '#src/features/auth/hooks/use-current-user.ts';
import { requireUser } from '#src/features/auth/lib/require-session.ts';
import { ChargeCalculator } from '#src/features/calculators/components/charge-calculator.tsx';
import { DewPointCalculator } from '#src/features/calculators/components/dew-point-calculator.tsx';
import { HydrogenCalculator } from '#src/features/calculators/components/hydrogen-calculator.tsx';
import { PatternShrinkCalculator } from '#src/features/calculators/components/pattern-shrink-calculator.tsx';
import { SetpointCalculator } from '#src/features/calculators/components/setpoint-calculator.tsx';
import { SolidificationCalculator } from '#src/features/calculators/components/solidification-calculator.tsx';
import { SuperheatCalculator } from '#src/features/calculators/components/superheat-calculator.tsx';
import { TemperatureConverter } from '#src/features/calculators/components/temperature-converter.tsx';
import { YieldCalculator } from '#src/features/calculators/components/yield-calculator.tsx';
import { findCalculator, type CalculatorId } from '#src/features/calculators/lib/calculator-list.ts';
import { equipmentQueries } from '#src/features/equipment/api/equipment-queries.ts';
import { heatQueries } from '#src/features/heats/api/heat-queries.ts';
import type { Units } from '#src/lib/unit-input.ts';

/** An unknown calculator is a 404; the data a calculator reads (alloys, moulds, furnaces) starts loading with the page. */
export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    await requireUser(queryClient, request);
    const calculator = findCalculator(params.calculatorId ?? '');
    if (!calculator) throw data('There is no such calculator', { status: 404 });
    const workshopId = params.workshopId ?? '';
    if (calculator.id === 'superheat' || calculator.id === 'pattern-shrink') void queryClient.prefetchQuery(alloyQueries.list(workshopId));
    if (calculator.id === 'charge') void queryClient.prefetchQuery(equipmentQueries.mouldList(workshopId));
    if (calculator.id === 'setpoint') void queryClient.prefetchQuery(equipmentQueries.furnaceList(workshopId));
    return null;
  };

export default function CalculatorPage() {
  const { workshopId = '', calculatorId = '' } = useParams();
  const user = useCurrentUser();
  const calculator = findCalculator(calculatorId);
  if (!calculator || !user) return null;
  const units: Units = { temperatureUnit: user.temperatureUnit, massUnit: user.massUnit };
  return (
    <>
      <Link
        to={paths.calculators.getHref(workshopId)}
        className="mb-3 inline-flex min-h-12 items-center gap-1 font-medium text-link underline lg:min-h-0"
      >
        <ArrowLeft aria-hidden className="size-4" />
        Calculators
      </Link>
      <PageHeader title={calculator.title} description={calculator.summary} />
      <CalculatorBody key={calculator.id} id={calculator.id} workshopId={workshopId} units={units} />
    </>
  );
}

/** Each calculator with the workshop data it needs, composed here so the features stay apart. */
function CalculatorBody({ id, workshopId, units }: { id: CalculatorId; workshopId: string; units: Units }) {
  const needsAlloys = id === 'superheat' || id === 'pattern-shrink';
  const alloys = useQuery({ ...alloyQueries.list(workshopId), enabled: needsAlloys });
  const moulds = useQuery({ ...equipmentQueries.mouldList(workshopId), enabled: id === 'charge' });
  const furnaces = useQuery({ ...equipmentQueries.furnaceList(workshopId), enabled: id === 'setpoint' });
  const equipmentHref = paths.equipment.getHref(workshopId);

  switch (id) {
    case 'superheat':
      return <SuperheatCalculator units={units} alloys={alloys.data} />;
    case 'charge':
      return <ChargeCalculator units={units} moulds={moulds.data} mouldsFailed={moulds.isError} equipmentHref={equipmentHref} />;
    case 'yield':
      return <YieldCalculator units={units} />;
    case 'setpoint':
      return (
        <SetpointCalculator
          units={units}
          furnaces={furnaces.data}
          furnacesFailed={furnaces.isError}
          setpointQuery={(furnaceId, targetC) => heatQueries.setpoint(workshopId, furnaceId, targetC)}
          equipmentHref={equipmentHref}
        />
      );
    case 'temperature':
      return <TemperatureConverter units={units} />;
    case 'dew-point':
      return <DewPointCalculator units={units} />;
    case 'hydrogen':
      return <HydrogenCalculator units={units} />;
    case 'solidification':
      return <SolidificationCalculator units={units} />;
    case 'pattern-shrink':
      return <PatternShrinkCalculator units={units} alloys={alloys.data} />;
  }
}
