import Dexie from 'dexie';
import { DB_NAME, closeDb } from '@/persistence/db';

/** Start a test from an empty database: close the shared handle and delete the (fake) IndexedDB. */
export async function resetDbForTests(): Promise<void> {
  closeDb();
  await Dexie.delete(DB_NAME);
}
