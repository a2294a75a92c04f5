import { useQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { Bar, BarChart, CartesianGrid, Legend, Tooltip, XAxis, YAxis } from 'recharts';
import { findDefectKind } from '#shared/domain/index.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { DEFECT_GROUP_LOOK } from '#src/config/defect-groups.ts';
import { insightQueries } from '../api/insight-queries.ts';
import { formatMonth, galleryHref, monthWithin, type InsightView } from '../lib/insight-filters.ts';
import { InsightPanel, td, tdFigure, th, thFigure, legendText, type PanelState } from './insight-panel.tsx';

type Props = { workshopId: string; view: InsightView };

export function DefectFrequencyInsight({ workshopId, view }: Props) {
  const { kind: chosenKind, ...filters } = view;
  const query = useQuery(insightQueries.defectFrequency(workshopId, filters));
  const navigate = useNavigate();
  const data = query.data;
  const state: PanelState = query.isPending
    ? { status: 'pending' }
    : query.isError
      ? { status: 'error', error: query.error, retry: () => void query.refetch() }
      : data && data.kinds.length > 0
        ? { status: 'ready' }
        : { status: 'empty' };

  // The chart draws one kind (castings with it, and its marks); with none
  // chosen, the most marked one. The table lists every kind.
  const kind = data && chosenKind && data.kinds.includes(chosenKind) ? chosenKind : data?.kinds[0];
  const known = kind ? findDefectKind(kind) : undefined;
  const look = known ? DEFECT_GROUP_LOOK[known.group] : undefined;
  const colour = known ? `var(--ps-defect-${known.group})` : 'var(--ps-ink)';
  const rows =
    data?.months.map((m) => {
      const k = m.kinds.find((x) => x.kind === kind);
      return { key: m.month, label: formatMonth(m.month), castings: k?.castings ?? 0, marks: k?.marks ?? 0, poured: m.castings };
    }) ?? [];
  const linkFor = (month: string, k: string) =>
    galleryHref(workshopId, { kind: k, ...monthWithin(month, view), alloy: view.alloy, casterId: view.casterId });

  return (
    <InsightPanel
      title="Defects by month"
      description={
        known ? (
          <>
            Castings with{' '}
            <span className="font-medium text-ink">
              {known.name} ({look?.code})
            </span>{' '}
            and its marks, by the month the casting was poured{chosenKind === kind ? '' : ' (the most marked kind)'}. Choose a defect kind
            above to see another; select a bar to open those photos.
          </>
        ) : (
          'Marked defects, by the month the casting was poured.'
        )
      }
      state={state}
      empty={
        <>
          <p>No marked defects in this view yet.</p>
          <p>
            Open a casting’s photos in the <TextLink to={galleryHref(workshopId, {})}>gallery</TextLink> and mark what you see: each mark is
            counted here under the month its casting was poured.
          </p>
        </>
      }
      chart={() => (
          <BarChart responsive style={{ width: '100%', height: '100%' }} data={rows} margin={{ top: 8, right: 8, bottom: 8, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" />
            <YAxis allowDecimals={false} width={40} />
            <Tooltip />
            <Legend formatter={legendText} />
            <Bar
              dataKey="castings"
              name="Castings with it"
              fill={colour}
              cursor="pointer"
              onClick={(d) => kind && navigate(linkFor((d.payload as { key: string }).key, kind))}
            />
            {/* Outlined, not a second colour: the two series differ by fill. */}
            <Bar
              dataKey="marks"
              name="Marks"
              fill="var(--ps-surface-raised)"
              stroke={colour}
              strokeWidth={2}
              cursor="pointer"
              onClick={(d) => kind && navigate(linkFor((d.payload as { key: string }).key, kind))}
            />
          </BarChart>
      )}
      table={() => (
        <table className="w-full border-collapse">
          <caption className="sr-only">Castings with each defect kind and its marks, by month poured</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>Month</th>
              <th scope="col" className={th}>Defect kind</th>
              <th scope="col" className={thFigure}>Castings with it</th>
              <th scope="col" className={thFigure}>Marks</th>
              <th scope="col" className={thFigure}>Castings poured</th>
              <th scope="col" className={th}><span className="sr-only">Photos</span></th>
            </tr>
          </thead>
          <tbody>
            {data?.months.flatMap((m) =>
              m.kinds.length === 0
                ? [
                    <tr key={m.month}>
                      <th scope="row" className={`${td} font-normal`}>{formatMonth(m.month)}</th>
                      <td className={`${td} text-ink-muted`}>no marks</td>
                      <td className={tdFigure}>0</td>
                      <td className={tdFigure}>0</td>
                      <td className={tdFigure}>{m.castings}</td>
                      <td className={td} />
                    </tr>,
                  ]
                : m.kinds.map((k) => {
                    const info = findDefectKind(k.kind);
                    return (
                      <tr key={`${m.month}-${k.kind}`}>
                        <th scope="row" className={`${td} font-normal`}>{formatMonth(m.month)}</th>
                        <td className={td}>
                          {info?.name ?? k.kind}
                          {info ? <span className="text-ink-muted"> ({DEFECT_GROUP_LOOK[info.group].label})</span> : null}
                        </td>
                        <td className={tdFigure}>{k.castings}</td>
                        <td className={tdFigure}>{k.marks}</td>
                        <td className={tdFigure}>{m.castings}</td>
                        <td className={td}>
                          <TextLink to={linkFor(m.month, k.kind)}>
                            Photos<span className="sr-only">: {info?.name ?? k.kind}, {formatMonth(m.month)}</span>
                          </TextLink>
                        </td>
                      </tr>
                    );
                  }),
            )}
          </tbody>
        </table>
      )}
      footnote="The gallery link opens photos of that kind uploaded that month, which is usually when the casting was poured."
    />
  );
}
