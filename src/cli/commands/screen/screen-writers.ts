import Papa from 'papaparse';
import { safeCsvCell, separationSummary, type ScreenResult } from '@/chem';
import { SCREENING_CAUTIONS } from '../../output/cautions';
import type { ScreenTableRow } from './screen-table';
import type { MeasureNextEntry } from './screen-measure-next';

/** The two output formats of one screen: CSV with the cautions as # lines, or one JSON document. */

type Skipped = readonly { id: string; label: string; deltaPka: number }[];

/** Text cells neutralised against spreadsheet formula injection. */
export const safeRow = (row: Record<string, unknown>) =>
  Object.fromEntries(Object.entries(row).map(([k, v]) => [k, safeCsvCell(v)]));

export const KSP_NOTE =
  'K_sp without a measured salt solubility is an estimate; see ksp_origin and log10_ksp_sd.';

export const skippedNote = (skipped: Skipped) =>
  skipped.length
    ? `Left out (ΔpKa in the cocrystal band, Cruz-Cabeza 2012; --keep-cocrystal-band keeps them): ${skipped.map((x) => `${x.label} ΔpKa ${x.deltaPka.toFixed(1)}`).join('; ')}`
    : '';

/**
 * The notes a screen's CSV closes with, from the screen itself: what separates the candidates (the
 * core's separationSummary, the same line the app and the sheet show) and the assumptions, which
 * name the salt-solubility basis each row actually used.
 */
export function screenNotes(res: ScreenResult): string[] {
  const sep = separationSummary(res, res.settings.weights);
  return [
    ...(sep ? [`What separates the candidates: ${sep.headline}`, ...sep.details] : []),
    ...res.assumptions.map((a) => `Assumption: ${a}`),
  ];
}

export function screenCsv(
  table: readonly ScreenTableRow[],
  skipped: Skipped,
  res?: ScreenResult,
): string {
  const csv = Papa.unparse(table.map(safeRow), { newline: '\n' });
  const note = skippedNote(skipped);
  const notes = res ? screenNotes(res).map((n) => `\n# ${n}`) : [];
  return `${csv}\n# ${SCREENING_CAUTIONS.join(' ')}\n# ${KSP_NOTE}${note ? `\n# ${note}` : ''}${notes.join('')}`;
}

export function screenJson(
  res: ScreenResult,
  table: readonly ScreenTableRow[],
  skipped: Skipped,
  robustness: { iterations: number; seed: number },
  measureNext?: readonly MeasureNextEntry[],
): string {
  return JSON.stringify(
    {
      format: 'saltsmith-screen',
      version: 1,
      compound: res.compoundName,
      drugKind: res.drugKind,
      intrinsicSolubility: {
        log10M: res.freeForm.log10IntrinsicM,
        origin: res.freeForm.intrinsicOrigin,
      },
      freeForm: {
        worst: res.freeForm.worst,
        solubilityClass: res.freeForm.solubilityClass,
        flags: res.freeForm.flags,
      },
      robustness,
      skippedCocrystalBand: skipped,
      units: {
        solubility: 'mg/mL free-form equivalents',
        doseNumber: 'dose / 250 mL / solubility',
        ksp: 'log10, (mol/L)^(m+n)',
        solutionEnthalpy: 'kJ per mol of drug ion',
      },
      separation: separationSummary(res, res.settings.weights),
      assumptions: res.assumptions,
      rows: table,
      ...(measureNext ? { measure_next: measureNext } : {}),
      cautions: SCREENING_CAUTIONS,
    },
    null,
    2,
  );
}
