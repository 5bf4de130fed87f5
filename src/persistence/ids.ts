/** A random id for a stored record (crypto.randomUUID where available). */
export function newId(prefix: string): string {
  const uuid =
    typeof crypto !== 'undefined' && 'randomUUID' in crypto
      ? crypto.randomUUID()
      : `${Date.now().toString(36)}-${Math.random().toString(36).slice(2)}`;
  return `${prefix}_${uuid}`;
}

/** The current time as an ISO 8601 string (the only place persistence reads the clock). */
export const nowIso = (): string => new Date().toISOString();
