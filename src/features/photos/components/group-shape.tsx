import { findDefectKind, type DefectKindId } from '#shared/domain/index.ts';
import { DEFECT_GROUP_LOOK, LABEL_SHAPE_PATHS, type DefectGroup } from '#src/config/defect-groups.ts';
import { cn } from '#src/lib/cn.ts';

/**
 * A defect group's label shape, outlined in the group's colour, with a mark
 * number or the group's letter inside: shape and letter carry the group
 * without colour. For page text; marks on the photo draw their own.
 */
export function GroupShape({ group, number, className }: { group: DefectGroup; number?: number; className?: string }) {
  const look = DEFECT_GROUP_LOOK[group];
  const text = number === undefined ? look.code : String(number);
  return (
    <svg aria-hidden viewBox="0 0 24 24" className={cn('size-7 shrink-0', look.colorClass, className)}>
      <path d={LABEL_SHAPE_PATHS[look.shape]} className="fill-surface-raised" stroke="currentColor" strokeWidth="2.25" strokeLinejoin="round" />
      <text
        x="12"
        y="12.5"
        textAnchor="middle"
        dominantBaseline="middle"
        className="fill-ink font-mono"
        style={{ fontSize: text.length > 1 ? 8.5 : 10, fontWeight: 700 }}
      >
        {text}
      </text>
    </svg>
  );
}

/** A defect kind as lists show it: group shape (with the mark's number), letter, short name; the group in words for screen readers. */
export function DefectKindTag({ kind, number, className }: { kind: DefectKindId; number?: number; className?: string }) {
  const info = findDefectKind(kind);
  if (!info) return <span className={className}>{kind}</span>;
  const look = DEFECT_GROUP_LOOK[info.group];
  return (
    <span className={cn('inline-flex min-w-0 items-center gap-2', className)}>
      <GroupShape group={info.group} number={number} />
      <span className={cn('figures text-caption font-bold', look.colorClass)} aria-hidden>
        {look.code}
      </span>
      <span className="min-w-0 truncate font-medium text-ink">{info.shortName}</span>
      <span className="sr-only">({look.label} group)</span>
    </span>
  );
}

/** The groups of the given kinds, each once, as small letter-and-shape badges (gallery cards). */
export function GroupBadges({ kinds, className }: { kinds: readonly DefectKindId[]; className?: string }) {
  const groups = [...new Set(kinds.map((k) => findDefectKind(k)?.group).filter((g): g is DefectGroup => g !== undefined))];
  if (!groups.length) return null;
  return (
    <ul className={cn('flex flex-wrap gap-1', className)} aria-label="Defect groups marked">
      {groups.map((g) => (
        <li key={g} className="inline-flex items-center gap-1 rounded-sm bg-surface-sunken px-1.5 py-0.5 text-caption">
          <GroupShape group={g} className="size-5" />
          <span className="text-ink">{DEFECT_GROUP_LOOK[g].label}</span>
        </li>
      ))}
    </ul>
  );
}
