import type { StorageProxy } from './storage-proxy.ts';
import { listObjects } from '../../server/lib/object-store.ts';

/** The proxy in front of the storage fake, started by tests/setup/api-setup.ts. */
export function storageProxy(): StorageProxy {
  return (globalThis as { storageProxy?: StorageProxy }).storageProxy!;
}

/** Every object key under a workshop's prefix in the store. */
export async function objectsOf(workshopId: string): Promise<string[]> {
  const keys: string[] = [];
  for await (const o of listObjects(`workshops/${workshopId}/`)) keys.push(o.key);
  return keys.sort();
}
