import { SCREENING_CAUTION_SUMMARY, SCREENING_CAUTIONS, SINGLE_ESTIMATE_CAUTION } from '@/chem';

/**
 * The cautions the command line prints: the core's own sentences (src/chem/report/cautions.ts), the
 * same the app and the sheet show.
 */
export { SCREENING_CAUTIONS };

/** Closes every lattice/eval answer. */
export const LATTICE_CAUTION = SINGLE_ESTIMATE_CAUTION;

/** Closes the help text. */
export const HELP_CAUTION = SCREENING_CAUTION_SUMMARY;
