/**
 * The command line's CSV cells use the core's guard (src/chem/report/csv-cell-guard.ts: OWASP "CSV
 * Injection" triggers, the Unicode look-alikes and leading invisible characters), the same one the
 * sheet's download uses.
 */
export { isFormulaLike, safeCsvCell } from '@/chem';
