import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { CartesianGrid, Legend, ReferenceLine, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from 'recharts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate } from '#src/lib/format.ts';
import { insightQueries } from '../api/insight-queries.ts';
import { dayOf, heatsHref, type InsightView } from '../lib/insight-filters.ts';
import { InsightPanel, SERIES_COLOURS, SERIES_SHAPES, td, tdFigure, th, thFigure, legendText, type PanelState } from './insight-panel.tsx';

type Props = { workshopId: string; view: InsightView };

const MATERIAL_WORDS: Record<string, string> = {
  clay_graphite: 'clay-graphite',
  silicon_carbide: 'silicon carbide',
  steel: 'steel',
  ceramic: 'ceramic',
  other: 'other',
};

type Event = { key: string; crucible: string; date: string; what: string; cycle: number | null; href?: string };

export function CrucibleCyclesInsight({ workshopId, view }: Props) {
  const { kind: _kind, ...filters } = view;
  const query = useQuery(insightQueries.crucibleCycles(workshopId, filters));
  const navigate = useNavigate();
  const crucibles = query.data?.crucibles ?? [];
  const state: PanelState = query.isPending
    ? { status: 'pending' }
    : query.isError
      ? { status: 'error', error: query.error, retry: () => void query.refetch() }
      : crucibles.some((c) => c.points.length > 0)
        ? { status: 'ready' }
        : { status: 'empty' };
  const limits = [...new Set(crucibles.flatMap((c) => [c.warnAt, c.limitAt]))];
  const pointHref = (c: { id: string }, pouredAt: string) =>
    heatsHref(workshopId, { crucibleId: c.id, from: dayOf(pouredAt), to: dayOf(pouredAt), casterId: view.casterId, alloy: view.alloy });

  const events: Event[] = crucibles.flatMap((c) => [
    ...c.points.map((p) => ({ key: `h-${p.heatId}`, crucible: c.name, date: p.pouredAt, what: 'Heat', cycle: p.cycle, href: pointHref(c, p.pouredAt) })),
    ...c.notes.map((n) => ({ key: `n-${n.id}`, crucible: c.name, date: `${n.notedOn}T12:00:00Z`, what: `Note: ${n.note}`, cycle: null })),
    ...(c.retiredOn ? [{ key: `r-${c.id}`, crucible: c.name, date: `${c.retiredOn}T12:00:00Z`, what: 'Retired', cycle: c.cycleCount }] : []),
  ]);
  events.sort((a, b) => a.crucible.localeCompare(b.crucible) || a.date.localeCompare(b.date));

  return (
    <InsightPanel
      title="Crucible life"
      description="Each crucible’s heat-cycle number at every heat, against the warning and limit lines, with its condition notes and retirement. Select a point to open that day’s heats."
      state={state}
      empty={
        <>
          <p>No heat in this view names a crucible.</p>
          <p>
            Add your crucibles under <TextLink to={paths.equipment.getHref(workshopId)}>Equipment</TextLink> and pick the one you melt in when you
            log a heat: each heat is one cycle, and the count shows here over time.
          </p>
        </>
      }
      chart={() => (
          <ScatterChart responsive style={{ width: '100%', height: '100%' }} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis
              dataKey="t"
              type="number"
              scale="time"
              domain={['dataMin', 'dataMax']}
              tickFormatter={(t: number) => formatDate(new Date(t).toISOString())}
            />
            <YAxis dataKey="cycle" type="number" allowDecimals={false} width={40} name="Cycle" />
            <Tooltip labelFormatter={(t) => formatDate(new Date(Number(t)).toISOString())} />
            <Legend formatter={legendText} />
            {limits.map((v) => (
              <ReferenceLine key={v} y={v} stroke="var(--ps-caution-line)" strokeDasharray="4 4" label={{ value: `${v} cycles`, position: 'insideTopLeft' }} />
            ))}
            {crucibles.map((c, i) => (
              <Scatter
                key={c.id}
                name={c.name}
                data={c.points.map((p) => ({ t: Date.parse(p.pouredAt), cycle: p.cycle, pouredAt: p.pouredAt }))}
                fill={SERIES_COLOURS[i % SERIES_COLOURS.length]}
                shape={SERIES_SHAPES[i % SERIES_SHAPES.length]}
                legendType={SERIES_SHAPES[i % SERIES_SHAPES.length]}
                line
                cursor="pointer"
                onClick={(d) => navigate(pointHref(c, (d as unknown as { pouredAt: string }).pouredAt))}
              />
            ))}
          </ScatterChart>
      )}
      table={() => (
        <>
          <table className="mb-4 w-full border-collapse">
            <caption className="sr-only">Crucibles: cycles, limits, service dates</caption>
            <thead>
              <tr>
                <th scope="col" className={th}>Crucible</th>
                <th scope="col" className={th}>Material</th>
                <th scope="col" className={thFigure}>Cycles</th>
                <th scope="col" className={thFigure}>Warn at</th>
                <th scope="col" className={thFigure}>Limit</th>
                <th scope="col" className={th}>In service since</th>
                <th scope="col" className={th}>Retired</th>
              </tr>
            </thead>
            <tbody>
              {crucibles.map((c) => (
                <tr key={c.id}>
                  <th scope="row" className={`${td} font-normal`}>{c.name}</th>
                  <td className={td}>{MATERIAL_WORDS[c.material]}</td>
                  <td className={tdFigure}>{c.cycleCount}</td>
                  <td className={tdFigure}>{c.warnAt}</td>
                  <td className={tdFigure}>{c.limitAt}</td>
                  <td className={td}>{c.inServiceSince ? formatDate(c.inServiceSince) : '—'}</td>
                  <td className={td}>{c.retiredOn ? formatDate(c.retiredOn) : 'in use'}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <table className="w-full border-collapse">
            <caption className="sr-only">Crucible history: heats with their cycle number, condition notes and retirement</caption>
            <thead>
              <tr>
                <th scope="col" className={th}>Crucible</th>
                <th scope="col" className={th}>Date</th>
                <th scope="col" className={th}>Event</th>
                <th scope="col" className={thFigure}>Cycle</th>
              </tr>
            </thead>
            <tbody>
              {events.map((e) => (
                <tr key={e.key}>
                  <th scope="row" className={`${td} font-normal`}>{e.crucible}</th>
                  <td className={td}>{formatDate(e.date)}</td>
                  <td className={td}>
                    {e.href ? (
                      <TextLink to={e.href}>
                        {e.what}
                        <span className="sr-only">
                          {' '}
                          on {e.crucible}, {formatDate(e.date)}
                        </span>
                      </TextLink>
                    ) : (
                      e.what
                    )}
                  </td>
                  <td className={tdFigure}>{e.cycle ?? ''}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </>
      )}
      footnote="Cycle numbers count every heat in the crucible, whoever poured it; the points are the heats you can open."
    />
  );
}
