import type { Workshop } from '#shared/workshops/workshop-schemas.ts';
import { readLocal, writeLocal } from '#src/lib/local-store.ts';

const KEY = 'pourscope:workshop';

/** The workshop this browser used last, so a return visit opens it again. */
export function rememberWorkshop(workshopId: string) {
  writeLocal(KEY, workshopId);
}

export function rememberedWorkshopId(): string | null {
  return readLocal(KEY);
}

/**
 * The workshop to show when the URL names none: the remembered one if it is
 * still in the list (another person may use this browser), else the first.
 */
export function pickWorkshop(workshops: readonly Workshop[], preferredId?: string | null): Workshop | null {
  const wanted = preferredId ?? rememberedWorkshopId();
  return workshops.find((w) => w.id === wanted) ?? workshops[0] ?? null;
}
