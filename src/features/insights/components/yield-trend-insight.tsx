import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { CartesianGrid, Legend, Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatNumber } from '#shared/domain/index.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { insightQueries } from '../api/insight-queries.ts';
import { formatMonth, heatsHref, monthWithin, type InsightView } from '../lib/insight-filters.ts';
import { InsightPanel, td, tdFigure, th, thFigure, legendText, type PanelState } from './insight-panel.tsx';

type Props = { workshopId: string; view: InsightView };

const pct = (v: number | null) => (v === null ? '—' : `${formatNumber(v, 1)} %`);

export function YieldTrendInsight({ workshopId, view }: Props) {
  const { kind: _kind, ...filters } = view;
  const query = useQuery(insightQueries.yieldTrend(workshopId, filters));
  const navigate = useNavigate();
  const data = query.data;
  const state: PanelState = query.isPending
    ? { status: 'pending' }
    : query.isError
      ? { status: 'error', error: query.error, retry: () => void query.refetch() }
      : data && data.months.some((m) => m.heats > 0)
        ? { status: 'ready' }
        : { status: 'empty' };
  const rows = data?.months.map((m) => ({ key: m.month, label: formatMonth(m.month), median: m.medianPct, mean: m.meanPct, heats: m.heats })) ?? [];
  const linkFor = (month: string) => heatsHref(workshopId, { alloy: view.alloy, casterId: view.casterId, ...monthWithin(month, view) });

  return (
    <InsightPanel
      title="Casting yield by month"
      description="Median and mean yield (castings ÷ metal poured) of the heats whose castings were all weighed. Select a month to open its heats."
      state={state}
      empty={
        <>
          <p>No heat in this view has every casting weighed yet.</p>
          <p>
            Weigh each casting with its gating cut off and enter the mass on the casting in the{' '}
            <TextLink to={heatsHref(workshopId, {})}>heat log</TextLink>. Yield is castings ÷ the charge, so a heat counts once all its castings
            are weighed.
          </p>
        </>
      }
      chart={() => (
          <LineChart
            responsive
            style={{ width: '100%', height: '100%' }}
            data={rows}
            margin={{ top: 8, right: 8, bottom: 8, left: 0 }}
            onClick={(state) => {
              const row = rows[Number(state?.activeIndex)];
              if (row) navigate(linkFor(row.key));
            }}
          >
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" />
            <YAxis unit=" %" width={60} domain={[0, 100]} />
            <Tooltip formatter={(v) => (typeof v === 'number' ? `${formatNumber(v, 1)} %` : String(v))} />
            <Legend formatter={legendText} />
            <Line type="monotone" dataKey="median" name="Median" stroke="var(--ps-heat)" strokeWidth={2} connectNulls dot={{ r: 4 }} cursor="pointer" />
            {/* Dashed with square markers, so it differs from the median by more than hue. */}
            <Line
              type="monotone"
              dataKey="mean"
              name="Mean"
              stroke="var(--ps-link)"
              strokeWidth={2}
              strokeDasharray="6 4"
              connectNulls
              dot={{ r: 4, strokeWidth: 2 }}
              legendType="square"
              cursor="pointer"
            />
          </LineChart>
      )}
      table={() => (
        <table className="w-full border-collapse">
          <caption className="sr-only">Casting yield by month: heats counted, median and mean</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Month</th>
              <th scope="col" className={thFigure}>Heats weighed</th>
              <th scope="col" className={thFigure}>Median yield</th>
              <th scope="col" className={thFigure}>Mean yield</th>
              <th scope="col" className={th}><span className="sr-only">Heats</span></th>
            </tr>
          </thead>
          <tbody>
            {data?.months.map((m) => (
              <tr key={m.month}>
                <th scope="row" className={`${td} font-normal`}>{formatMonth(m.month)}</th>
                <td className={tdFigure}>{m.heats}</td>
                <td className={tdFigure}>{pct(m.medianPct)}</td>
                <td className={tdFigure}>{pct(m.meanPct)}</td>
                <td className={td}>
                  {m.heats > 0 ? (
                    <TextLink to={linkFor(m.month)}>
                      Heats<span className="sr-only">: {formatMonth(m.month)}</span>
                    </TextLink>
                  ) : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      footnote={
        data ? (
          <>
            {data.excluded > 0 ? `${data.excluded} heat${data.excluded === 1 ? '' : 's'} left out: no castings, or a casting not weighed. ` : null}
            Definition: {data.source}.
          </>
        ) : null
      }
    />
  );
}
