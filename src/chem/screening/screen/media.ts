import { doseNumber } from '../dose-number';
import { solubilityAtPh, type ProfileOptions, type ProfileSalt } from '../ph-profile';
import type { ScreeningMedium, ScreeningSettings } from '../settings';
import type { KspChoice } from './ksp-choice';
import { isPrepared, type PreparedCandidate, type PreparedOrError } from './prepare-candidate';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import type { MediumResult, ScreeningCandidate } from './screen.types';

/** Sodium in USP simulated gastric fluid: 2.0 g/L NaCl → 0.034 mol/L (composition from memory of the USP text). */
export const GASTRIC_SODIUM_M = 2.0 / 58.44;

export type ScreenMedium = ScreeningMedium & { gastric: boolean };

/** The media a candidate is checked in: gastric medium first, then the user's buffers. */
export function screeningMedia(settings: ScreeningSettings): ScreenMedium[] {
  const gastric: ScreenMedium = {
    id: 'gastric',
    label: `gastric medium (pH ${settings.gastricPh}, ${settings.gastricChlorideM} M chloride)`,
    pH: settings.gastricPh,
    ions: { chloride: settings.gastricChlorideM, sodium: GASTRIC_SODIUM_M },
    ionicStrengthM: settings.gastricChlorideM,
    gastric: true,
  };
  return [gastric, ...settings.media.map((m) => ({ ...m, gastric: false }))];
}

/** The 1:1 hydrochloride other salts of a base may convert to in chloride media. */
export interface HydrochlorideReference {
  cand: ScreeningCandidate;
  salt: ProfileSalt;
}

/**
 * For a base, gastric chloride can turn any salt into the hydrochloride when that is less soluble
 * (Serajuddin 2007, Adv. Drug Deliv. Rev. 59, 603, on the common-ion effect in gastric fluid).
 * Checked when a 1:1 hydrochloride is among the candidates, with its own (measured or estimated) K_sp.
 */
export function hydrochlorideReference(
  ctx: ScreenContext,
  prepared: readonly PreparedOrError[],
  ksps: ReadonlyMap<string, KspChoice>,
): HydrochlorideReference | null {
  const c = ctx.compound;
  if (!(c.kind === 'base' && c.ionCharge === 1)) return null;
  const hcl = prepared.find(
    (p): p is PreparedCandidate =>
      isPrepared(p) &&
      p.cand.counterIon.id === 'chloride' &&
      p.cand.stoichiometry.ionCharge === -1 &&
      ksps.has(p.cand.id),
  );
  if (!hcl) return null;
  const st = hcl.cand.stoichiometry;
  return {
    cand: hcl.cand,
    salt: {
      counterIon: hcl.protolyte,
      counterIonCharge: -1,
      drugPerSalt: st.drugPerSalt,
      counterIonPerSalt: st.counterIonPerSalt,
      log10Ksp: ksps.get(hcl.cand.id)!.log10Ksp.value,
    },
  };
}

/** A candidate's solubility and dose number in each medium, with the common-ion effect and conversion. */
export function mediumResults(
  ctx: ScreenContext,
  cand: ScreeningCandidate,
  salt: ProfileSalt,
  media: readonly ScreenMedium[],
  hcl: HydrochlorideReference | null,
): MediumResult[] {
  const logS0 = ctx.log10IntrinsicM.value;
  const dose = ctx.doseMg;
  return media.map((m) => {
    const commonIonM = m.ions[cand.counterIon.id] ?? 0;
    const activity = mediumActivity(ctx, m);
    const pt = solubilityAtPh(ctx.drug, logS0, salt, m.pH, { activity, commonIonM });
    const otherThanHcl = hcl && hcl.cand.id !== cand.id && cand.counterIon.id !== 'chloride';
    const toHcl = otherThanHcl ? hydrochlorideBelow(ctx, hcl, m, activity, pt.solubilityM) : null;
    const solubilityM = toHcl?.solubilityM ?? pt.solubilityM;
    const convertsTo = toHcl?.convertsTo ?? null;
    const mg = freeFormMgPerMl(ctx, solubilityM);
    return {
      id: m.id,
      label: m.label,
      pH: m.pH,
      commonIonM,
      solubilityMgPerMl: mg,
      doseNumber: dose === null ? null : doseNumber(dose, mg),
      solid: convertsTo ? 'salt' : pt.solid,
      convertsTo,
    };
  });
}

/** The activity model in a medium: Davies takes the medium's own background ionic strength. */
export function mediumActivity(
  ctx: ScreenContext,
  m: Pick<ScreeningMedium, 'ionicStrengthM'>,
): ProfileOptions['activity'] {
  return ctx.activity?.model === 'davies'
    ? { ...ctx.activity, backgroundIonicStrengthM: m.ionicStrengthM }
    : ctx.activity;
}

/**
 * The hydrochloride a base converts to in a chloride medium, when it is less soluble there than
 * `solubilityM` (the form's own solubility in that medium): its solubility and label, else null.
 */
export function hydrochlorideBelow(
  ctx: ScreenContext,
  hcl: HydrochlorideReference,
  m: Pick<ScreeningMedium, 'pH' | 'ions'>,
  activity: ProfileOptions['activity'],
  solubilityM: number,
): { solubilityM: number; convertsTo: string } | null {
  const chlorideM = m.ions.chloride ?? 0;
  if (chlorideM <= 0) return null;
  const h = solubilityAtPh(ctx.drug, ctx.log10IntrinsicM.value, hcl.salt, m.pH, {
    activity,
    commonIonM: chlorideM,
  });
  return h.solid === 'salt' && h.solubilityM < solubilityM
    ? { solubilityM: h.solubilityM, convertsTo: hcl.cand.stoichiometry.label ?? 'hydrochloride' }
    : null;
}
