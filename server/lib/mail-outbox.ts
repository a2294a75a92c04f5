import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';

/**
 * A message as the local mail fake stores it: one JSON file per message in
 * its folder. The development outbox page and the tests read the same files.
 */
export type StoredMail = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
};

/** Every stored message, oldest first. */
export function readStoredMail(directory: string): StoredMail[] {
  let names: string[];
  try {
    names = readdirSync(directory).filter((n) => n.endsWith('.json')).sort();
  } catch {
    return [];
  }
  return names.map((n) => JSON.parse(readFileSync(path.join(directory, n), 'utf8')) as StoredMail);
}
