/**
 * The CSV cell guard lives in the core (src/chem/report/csv-cell-guard.ts), shared with the command
 * line. This path stays only for code and tests that still import it from here.
 * @deprecated import `neutralizeCsvText`, `isFormulaLike`, `CSV_FORMULA_TRIGGERS` from '@/chem'.
 */
export { CSV_FORMULA_TRIGGERS as FORMULA_TRIGGERS, isFormulaLike, neutralizeCsvText } from '@/chem';
