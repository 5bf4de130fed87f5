/**
 * The cautions a ranking is read with, wherever a user reads or exports one: the app's dialog and
 * notes, the sheet's CSV, the command line. One copy, here in the core, so the words cannot drift.
 * The sentences are the project's own (common practice in salt screening: estimates screen,
 * experiments and the regulatory guidance in force decide).
 */
export const SCREENING_CAUTIONS = [
  'Estimates here screen candidates; they do not establish a salt form.',
  'Crystallinity, polymorphs, hydrates, chemical stability, hygroscopicity and toxicology need experiments.',
  'Counter-ion acceptability follows the regulatory guidance in force for the product.',
  'Strong acids and bases used in salt formation are corrosive: handle them under your lab’s safety rules and the substance’s safety data sheet.',
];

/** The one-line reminder printed beside a ranking or an export. */
export const SCREENING_CAUTION_SUMMARY =
  'Screening estimates only: they do not establish a salt form. Experiments, the regulatory guidance in force and your lab’s safety rules decide.';

/** Closes a single estimate (one lattice or salt answer) where a ranking's full list would be too much. */
export const SINGLE_ESTIMATE_CAUTION =
  'Screening estimate: it does not establish a salt form. Experiments, the regulatory guidance in force and the lab’s safety rules decide.';

/** The plan's own two lines (common practice in a salt-screening lab). */
const PLATE_PLAN_OWN_LINES = [
  'The amounts are computed from the entered masses and the bundled molar masses, densities and solvent data (each with its source): check every reagent’s assay, concentration and label before dispensing.',
  'ICH Q3C classes and limits are shown for orientation; the guideline in force decides which solvent residues are acceptable.',
];

/**
 * Beside a salt-screen plan on screen (the app's Salt screen area, where the footer already carries
 * the one-line summary): the corrosives sentence of {@link SCREENING_CAUTIONS} and the plan's own
 * two lines.
 */
export const PLATE_PLAN_CAUTIONS = [SCREENING_CAUTIONS[3]!, ...PLATE_PLAN_OWN_LINES];

/**
 * Closes a salt-screen plan wherever it leaves the screen (the app's pick-list CSV, the command
 * line's `plan` CSV and JSON): the full {@link SCREENING_CAUTIONS}, each once, then the plan's own
 * two lines — an export is read without the screen's summary beside it.
 */
export const PLATE_PLAN_EXPORT_CAUTIONS = [...SCREENING_CAUTIONS, ...PLATE_PLAN_OWN_LINES];
