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

/**
 * Closes a salt-screen plan wherever it is read or exported (the app's plan, its pick-list CSV, the
 * command line's `plan`): the corrosives sentence of {@link SCREENING_CAUTIONS} and two lines of the
 * plan's own (common practice in a salt-screening lab).
 */
export const PLATE_PLAN_CAUTIONS = [
  SCREENING_CAUTIONS[3]!,
  'The amounts are computed from the entered masses and the bundled molar masses, densities and solvent data (each with its source): check every reagent’s assay, concentration and label before dispensing.',
  'ICH Q3C classes and limits are shown for orientation; the guideline in force decides which solvent residues are acceptable.',
];
