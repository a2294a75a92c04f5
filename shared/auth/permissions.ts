import type { Actor, Role } from './roles.ts';

export type Action = 'create' | 'read' | 'update' | 'delete' | 'manage';
export type Entity =
  | 'workshop'
  | 'member'
  | 'invitation'
  | 'heat'
  | 'equipment'
  | 'photo'
  | 'mark'
  | 'report'
  | 'comment'
  | 'rule';
export type Permission = `${Action}:${Entity}:${'own' | 'any'}`;

// Students and casters log their own work; mentors read and review; admins run
// the workshop. "own" grants need the resource's owner to be the actor.
const GRANTS = {
  student: [
    'read:workshop:any',
    'read:member:any',
    'create:heat:own',
    'read:heat:own',
    'update:heat:own',
    'delete:heat:own',
    'read:equipment:any',
    'create:photo:own',
    'read:photo:any',
    'delete:photo:own',
    'create:mark:own',
    'update:mark:own',
    'delete:mark:own',
    'create:report:own',
    'read:report:own',
    'update:report:own',
    'create:comment:own',
    'update:comment:own',
    'delete:comment:own',
  ],
  caster: [
    'read:workshop:any',
    'read:member:any',
    'create:heat:own',
    'read:heat:any',
    'update:heat:own',
    'delete:heat:own',
    'read:equipment:any',
    'create:equipment:any',
    'update:equipment:any',
    'delete:equipment:any',
    'create:photo:own',
    'read:photo:any',
    'delete:photo:own',
    'create:mark:own',
    'update:mark:own',
    'delete:mark:own',
    'create:report:own',
    'read:report:own',
    'update:report:own',
    'create:comment:own',
    'update:comment:own',
    'delete:comment:own',
  ],
  mentor: [
    'read:workshop:any',
    'read:member:any',
    'read:heat:any',
    'read:equipment:any',
    'read:photo:any',
    'create:mark:own',
    'update:mark:any',
    'delete:mark:any',
    'read:report:any',
    'update:report:any',
    'create:comment:own',
    'update:comment:own',
    'delete:comment:own',
    'read:rule:any',
    'update:rule:any',
  ],
  admin: [
    'read:workshop:any',
    'update:workshop:any',
    'read:member:any',
    'manage:member:any',
    'manage:invitation:any',
    'create:heat:own',
    'read:heat:any',
    'update:heat:any',
    'delete:heat:any',
    'read:equipment:any',
    'create:equipment:any',
    'update:equipment:any',
    'delete:equipment:any',
    'create:photo:own',
    'read:photo:any',
    'delete:photo:any',
    'create:mark:own',
    'update:mark:any',
    'delete:mark:any',
    'create:report:own',
    'read:report:any',
    'update:report:any',
    'create:comment:own',
    'update:comment:own',
    'delete:comment:any',
    'read:rule:any',
    'update:rule:any',
  ],
} as const satisfies Record<Role, readonly Permission[]>;

/**
 * Whether `actor` may perform `action` on `entity`.
 * "any" grants always apply. "own" grants apply to `create` (you create your
 * own) and to every other action only when `resource.ownerId` is the actor,
 * so a check that forgets the resource fails closed.
 */
export function can(
  actor: Actor,
  action: Action,
  entity: Entity,
  resource?: { ownerId: string },
): boolean {
  const granted: readonly Permission[] = GRANTS[actor.role];
  if (granted.includes(`${action}:${entity}:any`)) return true;
  const ownsIt = action === 'create' || resource?.ownerId === actor.id;
  return ownsIt && granted.includes(`${action}:${entity}:own`);
}
