import { deleteObjects, listObjects, objectExists } from '../../lib/object-store.ts';
import * as repo from './photos-repository.ts';
import { drainObjectDeletions } from './photos-service.ts';

export type SweepReport = {
  objectsSeen: number;
  orphansFound: string[];
  orphansDeleted: number;
  /** Rows whose objects are gone from the store: reported, never deleted by the sweep. */
  rowsMissingObjects: { photoId: string; key: string }[];
};

/**
 * Finds objects no photo row references and deletes them, and reports rows
 * whose objects are missing. Objects younger than `graceMs` are left alone:
 * they may belong to an upload whose row is being written right now.
 */
export async function sweepStorage(opts: { dryRun?: boolean; graceMs?: number } = {}): Promise<SweepReport> {
  const graceMs = opts.graceMs ?? 60 * 60 * 1000;
  if (!opts.dryRun) await drainObjectDeletions();
  const referenced = await repo.allObjectKeys();
  const known = new Set(referenced.map((r) => r.key));
  const seen = new Set<string>();
  const orphans: string[] = [];
  const cutoff = Date.now() - graceMs;
  for await (const o of listObjects('workshops/')) {
    seen.add(o.key);
    if (!known.has(o.key) && o.lastModified.getTime() <= cutoff) orphans.push(o.key);
  }
  const rowsMissingObjects: SweepReport['rowsMissingObjects'] = [];
  for (const r of referenced) {
    // Listing can lag on some stores; confirm each absence with a HEAD.
    if (!seen.has(r.key) && !(await objectExists(r.key))) rowsMissingObjects.push(r);
  }
  const failed = opts.dryRun ? orphans : await deleteObjects(orphans);
  return {
    objectsSeen: seen.size,
    orphansFound: orphans,
    orphansDeleted: orphans.length - failed.length,
    rowsMissingObjects,
  };
}
