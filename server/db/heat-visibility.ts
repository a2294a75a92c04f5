import type { Access } from '../../shared/auth/permissions.ts';

/** Who is reading heats, and with which reach (from `accessFor(actor, 'read', 'heat')`). */
export type HeatVisibility = { access: readonly Access[]; actorId: string };

/**
 * SQL for "the actor may read this heat", over alias h, with :actorId bound.
 * One rule for every module that lists or counts heats (the heat log,
 * insights), so a chart never counts a heat its link would not show.
 */
export function heatVisibilitySql(v: HeatVisibility): string {
  if (v.access.includes('any')) return 'true';
  const parts: string[] = [];
  if (v.access.includes('own')) parts.push('h.caster_id = :actorId');
  if (v.access.includes('mentee')) {
    parts.push(
      'h.caster_id IN (SELECT a.student_id FROM mentor_assignments a WHERE a.workshop_id = h.workshop_id AND a.mentor_id = :actorId)',
    );
  }
  return parts.length ? `(${parts.join(' OR ')})` : 'false';
}
