import { DEFECT_GROUP_LOOK, DEFECT_GROUPS, LABEL_SHAPE_PATHS, type DefectGroup } from '#src/config/defect-groups.ts';
import { cn } from '#src/lib/cn.ts';

/** A defect group's label as marks will carry it: shape outline in the group's colour, and its code. */
export function DefectGroupBadge({ group, className }: { group: DefectGroup; className?: string }) {
  const look = DEFECT_GROUP_LOOK[group];
  return (
    <span className={cn('inline-flex items-center gap-2', className)}>
      <svg aria-hidden viewBox="0 0 24 24" className={cn('size-7 shrink-0', look.colorClass)}>
        <path d={LABEL_SHAPE_PATHS[look.shape]} fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinejoin="round" />
      </svg>
      <span className="figures text-caption font-semibold text-ink">{look.code}</span>
      <span className="text-body text-ink">{look.label}</span>
    </span>
  );
}

export function DefectGroupLegend() {
  return (
    <ul aria-label="Defect groups" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      {DEFECT_GROUPS.map((group) => (
        <li key={group} className="rounded-md border border-line bg-surface-raised p-3">
          <DefectGroupBadge group={group} />
        </li>
      ))}
    </ul>
  );
}
