import type { SaltFormationVerdict } from '../delta-pka';
import type { DisproportionationResult } from '../disproportionation';
import { ICH_M9_VOLUME_ML } from '../dose-number';
import type { InterpretedMeasurements } from '../measurements';
import type { Estimate } from '../../result';
import type {
  DoseNumberAt,
  MediumResult,
  Reason,
  ScreenFlag,
  ScreeningCounterIon,
} from './screen.types';
import { basisWords, type SaltSolubilityBasis } from './salt-water-basis';
import { saltLabel } from '../salt-label';

/**
 * The words of the screen: every reason, flag, note and assumption it writes, built from numbers the
 * other steps computed. Nothing here computes chemistry; the steps call these to say what they found.
 */

/**
 * A number for a sentence (a dose number, a solubility): two significant figures, as the Ranking, the
 * sheet and the CSVs show these numbers whose 1σ is a factor of 1.2 or more (report/precision.ts,
 * roundLogNormal) — "D₀ 2.4", not "D₀ 2.42" beside a cell reading 2.4.
 */
export const fmt = (x: number): string => String(Number(x.toPrecision(2)));

/** A number without a wide 1σ (a computed mass, a typed measurement): whole above 100, else three figures. */
const fmtExact = (x: number): string =>
  x >= 100 ? x.toFixed(0) : x >= 1 ? x.toPrecision(3) : x.toPrecision(2);

/** A label without its trailing ratio, e.g. 'hydrochloride (1:1)' → 'hydrochloride'. */
export const withoutRatio = (label: string): string => label.replace(/\s*\([^)]*\)\s*$/, '');

const ICH_M9_RULE =
  'ICH M9 (2019) §2.1.1: the highest dose must dissolve in ≤ 250 mL over pH 1.2–6.8 (D₀ ≤ 1)';

/** A candidate's row label: the one salt vocabulary of app and CLI (salt-label.ts). */
export function rowLabel(
  ionName: string,
  st: { label?: string; drugPerSalt: number; counterIonPerSalt: number },
): string {
  return saltLabel(ionName, st);
}

/** The salt's trade name without its ratio, e.g. 'hydrochloride', for the reasons in words. */
export function saltName(label: string, ionName: string): string {
  return withoutRatio(label) || ionName.toLowerCase();
}

/** The free form's own flag: its worst dose number over pH 1.2–6.8 (ICH M9). */
export function freeFormPoorlySolubleFlag(
  worst: DoseNumberAt & { doseNumber: number },
): ScreenFlag {
  return {
    id: 'likely-poorly-soluble',
    text: `free form likely poorly soluble: D₀ ${fmt(worst.doseNumber)} at pH ${worst.pH}`,
    rule: ICH_M9_RULE,
  };
}

export function saltFormationWords(
  verdict: SaltFormationVerdict | null,
  deltaPka: number | null,
  stableSaltMin: number,
): { reasons: Reason[]; flags: ScreenFlag[] } {
  const reasons: Reason[] = [];
  const flags: ScreenFlag[] = [];
  if (!verdict) {
    reasons.push({
      kind: 'note',
      criterion: 'saltFormation',
      text: 'ΔpKa rule not applicable (no transferable proton on one side, e.g. a quaternary ion)',
    });
    return { reasons, flags };
  }
  const kind = verdict.band === 'cocrystal' ? 'drops' : verdict.band === 'salt' ? 'keeps' : 'watch';
  reasons.push({ kind, criterion: 'saltFormation', text: verdict.reason });
  if (!verdict.meetsStableSaltRule) {
    reasons.push({
      kind: 'watch',
      criterion: 'saltFormation',
      text: `ΔpKa below the common-practice minimum of ${stableSaltMin} for a stable salt`,
    });
  }
  if (verdict.band === 'cocrystal') {
    flags.push({
      id: 'cocrystal-risk',
      text: `ΔpKa ${deltaPka!.toFixed(1)}: a cocrystal is more likely than a salt`,
      rule: 'Cruz-Cabeza 2012, CrystEngComm 14, 6362: ΔpKa < −1',
    });
  }
  return { reasons, flags };
}

/** Below this active fraction the counter-ion is called heavy (common practice). */
export const HEAVY_COUNTER_ION_ACTIVE_FRACTION = 0.7;

export function massCostReason(
  activeFraction: number,
  saltMassPerDoseMg: number | null,
): Reason | null {
  if (!(activeFraction < HEAVY_COUNTER_ION_ACTIVE_FRACTION)) return null;
  const perDose = saltMassPerDoseMg ? `, ${fmtExact(saltMassPerDoseMg)} mg of salt per dose` : '';
  return {
    kind: 'watch',
    criterion: 'massCost',
    text: `heavy counter-ion: active fraction ${(activeFraction * 100).toFixed(0)} %${perDose}`,
  };
}

export function measuredKspReason(saltSolubilityMgPerMl: number): Reason {
  return {
    kind: 'measured',
    criterion: 'solubility',
    text: `K_sp from the measured salt solubility (${fmtExact(saltSolubilityMgPerMl)} mg/mL as salt) — overrides the estimate`,
  };
}

export function estimatedKspFlag(saltLog10Sigma: number, basis: SaltSolubilityBasis): ScreenFlag {
  return {
    id: 'estimated-ksp',
    text: `K_sp estimated (±${saltLog10Sigma.toFixed(1)} decades in salt solubility), not measured`,
    rule: `K_sp from the salt's estimated solubility in water, fully ionised: ${basisWords(basis)}`,
  };
}

export function measuredEnthalpyReason(origin: string): Reason {
  return {
    kind: 'measured',
    criterion: 'solubility',
    text: `ΔH_sol ${origin} used in place of the thermochemistry estimate`,
  };
}

export function worstSolubilityReason(name: string, worst: DoseNumberAt): Reason {
  if (worst.doseNumber === null) {
    return {
      kind: 'note',
      criterion: 'solubility',
      text: 'no dose given: dose numbers not computed',
    };
  }
  if (worst.doseNumber > 1) {
    const limits = worst.solid === 'salt' ? 'salt' : 'free form';
    return {
      kind: 'drops',
      criterion: 'solubility',
      text: `drops: ${name}'s solubility at pH ${worst.pH} (${fmt(worst.solubilityMgPerMl)} mg/mL, ${limits} limits) falls below the dose (D₀ ${fmt(worst.doseNumber)})`,
    };
  }
  return {
    kind: 'keeps',
    criterion: 'solubility',
    text: `keeps: the dose dissolves in ≤ ${ICH_M9_VOLUME_ML} mL from pH 1.2 to 6.8 (worst D₀ ${fmt(worst.doseNumber)} at pH ${worst.pH})`,
  };
}

export function saltPoorlySolubleFlag(mgPerMl: number, pH: number, doseNumber: number): ScreenFlag {
  return {
    id: 'salt-poorly-soluble',
    text: `salt poorly soluble in itself: ${fmt(mgPerMl)} mg/mL at pH ${pH.toFixed(1)} where the salt is the solid (D₀ ${fmt(doseNumber)})`,
    rule: 'salt-limited solubility below the highest dose in 250 mL (the ICH M9 (2019) volume) on the salt branch, below pH_max — a screening rule of our own (common practice)',
  };
}

export function gastricReason(
  name: string,
  gastric: MediumResult,
  counterIonId: string,
): Reason | null {
  if (gastric.doseNumber === null) return null;
  const ci =
    gastric.commonIonM > 0
      ? ` (common ion: ${gastric.commonIonM.toFixed(3)} M ${counterIonId})`
      : '';
  if (gastric.convertsTo) {
    const verb = gastric.doseNumber > 1 ? 'drops' : 'watch';
    return {
      kind: verb,
      criterion: 'gastric',
      text: `${verb}: in gastric chloride ${name} can convert to the less soluble ${withoutRatio(gastric.convertsTo)} (D₀ ${fmt(gastric.doseNumber)})`,
    };
  }
  if (gastric.doseNumber > 1) {
    return {
      kind: 'drops',
      criterion: 'gastric',
      text: `drops: ${name}'s solubility in gastric medium${ci} falls below the dose (D₀ ${fmt(gastric.doseNumber)})`,
    };
  }
  if (gastric.commonIonM > 0) {
    return {
      kind: 'keeps',
      criterion: 'gastric',
      text: `keeps: dose dissolves in gastric medium despite the common ion${ci}`,
    };
  }
  return null;
}

export function disproportionationWords(disp: DisproportionationResult): {
  reason: Reason;
  flag: ScreenFlag | null;
} {
  const verb = disp.risk === 'high' ? 'drops' : disp.risk === 'low' ? 'keeps' : 'watch';
  const flag: ScreenFlag | null =
    disp.risk === 'high' || disp.risk === 'watch'
      ? {
          id: 'disproportionation',
          text: disp.reason,
          rule: 'Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603: conversion to the free form beyond pH_max',
        }
      : null;
  return {
    reason: { kind: verb, criterion: 'disproportionation', text: `${verb}: ${disp.reason}` },
    flag,
  };
}

export function acceptabilityReason(ion: ScreeningCounterIon): Reason {
  const ac = ion.acceptabilityClass;
  return {
    kind: ac === 1 ? 'keeps' : ac === 3 ? 'watch' : 'note',
    criterion: 'acceptability',
    text: ac
      ? `acceptability class ${ac}${ion.classSource ? ` (${ion.classSource})` : ''}`
      : 'no acceptability class recorded',
  };
}

/** What the measured solid-state data say, in the order the row lists them. */
export function measuredReasons(
  measured: InterpretedMeasurements | null,
  predictedKJ: Estimate | null | undefined,
): Reason[] {
  const out: Reason[] = [];
  if (!measured) return out;
  if (measured.hygroscopicity) {
    const gain =
      measured.massGainPercent !== null ? `, +${measured.massGainPercent} % at 80 % RH` : '';
    out.push({
      kind: 'measured',
      criterion: 'hygroscopicity',
      text: `measured: ${measured.hygroscopicity} (Ph. Eur. 5.11${gain})`,
    });
  }
  if (measured.meltingPointC !== null && measured.meltingPointC !== undefined) {
    out.push({
      kind: 'measured',
      criterion: 'note',
      text: `measured melting point ${measured.meltingPointC} °C`,
    });
  }
  if (measured.crystallinityPercent !== null && measured.crystallinityPercent !== undefined) {
    out.push({
      kind: 'measured',
      criterion: 'note',
      text: `measured crystallinity ${measured.crystallinityPercent} %`,
    });
  }
  if (measured.vantHoff) {
    const v = measured.vantHoff.solutionEnthalpyKJ;
    const predicted = predictedKJ
      ? ` (predicted ${predictedKJ.value.toFixed(0)} ± ${predictedKJ.uncertainty.toFixed(0)} kJ/mol)`
      : '';
    out.push({
      kind: 'measured',
      criterion: 'note',
      text: `van ’t Hoff: ΔH_sol,app ${v.value.toFixed(1)} ± ${v.uncertainty.toFixed(1)} kJ/mol${predicted}`,
    });
  } else if (measured.vantHoffNote)
    out.push({ kind: 'note', criterion: 'note', text: measured.vantHoffNote });
  return out;
}

export function notScreenedReason(error: string): Reason {
  return { kind: 'note', criterion: 'input', text: `not screened: ${error}` };
}
