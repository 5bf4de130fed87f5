import { latticeFromSolutionEnthalpy, vantHoffFit, type Estimate, type VanTHoffFit } from '@/chem';
import type { ProjectScreening } from '@/screening-data/compute-screening';
import type { MeasurementRecord } from '@/persistence/records';

export { predictionFor, type Prediction } from './measurement-predictions';

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
