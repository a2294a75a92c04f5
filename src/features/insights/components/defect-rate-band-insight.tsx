import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useNavigate } from 'react-router-dom';
import { Bar, BarChart, CartesianGrid, LabelList, Legend, Tooltip, XAxis, YAxis } from 'recharts';
import { DEFECT_GROUP_IDS, cToF, findDefectKind, formatNumber, formatTemperature, type TemperatureUnit } from '#shared/domain/index.ts';
import type { DefectRateByBand, RateKey } from '#shared/insights/insight-schemas.ts';
import { DEFECT_GROUP_LOOK, type DefectGroup } from '#src/config/defect-groups.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { galleryHref, heatsHref, type InsightView } from '../lib/insight-filters.ts';
import { InsightPanel, td, tdFigure, th, thFigure, legendText, type PanelState } from './insight-panel.tsx';

type Props = {
  workshopId: string;
  view: InsightView;
  unit: TemperatureUnit;
  title: string;
  description: ReactNode;
  /** What the band is of, for the table ("Pour temperature", "Mould preheat"). */
  bandLabel: string;
  query: UseQueryResult<DefectRateByBand>;
  empty: ReactNode;
  /** Shown instead of the chart when the insight cannot be asked yet (no alloy chosen). */
  blocked?: ReactNode;
};

const isGroup = (key: RateKey): key is DefectGroup => (DEFECT_GROUP_IDS as readonly string[]).includes(key);

function keyLabel(key: RateKey): { name: string; code: string; colour: string } {
  if (isGroup(key)) {
    const look = DEFECT_GROUP_LOOK[key];
    return { name: look.label, code: look.code, colour: `var(--ps-defect-${key})` };
  }
  const kind = findDefectKind(key);
  return {
    name: kind?.name ?? key,
    code: kind ? DEFECT_GROUP_LOOK[kind.group].code : '?',
    colour: kind ? `var(--ps-defect-${kind.group})` : 'var(--ps-ink)',
  };
}

/** "700–720 °C" in the reader's unit; the band itself is cut in °C. */
export function bandText(fromC: number, toC: number, unit: TemperatureUnit) {
  return `${formatNumber(unit === 'C' ? fromC : cToF(fromC))}–${formatTemperature(toC, unit)}`;
}

const pct = (share: number) => `${formatNumber(share * 100, 0)} %`;

/**
 * Share of castings with a defect per temperature band: one bar per defect
 * group (each with its group letter on top, so bars are told apart without
 * colour), or one bar for a chosen kind.
 */
export function DefectRateBandInsight({ workshopId, view, unit, title, description, bandLabel, query, empty, blocked }: Props) {
  const navigate = useNavigate();
  const data = query.data;
  const state: PanelState = blocked
    ? { status: 'empty' }
    : query.isPending
      ? { status: 'pending' }
      : query.isError
        ? { status: 'error', error: query.error, retry: () => void query.refetch() }
        : data && data.bands.length > 0
          ? { status: 'ready' }
          : { status: 'empty' };
  // Groups nobody marked would only add empty bars.
  const keys = data ? data.keys.filter((k) => data.by === 'kind' || data.bands.some((b) => b.rates.some((r) => r.key === k && r.castings > 0))) : [];
  const rows =
    data?.bands.map((b) => ({
      label: bandText(b.fromC, b.toC, unit),
      ...Object.fromEntries(b.rates.map((r) => [r.key, Math.round(r.share * 1000) / 10])),
    })) ?? [];
  const heatsLink = heatsHref(workshopId, { alloy: view.alloy, from: view.from, to: view.to, casterId: view.casterId });
  const open = () =>
    navigate(data?.by === 'kind' ? galleryHref(workshopId, { kind: data.keys[0], alloy: view.alloy, from: view.from, to: view.to, casterId: view.casterId }) : heatsLink);

  return (
    <InsightPanel
      title={title}
      description={description}
      state={state}
      empty={blocked ?? empty}
      chart={() => (
          <BarChart responsive style={{ width: '100%', height: '100%' }} data={rows} margin={{ top: 20, right: 8, bottom: 8, left: 0 }}>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" />
            <YAxis unit=" %" width={60} domain={[0, 100]} />
            <Tooltip formatter={(v) => `${String(v)} %`} />
            <Legend formatter={legendText} />
            {keys.map((key) => {
              const l = keyLabel(key);
              return (
                <Bar key={key} dataKey={key} name={`${l.name} (${l.code})`} fill={l.colour} cursor="pointer" onClick={open}>
                  <LabelList dataKey={key} position="top" formatter={() => l.code} className="fill-ink text-caption" />
                </Bar>
              );
            })}
          </BarChart>
      )}
      table={() => (
        <table className="w-full border-collapse">
          <caption className="sr-only">{title}: castings per band and the share with each defect</caption>
          <thead>
            <tr>
              <th scope="col" className={th}>{bandLabel}</th>
              <th scope="col" className={thFigure}>Heats</th>
              <th scope="col" className={thFigure}>Castings</th>
              {keys.map((key) => (
                <th key={key} scope="col" className={thFigure}>
                  {keyLabel(key).name}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {data?.bands.map((b) => (
              <tr key={b.fromC}>
                <th scope="row" className={`${td} figures font-normal whitespace-nowrap`}>{bandText(b.fromC, b.toC, unit)}</th>
                <td className={tdFigure}>{b.heats}</td>
                <td className={tdFigure}>{b.castings}</td>
                {keys.map((key) => {
                  const r = b.rates.find((x) => x.key === key);
                  return (
                    <td key={key} className={tdFigure}>
                      {r ? `${r.castings} (${pct(r.share)})` : '—'}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      )}
      footnote={
        data ? (
          <>
            {data.unrecorded.castings > 0
              ? `${data.unrecorded.castings} casting${data.unrecorded.castings === 1 ? '' : 's'} left out: no ${bandLabel.toLowerCase()} recorded. `
              : null}
            A share counts each casting once, however many marks it carries.{' '}
            <TextLink to={heatsLink}>Open these heats</TextLink>
          </>
        ) : null
      }
    />
  );
}
