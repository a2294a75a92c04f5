import { CircleCheck, CircleDashed, CircleDot } from 'lucide-react';
import { HEAT_TREATMENT_STATE_LABELS, type HeatTreatmentState, type HeatTreatmentSummary } from '#shared/heat-treatment/heat-treatment-schemas.ts';
import { TextLink } from '#src/components/ui/text-link.tsx';
import { paths } from '#src/config/paths.ts';
import { formatDate } from '#src/lib/format.ts';

const STATE_ICONS: Record<HeatTreatmentState, typeof CircleDot> = { planned: CircleDashed, in_progress: CircleDot, done: CircleCheck };

/** The state as an icon and a word, never colour alone. */
export function StateBadge({ state }: { state: HeatTreatmentState }) {
  const Icon = STATE_ICONS[state];
  return (
    <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
      <Icon aria-hidden className="size-4" />
      {HEAT_TREATMENT_STATE_LABELS[state]}
    </span>
  );
}

const th = 'border-b border-line-strong px-2 py-1.5 text-left text-caption font-semibold text-ink-muted';
const td = 'border-b border-line px-2 py-2 text-body text-ink';

export function HeatTreatmentList({ workshopId, plans, currentUserId }: { workshopId: string; plans: readonly HeatTreatmentSummary[]; currentUserId: string }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse">
        <caption className="sr-only">Heat-treatment plans and records</caption>
        <thead>
          <tr>
            <th scope="col" className={th}>Plan</th>
            <th scope="col" className={th}>Caster</th>
            <th scope="col" className={th}>Oven</th>
            <th scope="col" className={`${th} text-right`}>Castings</th>
            <th scope="col" className={th}>State</th>
            <th scope="col" className={th}>Planned</th>
          </tr>
        </thead>
        <tbody>
          {plans.map((p) => (
            <tr key={p.id}>
              <th scope="row" className={`${td} font-normal`}>
                <TextLink to={paths.heatTreatmentDetail.getHref(workshopId, p.id)}>
                  {p.alloy} {p.temper}
                </TextLink>
              </th>
              <td className={td}>{p.casterId === currentUserId ? 'you' : p.casterName}</td>
              <td className={td}>{p.oven}</td>
              <td className={`${td} figures text-right`}>{p.castingCount}</td>
              <td className={td}>
                <StateBadge state={p.state} />
              </td>
              <td className={td}>{formatDate(p.createdAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
