import Papa from 'papaparse';
import {
  parentHandling,
  pickListRows,
  PLATE_FILL_ORDER,
  PLATE_PLAN_EXPORT_CAUTIONS,
  safeCsvCell,
  type PlatePlan,
  type PlatePlanInput,
} from '@/chem';
import type { CandidateRecord } from '@/persistence/records';

/** The solvents a new plan starts with (common practice: an alcohol, a ketone, an ester, a second alcohol). */
export const STARTING_SOLVENTS = ['ethanol', 'acetone', '2-propanol', 'ethyl-acetate'];

/** A first plan for a project: its shortlist (at most four counter-ions) on a 24-well plate. */
export function startingPlan(candidates: readonly CandidateRecord[]): PlatePlanInput {
  const counterIons = candidates.slice(0, 4).map((c) => c.ionId);
  const stock: NonNullable<PlatePlanInput['stock']> = {};
  for (const id of counterIons) {
    if (parentHandling(id)?.form === 'stock-only') stock[id] = { solvent: 'water', molar: 1 };
  }
  return {
    counterIons,
    solvents: STARTING_SOLVENTS,
    methods: ['slurry'],
    apiMgPerWell: 10,
    solventUlPerWell: 200,
    plate: 24,
    stock,
  };
}

/** The pick list as CSV (formula-safe text cells), closed by the fill order, the plan's notes and the cautions. */
export function pickListCsv(plan: PlatePlan): string {
  const rows = pickListRows(plan).map((r) =>
    Object.fromEntries(Object.entries(r).map(([k, v]) => [k, safeCsvCell(v)])),
  );
  const csv = Papa.unparse(rows, { newline: '\n' });
  const notes = [PLATE_FILL_ORDER, ...plan.notes, ...PLATE_PLAN_EXPORT_CAUTIONS].map(
    (l) => `# ${safeCsvCell(l)}`,
  );
  return `${csv}\n${notes.join('\n')}\n`;
}

/**
 * Colours of the counter-ions on the plate map: our own eight, told apart by lightness as well as hue
 * so that a grey print keeps them distinct; a ninth ion and beyond repeat with a dashed rim.
 */
export const ION_COLOURS = [
  '#1f5a7a',
  '#e39b4a',
  '#4d8a3a',
  '#b7a6d9',
  '#8c2f45',
  '#86c5c0',
  '#5b4a2e',
  '#e6d36a',
];

export const ionColour = (index: number) => ION_COLOURS[index % ION_COLOURS.length]!;

/** A number for a table cell: 4 significant digits, typographic minus. */
export const figures = (x: number | null) =>
  x === null ? '—' : Number(x.toPrecision(4)).toString().replace(/^-/, '\u2212');
