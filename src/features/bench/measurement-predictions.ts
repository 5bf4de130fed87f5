import { hygroscopicityClass, type ScreenRow } from '@/chem';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import { uncertaintiesOf } from '@/screening-data/uncertainty';
import type { MeasurementRecord } from '@/persistence/records';
import { CELSIUS_ZERO_K } from './bench-form-model';

/** A prediction set beside a measurement, in words, with its basis. */
export interface Prediction {
  text: string;
  /**
   * 'estimate' for a model value; 'from-measured' when the value rests on measured data (e.g. a K_sp
   * taken from a measured solubility, so it cannot serve as an independent check); 'classification'
   * when the measurement is classed against a standard.
   */
  kind: 'estimate' | 'from-measured' | 'classification' | 'none';
  basis: string;
}

const fmt = (x: number) => (x >= 100 ? x.toFixed(0) : x >= 1 ? x.toPrecision(3) : x.toPrecision(2));
const NONE = (text: string): Prediction => ({ text, kind: 'none', basis: '' });

/**
 * What the workbench predicts for a measurement of a candidate: the salt's solubility at the
 * measured pH (as salt, from the screen's profile and K_sp, with its ±1σ range), its ΔH_sol from the
 * thermochemical cycle, the Ph. Eur. 5.11 class of a mass gain; beside a melting point or a DSC
 * enthalpy of fusion, the salt's water solubility that those data now sharpen. No model predicts
 * the melting point or crystallinity themselves, and the text says so.
 */
export function predictionFor(
  m: MeasurementRecord,
  data: ProjectScreening | undefined,
): Prediction {
  if (!data) return NONE('screen not available');
  const row = data.screen.rows.find((r) => r.id === m.candidateId);
  if (!row || row.error) return NONE(row?.error ? `not screened: ${row.error}` : 'not screened');
  switch (m.kind) {
    case 'solubility':
      return solubilityPrediction(m, row, data);
    case 'solution-enthalpy':
      return solutionEnthalpyPrediction(m, data);
    case 'mass-gain-80rh':
      return massGainClass(m, data);
    case 'melting-point':
    case 'fusion-enthalpy':
      return saltWaterSolubility(row);
    default:
      return NONE('—');
  }
}

/** The salt's solubility at the measured pH, as salt, with its ±1σ range and which solid limits. */
function solubilityPrediction(
  m: MeasurementRecord,
  row: ScreenRow,
  data: ProjectScreening,
): Prediction {
  const ph = m.ph;
  if (ph === null) return NONE('record the equilibrium pH to compare with the pH profile');
  const nearest = row.profile.reduce(
    (a, b) => (Math.abs(b.pH - ph) < Math.abs(a.pH - ph) ? b : a),
    row.profile[0]!,
  );
  if (!nearest || Math.abs(nearest.pH - ph) > 0.06)
    return NONE(`pH ${ph} is outside the computed range`);
  // The profile is in free-form equivalents; the bench records mass of salt per mL.
  const toSalt =
    row.saltMolarMassGPerMol / (row.drugPerSalt * data.drugIon.freeFormMolarMassGPerMol);
  const s = nearest.solubilityMgPerMl * toSalt;
  const u = uncertaintiesOf(row, data.screen.robustnessShared);
  const sigma = nearest.solid === 'salt' ? u.saltLogSigma : u.freeLogSigma;
  const tNote =
    m.temperatureK !== null && Math.abs(m.temperatureK - data.settings.temperatureK) > 2
      ? `; predicted at ${(data.settings.temperatureK - CELSIUS_ZERO_K).toFixed(0)} °C`
      : '';
  const fromMeasured = nearest.solid === 'salt' && row.kspOrigin === 'measured';
  return {
    text: `≈ ${fmt(s)} mg/mL as salt at pH ${nearest.pH.toFixed(1)} (±1σ ${fmt(s / 10 ** sigma)}–${fmt(s * 10 ** sigma)}), ${nearest.solid === 'salt' ? 'salt' : 'free form'} limits${tNote}${
      fromMeasured
        ? '; K_sp taken from a measured solubility of this salt, so not an independent check'
        : ''
    }`,
    kind: fromMeasured ? 'from-measured' : 'estimate',
    basis: fromMeasured
      ? 'K_sp from a measured solubility of this salt'
      : nearest.solid === 'salt'
        ? 'estimated K_sp'
        : 'free-form solubility from S₀',
  };
}

/** ΔH_sol from the thermochemical cycle, with the core's ±1σ. */
function solutionEnthalpyPrediction(m: MeasurementRecord, data: ProjectScreening): Prediction {
  const t = data.energetics[m.candidateId]?.thermo;
  if (!t)
    return NONE(`no cycle estimate (${data.energetics[m.candidateId]?.reason ?? 'not estimated'})`);
  return {
    text: `ΔH_sol ≈ ${t.solutionEnthalpyKJ.value.toFixed(0).replace('-', '−')} ± ${t.solutionEnthalpyKJ.uncertainty.toFixed(0)} kJ/mol (infinite dilution, 25 °C)`,
    kind: 'estimate',
    basis: `Hess cycle, ${t.methodChosen} lattice`,
  };
}

/** The Ph. Eur. 5.11 class of a mass gain at 80 % RH, with the library's note on the counter-ion. */
function massGainClass(m: MeasurementRecord, data: ProjectScreening): Prediction {
  if (m.value === null) return NONE('—');
  const liquefied = /deliquesc|liquef/i.test(m.text);
  const cls = hygroscopicityClass(m.value, liquefied);
  const note = data.counterIons[m.candidateId]?.tradeNote;
  return {
    text: `Ph. Eur. 5.11 class: ${cls}${note ? `. Library note: ${note}` : ''}`,
    kind: 'classification',
    basis: 'European Pharmacopoeia 5.11',
  };
}

/** Beside melting data: the salt's water solubility and whether it uses those data. */
function saltWaterSolubility(row: ScreenRow): Prediction {
  const sw = row.saltWaterSolubility;
  if (!sw) return NONE('no salt-solubility estimate for this salt');
  const sig = sw.log10DrugM.uncertainty;
  const s = sw.mgPerMlAsSalt;
  const used =
    sw.origin === 'model+fusion'
      ? 'uses your fusion data (Schröder–van Laar crystal term)'
      : sw.origin === 'measured'
        ? 'rests on your measured solubility'
        : 'does not use melting data';
  return {
    text: `salt in water ≈ ${fmt(s)} mg/mL as salt (±1σ ${fmt(s / 10 ** sig)}–${fmt(s * 10 ** sig)}); the estimate ${used}. No model predicts the melting point itself`,
    kind: sw.origin === 'measured' ? 'from-measured' : 'estimate',
    basis:
      sw.origin === 'model+fusion'
        ? 'salt-solubility model + fusion data'
        : sw.origin === 'measured'
          ? 'measured solubility'
          : 'salt-solubility model',
  };
}
