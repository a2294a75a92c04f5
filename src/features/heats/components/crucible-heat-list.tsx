import { useSuspenseQuery } from '@tanstack/react-query';
import { TriangleAlert } from 'lucide-react';
import { formatTemperature } from '#shared/domain/index.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDateTime } from '#src/lib/format.ts';
import type { Units } from '#src/lib/unit-input.ts';
import { heatQueries } from '../api/heat-queries.ts';
import { DEFAULT_SORT, searchFromFilter } from '../lib/heat-filters.ts';

/** How many of a crucible's newest heats its page lists; the heat log has the rest. */
const CRUCIBLE_HEATS_SHOWN = 25;

/**
 * The heats a crucible went through, newest first, with the ones that
 * shocked it (a fast heat-up or a quench) marked in words and an icon.
 */
export function CrucibleHeatList({ workshopId, crucibleId, units }: { workshopId: string; crucibleId: string; units: Units }) {
  const filter = { ...DEFAULT_SORT, crucibleId };
  const { data } = useSuspenseQuery(heatQueries.list(workshopId, filter, CRUCIBLE_HEATS_SHOWN));
  const allHref = `${paths.heats.getHref(workshopId)}?${searchFromFilter(filter).toString()}`;

  if (data.items.length === 0) {
    return <p className="text-body text-ink">No heats you can see have used this crucible yet.</p>;
  }
  return (
    <div className="flex flex-col gap-3">
      <ul className="flex flex-col divide-y divide-line">
        {data.items.map((h) => {
          const shocked = h.cautionIds.includes('crucible_shock');
          return (
            <li key={h.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
              <TextLink to={paths.heat.getHref(workshopId, h.id)} className="inline-flex min-h-12 items-center lg:min-h-0">
                {formatDateTime(h.pouredAt)} · {h.alloy}
              </TextLink>
              <span className="flex flex-wrap items-center gap-3 text-caption text-ink">
                {h.pourTempC === null ? null : <span className="figures text-heat">{formatTemperature(h.pourTempC, units.temperatureUnit)}</span>}
                {shocked ? (
                  <span className="inline-flex items-center gap-1 font-semibold">
                    <TriangleAlert aria-hidden className="size-4 text-caution" /> shock logged
                  </span>
                ) : null}
                <span className="text-ink-muted">{h.casterName}</span>
              </span>
            </li>
          );
        })}
      </ul>
      {data.nextCursor ? <TextLink to={allHref}>All heats with this crucible, in the heat log</TextLink> : null}
    </div>
  );
}
