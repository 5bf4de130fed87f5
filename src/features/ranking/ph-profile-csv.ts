import Papa from 'papaparse';
import { CELSIUS_ZERO_K, neutralizeCsvText, type ScreenRow } from '@/chem';
import { CAUTION_LINES } from '@/components/Cautions';
import type { ProjectScreening } from '@/screening-data/compute-screening';

type CsvValue = string | number | null;

/** 6 significant digits, so float noise never reaches a file (as the sheet's CSV writes numbers). */
const sig6 = (x: number) => (x === 0 ? 0 : Number(x.toPrecision(6)));

/** The pH key a point is joined on (the grid's step is ≥ 0.01). */
const phKey = (pH: number) => pH.toFixed(4);

/**
 * log₁₀ of the drug's molar solubility from mg/mL of free-form equivalents: mg/mL = g/L, divided by the
 * free form's molar mass (g/mol) gives mol/L.
 */
export function log10MolarFromMgPerMl(mgPerMl: number, freeFormMolarMassGPerMol: number): number {
  return Math.log10(mgPerMl / freeFormMolarMassGPerMol);
}

export interface ProfileCsvInput {
  data: ProjectScreening;
  /** The salts on the chart, in the order shown. */
  salts: readonly ScreenRow[];
  labels: Record<string, string>;
  generatedAt: string;
  appVersion: string;
}

/** Header and one line per pH of the grid: the free form, then each salt (mg/mL, log₁₀ mol/L, solid). */
export function profileCsvRows({ data, salts, labels }: ProfileCsvInput): CsvValue[][] {
  const mw = data.drugIon.freeFormMolarMassGPerMol;
  const free = `Free ${data.screen.drugKind}`;
  const head = ['pH', `${free}: solubility (mg/mL)`, `${free}: log10 solubility (mol/L)`];
  for (const s of salts) {
    const name = labels[s.id] ?? s.label;
    head.push(
      `${name}: solubility (mg/mL of free-form equivalents)`,
      `${name}: log10 solubility (mol/L of drug)`,
      `${name}: solid in equilibrium`,
    );
  }
  const byPh = salts.map((s) => new Map(s.profile.map((p) => [phKey(p.pH), p])));
  const rows: CsvValue[][] = [head.map(neutralizeCsvText)];
  for (const p of data.screen.freeForm.profile) {
    const line: CsvValue[] = [
      sig6(p.pH),
      sig6(p.solubilityMgPerMl),
      sig6(log10MolarFromMgPerMl(p.solubilityMgPerMl, mw)),
    ];
    for (const m of byPh) {
      const q = m.get(phKey(p.pH));
      if (!q) line.push(null, null, null);
      else
        line.push(
          sig6(q.solubilityMgPerMl),
          sig6(log10MolarFromMgPerMl(q.solubilityMgPerMl, mw)),
          q.solid,
        );
    }
    rows.push(line);
  }
  return rows;
}

/** What travels with the numbers: where they come from, each pH_max, and the cautions. */
export function profileCsvFooter({
  data,
  salts,
  labels,
  generatedAt,
  appVersion,
}: ProfileCsvInput): string[] {
  const ff = data.screen.freeForm;
  const lines = [
    `pH–solubility profile of ${data.screen.compoundName} at ${(data.settings.temperatureK - CELSIUS_ZERO_K).toFixed(1)} °C, made ${generatedAt} with Saltsmith ${appVersion}. Solubilities in mg/mL are free-form equivalents; log10 values are of the drug's total molar solubility (mol/L), through the free form's molar mass ${sig6(data.drugIon.freeFormMolarMassGPerMol)} g/mol.`,
    `Free form: ${ff.intrinsicOrigin === 'measured' ? 'measured S0' : 'S0 from the General Solubility Equation (estimate)'}, log10 S0 = ${ff.log10IntrinsicM.value.toFixed(2)} ± ${ff.log10IntrinsicM.uncertainty.toFixed(2)} (mol/L, 1 sigma).`,
    ...salts.map(
      (s) =>
        `${labels[s.id] ?? s.label}: pH_max ${s.phMax === null ? 'outside pH 0–14' : s.phMax.toFixed(2)}; K_sp ${s.kspOrigin === 'measured' ? 'from a measured solubility' : `estimated (log10 K_sp ± ${s.log10Ksp?.uncertainty.toFixed(2) ?? '?'} decades, 1 sigma)`}.`,
    ),
    'Salt curves without a measured salt solubility rest on an estimated K_sp: read their positions relative to each other, not as predictions of a measured value. Bile-salt and lecithin solubilisation are not modelled.',
    ...CAUTION_LINES.map((l) => `Caution: ${l}`),
  ];
  return lines.map(neutralizeCsvText);
}

/** The profile as CSV (RFC 4180, CRLF; text quoted and formula-like text neutralised; numbers bare). */
export function profileToCsv(input: ProfileCsvInput): string {
  const data: CsvValue[][] = [
    ...profileCsvRows(input),
    [''],
    ...profileCsvFooter(input).map((l) => [l]),
  ];
  return Papa.unparse(
    data.map((row) => row.map((v) => (v === null ? '' : v))),
    {
      newline: '\r\n',
      quotes: (value: unknown) => typeof value === 'string' && value !== '',
      escapeFormulae: false,
    },
  );
}

/** File name: "<compound>-ph-profile-<date>.csv", with only safe characters. */
export function profileCsvFileName(compoundName: string, isoDateTime: string): string {
  const safe =
    compoundName
      .normalize('NFKD')
      .replace(/[^\w.-]+/g, '-')
      .replace(/^[-.]+|[-.]+$/g, '')
      .slice(0, 60) || 'compound';
  return `${safe}-ph-profile-${isoDateTime.slice(0, 10)}.csv`;
}
