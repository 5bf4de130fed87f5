import { getDb } from './db';

/** App-wide settings (key → value), such as the last opened project. */
export const settingsRepo = {
  get: async <T>(key: string): Promise<T | undefined> =>
    (await getDb().settings.get(key))?.value as T | undefined,
  set: async (key: string, value: unknown): Promise<void> => {
    await getDb().settings.put({ key, value });
  },
};
