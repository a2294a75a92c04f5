import { defectGroup, type DefectGroupId } from '#shared/domain/index.ts';
import { DEFECT_GROUP_LOOK, LABEL_SHAPE_PATHS } from '#src/config/defect-groups.ts';
import { cn } from '#src/lib/cn.ts';

/**
 * A defect group's label as marks carry it: its shape outlined in the
 * group's colour with the group's letter inside, so shape and letter carry
 * the group without colour. Decorative: say the group in words beside it.
 */
export function GroupMark({ group, className }: { group: DefectGroupId; className?: string }) {
  const look = DEFECT_GROUP_LOOK[group];
  return (
    <svg aria-hidden viewBox="0 0 24 24" className={cn('size-7 shrink-0', look.colorClass, className)}>
      <path d={LABEL_SHAPE_PATHS[look.shape]} className="fill-surface-raised" stroke="currentColor" strokeWidth="2.25" strokeLinejoin="round" />
      <text x="12" y="12.5" textAnchor="middle" dominantBaseline="middle" className="fill-ink font-mono" style={{ fontSize: 10, fontWeight: 700 }}>
        {look.code}
      </text>
    </svg>
  );
}

/** "Gas group (G, circle)": the group in words, for text beside a GroupMark. */
export function groupInWords(group: DefectGroupId): string {
  const g = defectGroup(group);
  return `${g.name} group (${g.code}, ${g.shape})`;
}
