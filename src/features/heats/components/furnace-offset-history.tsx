import { useSuspenseQuery } from '@tanstack/react-query';
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatTemperature, formatTemperatureDifference, median } from '#shared/domain/index.ts';
import { SETPOINT_HISTORY_HEATS } from '#shared/heats/heat-schemas.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate, formatDateTime } from '#src/lib/format.ts';
import { temperatureDifferenceInUnit, type Units } from '#src/lib/unit-input.ts';
import { heatQueries } from '../api/heat-queries.ts';
import { DEFAULT_SORT } from '../lib/heat-filters.ts';

/**
 * A furnace's offset heat by heat: how far the pour temperature ended up
 * from the setpoint (measured − setpoint, as the setpoint suggestion reads
 * it). A small chart, and the same figures as a table for anyone who does
 * not read charts.
 */
export function FurnaceOffsetHistory({ workshopId, furnaceId, units }: { workshopId: string; furnaceId: string; units: Units }) {
  const { data } = useSuspenseQuery(heatQueries.list(workshopId, { ...DEFAULT_SORT, furnaceId }, SETPOINT_HISTORY_HEATS));
  const unit = units.temperatureUnit;
  const points = data.items
    .filter((h) => h.setpointC !== null && h.pourTempC !== null)
    .map((h) => ({ id: h.id, pouredAt: h.pouredAt, setpointC: h.setpointC!, pourTempC: h.pourTempC!, offsetC: h.pourTempC! - h.setpointC! }))
    .reverse();

  if (points.length === 0) {
    return (
      <p className="max-w-prose text-body text-ink">
        No heats on this furnace with both a setpoint and a pour temperature that you can see yet. Log both on the next few heats and the
        furnace’s offset shows here.
      </p>
    );
  }

  const middle = median(points.map((p) => p.offsetC));
  const chartData = points.map((p) => ({ ...p, day: formatDate(p.pouredAt), offset: temperatureDifferenceInUnit(p.offsetC, unit) }));

  return (
    <div className="flex flex-col gap-4">
      <figure className="flex flex-col gap-2">
        <div role="img" aria-label={`Offset of the last ${points.length} heats; median ${formatTemperatureDifference(middle, unit)}. The table below has each heat.`} className="h-56 w-full">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={chartData} margin={{ top: 8, right: 16, bottom: 8, left: 8 }} accessibilityLayer={false}>
              <CartesianGrid stroke="var(--ps-line)" strokeDasharray="3 3" />
              <XAxis dataKey="day" stroke="var(--ps-ink-muted)" tick={{ fontSize: 12 }} />
              <YAxis stroke="var(--ps-ink-muted)" tick={{ fontSize: 12 }} unit={` °${unit}`} width={72} />
              <ReferenceLine y={0} stroke="var(--ps-ink-muted)" />
              <ReferenceLine y={temperatureDifferenceInUnit(middle, unit)} stroke="var(--ps-heat)" strokeDasharray="6 3" />
              <Tooltip
                formatter={(value) => [`${Number(value).toFixed(0)} °${unit}`, 'offset']}
                contentStyle={{ background: 'var(--ps-surface-raised)', borderColor: 'var(--ps-line-strong)', color: 'var(--ps-ink)' }}
              />
              <Line type="monotone" dataKey="offset" stroke="var(--ps-heat)" strokeWidth={2} dot={{ r: 4 }} isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
        <figcaption className="text-caption text-ink">
          Pour temperature minus setpoint, oldest heat on the left. The dashed line is the median of these heats,{' '}
          <span className="figures">{formatTemperatureDifference(middle, unit)}</span>; above zero the metal came out hotter than set.
        </figcaption>
      </figure>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-left text-body">
          <caption className="mb-2 text-left text-body font-semibold text-ink">The same heats as a table</caption>
          <thead>
            <tr className="border-b border-line text-caption text-ink-muted">
              <th scope="col" className="py-2 pr-4 font-medium">Poured</th>
              <th scope="col" className="py-2 pr-4 text-right font-medium">Setpoint</th>
              <th scope="col" className="py-2 pr-4 text-right font-medium">Pour</th>
              <th scope="col" className="py-2 text-right font-medium">Offset</th>
            </tr>
          </thead>
          <tbody>
            {[...points].reverse().map((p) => (
              <tr key={p.id} className="border-b border-line">
                <td className="py-2 pr-4">
                  <TextLink to={paths.heat.getHref(workshopId, p.id)}>{formatDateTime(p.pouredAt)}</TextLink>
                </td>
                <td className="figures py-2 pr-4 text-right text-heat">{formatTemperature(p.setpointC, unit)}</td>
                <td className="figures py-2 pr-4 text-right text-heat">{formatTemperature(p.pourTempC, unit)}</td>
                <td className="figures py-2 text-right">
                  {p.offsetC > 0 ? '+' : ''}
                  {formatTemperatureDifference(p.offsetC, unit)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
