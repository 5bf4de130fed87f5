import {
  hygroscopicityClass,
  latticeFromSolutionEnthalpy,
  vantHoffFit,
  type Estimate,
  type VanTHoffFit,
} from '@/chem';
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
  if (!data) return { text: 'screen not available', kind: 'none', basis: '' };
  const row = data.screen.rows.find((r) => r.id === m.candidateId);
  if (!row || row.error)
    return {
      text: row?.error ? `not screened: ${row.error}` : 'not screened',
      kind: 'none',
      basis: '',
    };
  switch (m.kind) {
    case 'solubility': {
      if (m.ph === null)
        return {
          text: 'record the equilibrium pH to compare with the pH profile',
          kind: 'none',
          basis: '',
        };
      const nearest = row.profile.reduce(
        (a, b) => (Math.abs(b.pH - m.ph!) < Math.abs(a.pH - m.ph!) ? b : a),
        row.profile[0]!,
      );
      if (!nearest || Math.abs(nearest.pH - m.ph) > 0.06)
        return { text: `pH ${m.ph} is outside the computed range`, kind: 'none', basis: '' };
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
    case 'solution-enthalpy': {
      const t = data.energetics[m.candidateId]?.thermo;
      if (!t)
        return {
          text: `no cycle estimate (${data.energetics[m.candidateId]?.reason ?? 'not estimated'})`,
          kind: 'none',
          basis: '',
        };
      return {
        text: `ΔH_sol ≈ ${t.solutionEnthalpyKJ.value.toFixed(0).replace('-', '−')} ± ${t.solutionEnthalpyKJ.uncertainty.toFixed(0)} kJ/mol (infinite dilution, 25 °C)`,
        kind: 'estimate',
        basis: `Hess cycle, ${t.methodChosen} lattice`,
      };
    }
    case 'mass-gain-80rh': {
      if (m.value === null) return { text: '—', kind: 'none', basis: '' };
      const liquefied = /deliquesc|liquef/i.test(m.text);
      const cls = hygroscopicityClass(m.value, liquefied);
      const note = data.counterIons[m.candidateId]?.tradeNote;
      return {
        text: `Ph. Eur. 5.11 class: ${cls}${note ? `. Library note: ${note}` : ''}`,
        kind: 'classification',
        basis: 'European Pharmacopoeia 5.11',
      };
    }
    case 'melting-point':
    case 'fusion-enthalpy': {
      const sw = row.saltWaterSolubility;
      if (!sw)
        return { text: 'no salt-solubility estimate for this salt', kind: 'none', basis: '' };
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
    default:
      return { text: '—', kind: 'none', basis: '' };
  }
}

/** The lattice enthalpy backed out of the latest calorimetric ΔH_sol of a candidate (THERMO's cycle solver). */
export function backedOutLattice(
  candidateId: string,
  measurements: readonly MeasurementRecord[],
  data: ProjectScreening | undefined,
): { measuredKJ: number; lattice: Estimate; estimate: Estimate } | { error: string } | null {
  const last = [...measurements]
    .reverse()
    .find(
      (m) => m.candidateId === candidateId && m.kind === 'solution-enthalpy' && m.value !== null,
    );
  if (!last) return null;
  const e = data?.energetics[candidateId];
  if (!e?.thermo)
    return { error: `no hydration estimates for this salt (${e?.reason ?? 'not screened'})` };
  try {
    const lattice = latticeFromSolutionEnthalpy({
      solutionEnthalpyKJ: last.value!,
      // No σ is typed in here: the record states none, so the core's ±1σ is the hydration terms' alone (and says so).
      cationHydration: e.thermo.cationHydrationKJ,
      anionHydration: e.thermo.anionHydrationKJ,
      cationsPerFormula: e.cationsPerFormula,
      anionsPerFormula: e.anionsPerFormula,
    });
    return { measuredKJ: last.value!, lattice, estimate: e.thermo.latticeEnthalpyKJ };
  } catch (err) {
    return { error: err instanceof Error ? err.message : String(err) };
  }
}

/** The van 't Hoff fit of a candidate's measured solubilities (same medium), or why there is none. */
export function vantHoffOf(
  candidateId: string,
  measurements: readonly MeasurementRecord[],
): {
  points: { temperatureK: number; solubility: number }[];
  fit: VanTHoffFit | null;
  reason: string | null;
  medium: string;
} | null {
  const sol = measurements.filter(
    (m) =>
      m.candidateId === candidateId &&
      m.kind === 'solubility' &&
      m.value !== null &&
      m.value > 0 &&
      m.temperatureK !== null,
  );
  if (sol.length === 0) return null;
  // Use the medium with the most temperatures.
  const byMedium = new Map<string, MeasurementRecord[]>();
  for (const m of sol) byMedium.set(m.medium, [...(byMedium.get(m.medium) ?? []), m]);
  const [medium, list] = [...byMedium].sort((a, b) => b[1].length - a[1].length)[0]!;
  const points = list.map((m) => ({ temperatureK: m.temperatureK!, solubility: m.value! }));
  try {
    return { points, fit: vantHoffFit(points), reason: null, medium };
  } catch (err) {
    return {
      points,
      fit: null,
      reason: err instanceof Error ? err.message.replace(/^[^:]*: /, '') : String(err),
      medium,
    };
  }
}

/** How the screen read one measured solubility, ready to show beside the record. */
export interface BenchReadingView {
  limitedBy: 'salt' | 'free-form' | 'unknown';
  /** "limits: salt", "limits: free form" or "limits: undecided". */
  label: string;
  /** Why, in a sentence. */
  why: string;
  /** S₀ the value implies if the free form limited it, mg/mL (null without a pH). */
  impliedS0MgPerMl: number | null;
  usedForKsp: boolean;
  /** The conflict note when the value behind K_sp sits above the pH_max it gives. */
  conflict: string | null;
  /** Temperature handling of the value behind K_sp, in words (null when none was needed). */
  temperature: string | null;
}

const LIMIT_LABEL = {
  salt: 'limits: salt',
  'free-form': 'limits: free form',
  unknown: 'limits: undecided',
} as const;

const DECIDED_WORDS = {
  user: 'you stated the solid left',
  'ph-max': 'the equilibrium pH against pH_max from the rest of the evidence',
  'free-form-saturation': 'the value against what the free form dissolves at that pH',
  'no-ph': 'no equilibrium pH recorded',
  'within-margin': 'pH and value both within 1σ of the free-form limit',
} as const;

/**
 * The screen's reading of a solubility record (ScreenRow.benchSolubility), found by the record's
 * position among its candidate's solubility records — the order the screen received them in.
 */
export function benchReadingOf(
  m: MeasurementRecord,
  measurements: readonly MeasurementRecord[],
  data: ProjectScreening | undefined,
): BenchReadingView | null {
  if (m.kind !== 'solubility' || !data) return null;
  const row = data.screen.rows.find((r) => r.id === m.candidateId);
  const use = row?.benchSolubility;
  if (!use) return null;
  const index = measurements
    .filter((x) => x.candidateId === m.candidateId && x.kind === 'solubility')
    .findIndex((x) => x.id === m.id);
  const r = use.readings.find((x) => x.index === index);
  if (!r) return null;
  const pm = r.restPhMax;
  const pmText = pm
    ? `; pH_max ≈ ${pm.value.toFixed(1)} ± ${pm.sigma.toFixed(1)} without this value`
    : '';
  const t = use.temperatureAdjusted;
  return {
    limitedBy: r.limitedBy,
    label: LIMIT_LABEL[r.limitedBy],
    why: `${DECIDED_WORDS[r.decidedBy]}${pmText}${
      r.usedForKsp ? '; K_sp rests on it' : r.limitedBy === 'free-form' ? '; not used for K_sp' : ''
    }`,
    impliedS0MgPerMl: r.impliedS0?.mgPerMl ?? null,
    usedForKsp: r.usedForKsp,
    conflict: r.usedForKsp ? use.conflict : null,
    temperature: !r.usedForKsp
      ? null
      : t
        ? `carried from ${t.fromC.toFixed(0)} to ${t.toC.toFixed(0)} °C by van ’t Hoff (ΔH ${t.solutionEnthalpyKJ.toFixed(1)} kJ/mol)`
        : (use.widenedBecause.find((w) => /°C/.test(w)) ?? null),
  };
}
