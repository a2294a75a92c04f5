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
  | 'rule'
  | 'alloy';
/** own: the actor's own; mentee: owned by a student the actor mentors; any: anyone's in the workshop. */
export type Access = 'own' | 'mentee' | 'any';
export type Permission = `${Action}:${Entity}:${Access}`;

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
    // Everyone may read the rules that rank their causes (evidence before verdict).
    'read:rule:any',
    'read:alloy:any',
  ],
  caster: [
    'read:workshop:any',
    'read:member:any',
    'create:heat:own',
    'read:heat:own',
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
    // Everyone may read the rules that rank their causes (evidence before verdict).
    'read:rule:any',
    'read:alloy:any',
  ],
  mentor: [
    'read:workshop:any',
    'read:member:any',
    'create:heat:own',
    'read:heat:own',
    'update:heat:own',
    'delete:heat:own',
    'read:heat:mentee',
    'read:equipment:any',
    'read:photo:any',
    'create:mark:own',
    'update:mark:any',
    'delete:mark:any',
    'read:report:own',
    'read:report:mentee',
    'update:report:mentee',
    'create:comment:own',
    'update:comment:own',
    'delete:comment:own',
    'read:rule:any',
    'update:rule:any',
    // Reviewers tune the workshop's rule set: they add rules and remove the ones added.
    'create:rule:any',
    'delete:rule:any',
    'read:alloy:any',
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
    'create:rule:any',
    'delete:rule:any',
    'read:alloy:any',
    'create:alloy:any',
    'update:alloy:any',
    'delete:alloy:any',
  ],
} as const satisfies Record<Role, readonly Permission[]>;

/** What a check needs to know about the resource: whose it is and who mentors them. */
export type ResourceOwner = { ownerId: string; ownerMentorIds?: readonly string[] };

/**
 * Whether `actor` may perform `action` on `entity`.
 * "any" grants always apply. "own" grants apply to `create` (you create your
 * own) and to every other action only when `resource.ownerId` is the actor;
 * "mentee" grants only when the actor is among the owner's mentors. A check
 * that forgets the resource therefore fails closed.
 */
export function can(actor: Actor, action: Action, entity: Entity, resource?: ResourceOwner): boolean {
  const granted: readonly Permission[] = GRANTS[actor.role];
  if (granted.includes(`${action}:${entity}:any`)) return true;
  const ownsIt = action === 'create' || resource?.ownerId === actor.id;
  if (ownsIt && granted.includes(`${action}:${entity}:own`)) return true;
  const mentorsOwner = resource?.ownerMentorIds?.includes(actor.id) ?? false;
  return mentorsOwner && granted.includes(`${action}:${entity}:mentee`);
}

/** The widest access a role has for an action on an entity, for building list filters. */
export function accessFor(actor: Actor, action: Action, entity: Entity): Access[] {
  const granted: readonly Permission[] = GRANTS[actor.role];
  return (['any', 'own', 'mentee'] as const).filter((a) => granted.includes(`${action}:${entity}:${a}`));
}
