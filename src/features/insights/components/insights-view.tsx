import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import { findAlloy, pourRangeFor, type TemperatureUnit } from '#shared/domain/index.ts';
import { formatTemperatureRange } from '#shared/heat-treatment/compare-plan.ts';
import { MOULD_PREHEAT_BAND_WIDTH_C, POUR_BAND_WIDTH_C } from '#shared/insights/insight-schemas.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { insightQueries } from '../api/insight-queries.ts';
import { parseInsightView, viewToParams, type InsightView } from '../lib/insight-filters.ts';
import { CrucibleCyclesInsight } from './crucible-cycles-insight.tsx';
import { DefectFrequencyInsight } from './defect-frequency-insight.tsx';
import { DefectRateBandInsight } from './defect-rate-band-insight.tsx';
import { FurnaceOffsetInsight } from './furnace-offset-insight.tsx';
import { InsightFilterBar } from './insight-filter-bar.tsx';
import { YieldTrendInsight } from './yield-trend-insight.tsx';

type Props = {
  workshopId: string;
  unit: TemperatureUnit;
  casters: readonly { id: string; name: string }[];
};

/** The insights page's body: the filters (in the URL) and one panel per insight. */
export function InsightsView({ workshopId, unit, casters }: Props) {
  const [params, setParams] = useSearchParams();
  const view = parseInsightView(params);
  const onChange = (next: InsightView) => setParams(viewToParams(next, params), { replace: true });
  const { kind, ...filters } = view;

  const pourBand = useQuery({ ...insightQueries.pourBand(workshopId, { ...filters, alloy: view.alloy ?? '', kind }), enabled: Boolean(view.alloy) });
  const preheatBand = useQuery(insightQueries.mouldPreheatBand(workshopId, { ...filters, kind }));
  const alloy = view.alloy ? findAlloy(view.alloy) : undefined;
  const sandRange = alloy ? pourRangeFor(alloy, 'sand') : undefined;
  const bandWidth = (c: number) => (unit === 'C' ? `${c} °C` : `${(c * 9) / 5} °F`);
  const what = kind ? 'the chosen kind' : 'each defect group';

  return (
    <>
      <InsightFilterBar view={view} onChange={onChange} casters={casters} />
      <div className="grid gap-6 xl:grid-cols-2">
        <DefectFrequencyInsight workshopId={workshopId} view={view} />
        <DefectRateBandInsight
          workshopId={workshopId}
          view={view}
          unit={unit}
          title="Defects by pour temperature"
          bandLabel="Pour temperature"
          description={
            <>
              Share of castings with {what}, in {bandWidth(POUR_BAND_WIDTH_C)} bands of pour temperature
              {alloy && sandRange ? (
                <>
                  . The library gives {alloy.designation} a pouring range of{' '}
                  <span className="figures">{formatTemperatureRange(sandRange.range, unit)}</span>
                  {sandRange.mouldKind === 'sand' ? ' for sand moulds' : ''}
                </>
              ) : null}
              .
            </>
          }
          query={pourBand}
          blocked={
            view.alloy ? undefined : (
              <>
                <p>Choose an alloy above to compare pour temperatures.</p>
                <p>Pouring ranges differ from alloy to alloy, so this chart reads one alloy at a time.</p>
              </>
            )
          }
          empty={
            <>
              <p>No castings in this view come from heats with a pour temperature.</p>
              <p>
                Read the melt with a probe just before pouring and enter it on the heat in the{' '}
                <TextLink to={paths.heats.getHref(workshopId)}>heat log</TextLink>, then mark defects on the castings’ photos.
              </p>
            </>
          }
        />
        <DefectRateBandInsight
          workshopId={workshopId}
          view={view}
          unit={unit}
          title="Defects by mould preheat"
          bandLabel="Mould preheat"
          description={`Share of castings with ${what}, in ${bandWidth(MOULD_PREHEAT_BAND_WIDTH_C)} bands of the mould’s preheat temperature.`}
          query={preheatBand}
          empty={
            <>
              <p>No castings in this view have a mould preheat recorded.</p>
              <p>
                Note the mould’s temperature on each casting when you log a heat: a cold metal mould is a common cause of misruns and cold
                shuts.
              </p>
            </>
          }
        />
        <YieldTrendInsight workshopId={workshopId} view={view} />
        <CrucibleCyclesInsight workshopId={workshopId} view={view} />
        <FurnaceOffsetInsight workshopId={workshopId} view={view} unit={unit} />
      </div>
    </>
  );
}
