/**
 * The name an imported project takes: the file's own name when no other project has it, else
 * "<name> (imported)", then "<name> (imported 2)", "(imported 3)"… — so an import never makes a
 * second card or list entry indistinguishable from the first.
 */
export function importedProjectName(name: string, takenNames: Iterable<string>): string {
  const taken = new Set(takenNames);
  if (!taken.has(name)) return name;
  const base = `${name} (imported`;
  if (!taken.has(`${base})`)) return `${base})`;
  for (let n = 2; ; n++) if (!taken.has(`${base} ${n})`)) return `${base} ${n})`;
}
