import type { AlloyEntry, WorkshopAlloyCreateInput, WorkshopAlloyUpdateInput } from '../../../shared/alloys/alloy-schemas.ts';
import { composeWorkshopAlloy, updateWorkshopAlloy as applyUpdate } from '../../../shared/alloys/workshop-alloy.ts';
import { can } from '../../../shared/auth/permissions.ts';
import type { Actor } from '../../../shared/auth/roles.ts';
import { ALLOYS, designationKey, findAlloy } from '../../../shared/domain/index.ts';
import { AppError, forbidden, notFound } from '../../lib/app-error.ts';
import * as repo from './alloys-repository.ts';
import type { WorkshopAlloyRecord } from './alloys-repository.ts';

// Every member reads the alloy library; only admins add, edit and remove the
// workshop's own alloys, because every member's heats and calculators lean
// on those values.

const LIBRARY_ENTRIES: readonly AlloyEntry[] = ALLOYS.map((alloy) => ({
  origin: 'library',
  id: null,
  alloy,
  createdBy: null,
  createdByName: null,
  createdAt: null,
  updatedAt: null,
}));

function mayRead(actor: Actor) {
  if (!can(actor, 'read', 'alloy')) throw forbidden();
}
function mayChange(actor: Actor, action: 'create' | 'update' | 'delete') {
  if (!can(actor, action, 'alloy')) throw forbidden('Only admins keep the workshop’s own alloys');
}

const toEntry = (r: WorkshopAlloyRecord): AlloyEntry => ({
  origin: 'workshop',
  id: r.id,
  alloy: r.alloy,
  createdBy: r.createdBy,
  createdByName: r.createdByName,
  createdAt: r.createdAt,
  updatedAt: r.updatedAt,
});

const designationTaken = (designation: string) =>
  new AppError('alloy-designation-taken', `This workshop already has an alloy called "${designation}"`, 409);

/**
 * A workshop alloy must not pass for a library one: "A356" would make every
 * heat and calculator read the workshop's guesses as the handbook's values.
 */
function checkDesignation(designation: string, others: readonly WorkshopAlloyRecord[], exceptId?: string) {
  const library = findAlloy(designation);
  if (library) {
    throw new AppError(
      'alloy-in-library',
      `"${designation}" is already in the alloy library as ${library.designation}; give your alloy a name of its own (e.g. "wheel scrap") and base it on ${library.designation}`,
      409,
    );
  }
  const key = designationKey(designation);
  if (others.some((a) => a.designationKey === key && a.id !== exceptId)) throw designationTaken(designation);
}

async function saving<T>(designation: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    // Two admins adding the same name at once: the unique index decides.
    if ((error as { name?: string }).name === 'SequelizeUniqueConstraintError') throw designationTaken(designation);
    throw error;
  }
}

/** The library's alloys, then the workshop's own, each flagged with its origin. */
export async function listAlloys(actor: Actor, workshopId: string): Promise<AlloyEntry[]> {
  mayRead(actor);
  const own = await repo.listWorkshopAlloys(workshopId);
  return [...LIBRARY_ENTRIES, ...own.map(toEntry)];
}

async function workshopAlloyOrNotFound(workshopId: string, alloyId: string): Promise<WorkshopAlloyRecord> {
  const record = await repo.findWorkshopAlloy(workshopId, alloyId);
  if (!record) throw notFound('Alloy', 'alloy-not-found');
  return record;
}

export async function createAlloy(actor: Actor, workshopId: string, input: WorkshopAlloyCreateInput): Promise<AlloyEntry> {
  mayChange(actor, 'create');
  checkDesignation(input.designation, await repo.listWorkshopAlloys(workshopId));
  const alloy = composeWorkshopAlloy(input);
  const id = await saving(alloy.designation, () =>
    repo.createWorkshopAlloy({ workshopId, alloy, designationKey: designationKey(alloy.designation), createdBy: actor.id }),
  );
  return toEntry(await workshopAlloyOrNotFound(workshopId, id));
}

export async function updateAlloy(
  actor: Actor,
  workshopId: string,
  alloyId: string,
  input: WorkshopAlloyUpdateInput,
): Promise<AlloyEntry> {
  mayRead(actor);
  const current = await workshopAlloyOrNotFound(workshopId, alloyId);
  mayChange(actor, 'update');
  if (input.designation !== undefined) checkDesignation(input.designation, await repo.listWorkshopAlloys(workshopId), alloyId);
  const alloy = applyUpdate(current.alloy, input);
  await saving(alloy.designation, () =>
    repo.updateWorkshopAlloy(workshopId, alloyId, { alloy, designationKey: designationKey(alloy.designation) }),
  );
  return toEntry(await workshopAlloyOrNotFound(workshopId, alloyId));
}

export async function deleteAlloy(actor: Actor, workshopId: string, alloyId: string): Promise<void> {
  mayRead(actor);
  await workshopAlloyOrNotFound(workshopId, alloyId);
  mayChange(actor, 'delete');
  await repo.deleteWorkshopAlloy(workshopId, alloyId);
}
