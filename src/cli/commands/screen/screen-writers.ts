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

/**
 * Why the CLI can list more rows than the app for the same ions: the app screens the one salt form
 * chosen on each shortlisted ion; the CLI screens every form the counter-ion library lists.
 */
export const FORMS_NOTE =
  'Candidate forms: every salt form the counter-ion library lists for each ion (e.g. hydrogen maleate (1:1) and maleate (2:1)), so a form the app would not screen can rank here; the app screens the one form chosen on each shortlisted ion. Salt names are the same in both (e.g. hydrochloride, hemisulfate, mesylate).';

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
  return `${csv}\n# ${SCREENING_CAUTIONS.join(' ')}\n# ${KSP_NOTE}\n# ${FORMS_NOTE}${note ? `\n# ${note}` : ''}${notes.join('')}`;
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
      candidateForms: FORMS_NOTE,
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
