import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { CartesianGrid, Legend, ReferenceLine, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from 'recharts';
import { formatNumber, formatTemperature, formatTemperatureDifference, type TemperatureUnit } from '#shared/domain/index.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate } from '#src/lib/format.ts';
import { insightQueries } from '../api/insight-queries.ts';
import { dayOf, heatsHref, type InsightView } from '../lib/insight-filters.ts';
import { InsightPanel, SERIES_COLOURS, SERIES_SHAPES, SHAPE_WORDS, td, tdFigure, th, thFigure, legendText, type PanelState } from './insight-panel.tsx';

type Props = { workshopId: string; view: InsightView; unit: TemperatureUnit };

/** A signed difference in the reader's unit: "+12 °C", "−8 °F". */
function signedDifference(deltaC: number, unit: TemperatureUnit) {
  const text = formatTemperatureDifference(Math.abs(deltaC), unit);
  return deltaC > 0 ? `+${text}` : deltaC < 0 ? `−${text}` : text;
}

export function FurnaceOffsetInsight({ workshopId, view, unit }: Props) {
  const { kind: _kind, ...filters } = view;
  const query = useQuery(insightQueries.furnaceOffset(workshopId, filters));
  const navigate = useNavigate();
  const furnaces = query.data?.furnaces ?? [];
  const state: PanelState = query.isPending
    ? { status: 'pending' }
    : query.isError
      ? { status: 'error', error: query.error, retry: () => void query.refetch() }
      : furnaces.length > 0
        ? { status: 'ready' }
        : { status: 'empty' };
  const inUnit = (deltaC: number) => (unit === 'C' ? deltaC : (deltaC * 9) / 5);
  const pointHref = (furnaceId: string, pouredAt: string) =>
    heatsHref(workshopId, { furnaceId, from: dayOf(pouredAt), to: dayOf(pouredAt), casterId: view.casterId, alloy: view.alloy });

  return (
    <InsightPanel
      title="Furnace offset"
      description={`Pour temperature minus setpoint for each heat, in °${unit}: below the zero line the metal came out cooler than set. Select a point to open that day’s heats.`}
      state={state}
      empty={
        <>
          <p>No heat in this view has both a furnace setpoint and a measured pour temperature.</p>
          <p>
            Name the furnace, its setpoint and the pour temperature you read with the probe when you log a heat (add furnaces under{' '}
            <TextLink to={paths.equipment.getHref(workshopId)}>Equipment</TextLink>). The offset tells you what to set next time.
          </p>
        </>
      }
      controls={
        <ul className="flex flex-col gap-1 text-body">
          {furnaces.map((f, i) => (
            <li key={f.id}>
              <span className="font-medium">{f.name}</span> ({SHAPE_WORDS[SERIES_SHAPES[i % SERIES_SHAPES.length]]} on the chart):{' '}
              {f.medianOffsetC === null ? (
                'no readings'
              ) : (
                <>
                  median offset <span className="figures">{signedDifference(f.medianOffsetC, unit)}</span> over {f.points.length} heat
                  {f.points.length === 1 ? '' : 's'}
                </>
              )}
            </li>
          ))}
        </ul>
      }
      chart={() => (
          <ScatterChart responsive style={{ width: '100%', height: '100%' }} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="t" type="number" scale="time" domain={['dataMin', 'dataMax']} tickFormatter={(t: number) => formatDate(new Date(t).toISOString())} />
            <YAxis dataKey="offset" type="number" unit={` °${unit}`} width={64} name="Offset" />
            <Tooltip formatter={(v) => (typeof v === 'number' ? formatNumber(v, 0) : String(v))} labelFormatter={() => ''} />
            <Legend formatter={legendText} />
            <ReferenceLine y={0} stroke="var(--ps-ink-muted)" label={{ value: 'setpoint', position: 'insideTopRight' }} />
            {furnaces.map((f, i) => (
              <Scatter
                key={f.id}
                name={f.name}
                data={f.points.map((p) => ({ t: Date.parse(p.pouredAt), offset: inUnit(p.offsetC), pouredAt: p.pouredAt }))}
                fill={SERIES_COLOURS[i % SERIES_COLOURS.length]}
                shape={SERIES_SHAPES[i % SERIES_SHAPES.length]}
                legendType={SERIES_SHAPES[i % SERIES_SHAPES.length]}
                cursor="pointer"
                onClick={(d) => navigate(pointHref(f.id, (d as unknown as { pouredAt: string }).pouredAt))}
              />
            ))}
          </ScatterChart>
      )}
      table={() => (
        <table className="w-full border-collapse">
          <caption className="sr-only">Furnace offset per heat: setpoint, pour temperature and their difference</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Furnace</th>
              <th scope="col" className={th}>Poured</th>
              <th scope="col" className={thFigure}>Setpoint</th>
              <th scope="col" className={thFigure}>Pour</th>
              <th scope="col" className={thFigure}>Offset</th>
            </tr>
          </thead>
          <tbody>
            {furnaces.flatMap((f) =>
              f.points.map((p) => (
                <tr key={p.heatId}>
                  <th scope="row" className={`${td} font-normal`}>{f.name}</th>
                  <td className={td}>
                    <TextLink to={pointHref(f.id, p.pouredAt)}>{formatDate(p.pouredAt)}</TextLink>
                  </td>
                  <td className={tdFigure}>{formatTemperature(p.setpointC, unit)}</td>
                  <td className={tdFigure}>{formatTemperature(p.pourTempC, unit)}</td>
                  <td className={tdFigure}>{signedDifference(p.offsetC, unit)}</td>
                </tr>
              )),
            )}
          </tbody>
        </table>
      )}
    />
  );
}
