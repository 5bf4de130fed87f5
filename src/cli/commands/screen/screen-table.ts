import {
  rankCandidates,
  roundLogNormal,
  roundScore,
  shownRowNumbers,
  rankRobustness,
  screenCompound,
  screenCompoundTop,
  worstExcipient,
  type RankedRow,
  type ScreenResult,
  type ScreenRow,
  uncertaintiesOf,
} from '@/chem';
import type { PreparedScreen } from './screen-input';

/** Round to `digits` significant digits for the table; null, undefined and non-finite values become an empty cell. */
const sig = (x: number | null | undefined, digits = 3) =>
  x === null || x === undefined || !Number.isFinite(x) ? '' : Number(x.toPrecision(digits));

const worst = (row: ScreenRow) => worstExcipient(row.excipientRisks);

type DosePoint = ScreenRow['doseNumbers'][number];

/** The dose point at `pH` (a loop, not a closure per row: this runs for every written row). */
function doseAt(row: ScreenRow, pH: number): DosePoint | undefined {
  for (const d of row.doseNumbers) if (Math.abs(d.pH - pH) < 1e-9) return d;
  return undefined;
}

/** The texts joined by '; ', as map(text).join('; ') gives them, without the array in between. */
function textsJoined(items: readonly { text: string }[]): string {
  let s = '';
  for (let i = 0; i < items.length; i++) s += i === 0 ? items[i]!.text : '; ' + items[i]!.text;
  return s;
}

/** The salt solubility's drivers as 'id +0.12; id -0.30' (empty without a salt solubility). */
function driversText(sw: ScreenRow['saltWaterSolubility']): string {
  if (!sw) return '';
  let s = '';
  for (const d of sw.drivers) {
    if (s !== '') s += '; ';
    s += `${d.id} ${d.decades > 0 ? '+' : ''}${d.decades.toFixed(2)}`;
  }
  return s;
}

/** One row of the ranked table (the CSV rows, the JSON rows, the batch rows). */
export type ScreenTableRow = ReturnType<typeof tableRow>;

/** The ranked table, one object per candidate, best first (the `top` best only, when given). */
export function screenTable(
  res: ScreenResult,
  robust: Map<string, number>,
  top?: number,
): ScreenTableRow[] {
  const all = rankCandidates(res.rows, res.settings.weights);
  const ranked = top !== undefined ? all.slice(0, top) : all;
  const byId = new Map(res.rows.map((r) => [r.id, r]));
  return ranked.map((k) => tableRow(k, byId.get(k.id)!, robust, res.robustnessShared));
}

/** One line of the table: a ranked entry and its row. */
function tableRow(
  k: RankedRow,
  row: ScreenRow,
  robust: Map<string, number>,
  shared: ScreenResult['robustnessShared'],
) {
  {
    // Precision that follows each number's 1σ, as the app and the sheet show it (src/chem/report);
    // the 1σ worked out once for both.
    const u = uncertaintiesOf(row, shared);
    const shown = shownRowNumbers(row, shared, u);
    const d12 = doseAt(row, 1.2);
    const w = worst(row);
    // each looked up once (a row writes the pH 1.2 point twice and the excipient four times)
    const roundedDose = (d: DosePoint | undefined) =>
      d && d.doseNumber !== null
        ? roundLogNormal(d.doseNumber, d.solid === 'salt' ? u.saltLogSigma : u.freeLogSigma).value
        : '';
    return {
      rank: k.rank ?? '',
      candidate: row.label,
      counter_ion: row.counterIonId,
      stoichiometry_drug_to_ion: `${row.drugPerSalt}:${row.counterIonPerSalt}`,
      score: k.score === null ? '' : roundScore(k.score),
      p_top3: robust.has(row.id) ? Number(robust.get(row.id)!.toFixed(3)) : '',
      delta_pka: shown.deltaPka?.value ?? '',
      salt_formation: row.saltFormation?.band ?? '',
      active_fraction: sig(row.error ? null : row.activeFraction),
      salt_mass_per_dose_mg: sig(row.saltMassPerDoseMg, 4),
      salt_solubility_water_log10_M: sig(row.saltWaterSolubility?.log10DrugM.value),
      salt_solubility_water_log10_M_sd: sig(row.saltWaterSolubility?.log10DrugM.uncertainty, 2),
      // the model's 1σ split: a level shared by every salt of the drug, and this salt's own part
      salt_solubility_water_log10_M_sd_shared: sig(row.saltWaterSolubility?.sharedLog10Sd, 2),
      salt_solubility_water_log10_M_sd_within: sig(row.saltWaterSolubility?.withinLog10Sd, 2),
      salt_solubility_water_mg_per_ml: shown.saltWaterMgPerMl?.value ?? '',
      salt_solubility_origin: row.saltWaterSolubility?.origin ?? '',
      bench_solubility_limited_by: row.benchSolubility?.limitedBy ?? '',
      salt_solubility_drivers: driversText(row.saltWaterSolubility),
      log10_ksp: sig(row.log10Ksp?.value),
      log10_ksp_sd: sig(row.log10Ksp?.uncertainty, 2),
      ksp_origin: row.kspOrigin ?? '',
      ph_max: shown.phMax?.value ?? '',
      solubility_ph_1_2_mg_per_ml: sig(d12?.solubilityMgPerMl),
      dose_number_ph_1_2: roundedDose(d12),
      dose_number_ph_6_8: roundedDose(doseAt(row, 6.8)),
      gastric_dose_number: shown.gastricDoseNumber?.value ?? '',
      worst_ph: row.worst?.pH ?? '',
      worst_dose_number: shown.worstDoseNumber?.value ?? '',
      ich_m9_class: row.solubilityClass ?? '',
      disproportionation: row.disproportionation?.risk ?? '',
      // ΔH_sol per mole of drug ion, as every area shows it; empty when not informative (the reason says why).
      solution_enthalpy_kj_per_mol_drug_ion: shown.solutionEnthalpyKJPerMolDrugIon?.value ?? '',
      solution_enthalpy_kj_per_mol_drug_ion_sd: shown.solutionEnthalpyKJPerMolDrugIon?.sigma ?? '',
      solution_enthalpy_not_informative: row.solutionEnthalpyPerDrugIon?.notInformative ?? '',
      flags: textsJoined(row.flags),
      reasons: textsJoined(row.reasons),
      error: row.error ?? '',
      // every ±1σ the app shows (pH_max's 1σ; the ±1σ ranges of the salt's
      // solubility and of the dose numbers, from the limiting solid's log σ), before the excipient
      // columns, which stay last
      ph_max_sd: shown.phMax?.sigma ?? '',
      salt_solubility_water_mg_per_ml_low: shown.saltWaterMgPerMl?.low ?? '',
      salt_solubility_water_mg_per_ml_high: shown.saltWaterMgPerMl?.high ?? '',
      worst_dose_number_low: shown.worstDoseNumber?.low ?? '',
      worst_dose_number_high: shown.worstDoseNumber?.high ?? '',
      gastric_dose_number_low: shown.gastricDoseNumber?.low ?? '',
      gastric_dose_number_high: shown.gastricDoseNumber?.high ?? '',
      // added last so every earlier column keeps its place: the chosen excipient most likely to
      // convert the salt (empty without --excipients) and P(conversion), with its band in words
      worst_excipient: w?.excipientId ?? '',
      worst_excipient_p_conversion: w?.probability == null ? '' : Number(w.probability.toFixed(3)),
      worst_excipient_risk: w ? w.band : '',
    };
  }
}

/**
 * Run a prepared screen with the seeded Monte Carlo for P(top 3) (none when `iterations` is 0: the
 * column stays empty); `top` keeps the N best rows. The table draws no chart, so the screen skips the
 * pH–solubility profiles (every number of the table is the same with or without them).
 */
export function runScreen(
  p: PreparedScreen,
  opts: { iterations: number; seed: number; top?: number | undefined },
) {
  const res = screenCompound({
    compound: p.compound,
    drugIon: p.drugIon,
    candidates: p.candidates,
    settings: p.settings,
    profiles: 'none',
  });
  const robust = new Map(
    opts.iterations > 0
      ? rankRobustness(
          res.rows.map((r) => r.robustness),
          p.settings.weights,
          res.robustnessShared,
          { iterations: opts.iterations, seed: opts.seed },
        ).map((r) => [r.id, r.pTop3])
      : [],
  );
  return { res, table: screenTable(res, robust, opts.top) };
}

/**
 * The `top` best lines of the table without building the other rows' words (screenCompoundTop): the
 * same lines runScreen gives with `top` and no Monte Carlo (P(top 3) stays empty).
 */
export function runScreenTop(p: PreparedScreen, top: number): ScreenTableRow[] {
  const res = screenCompoundTop(
    {
      compound: p.compound,
      drugIon: p.drugIon,
      candidates: p.candidates,
      settings: p.settings,
      profiles: 'none',
    },
    { top, solutionEnthalpyLater: p.solutionEnthalpyLater },
  );
  const none = new Map<string, number>();
  return res.ranked.map((k, i) => tableRow(k, res.rows[i]!, none, res.robustnessShared));
}
