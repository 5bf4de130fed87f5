import { doseNumber } from '../dose-number';
import { solubilityAtPh, type ProfilePoint, type ProfileSalt } from '../ph-profile';
import type { ScreeningMedium, ScreeningSettings } from '../settings';
import type { KspChoice } from './ksp-choice';
import { commonIonIn, mediumActivity, saltInMedium } from './medium-solubility';
import { isPrepared, type PreparedCandidate, type PreparedOrError } from './prepare-candidate';
import { freeFormMgPerMl, type ScreenContext } from './screen-context';
import type { MediumResult, ScreeningCandidate } from './screen.types';

/** Sodium in USP simulated gastric fluid: 2.0 g/L NaCl → 0.034 mol/L (composition from memory of the USP text). */
export const GASTRIC_SODIUM_M = 2.0 / 58.44;

export { mediumActivity };

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
  /**
   * Its point in each chloride medium of the screen, solved once: it depends on the compound, the
   * hydrochloride and the medium only, and every other salt of the screen asks for it.
   */
  inMedium: Map<object, ProfilePoint>;
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
    inMedium: new Map(),
  };
}

/**
 * A candidate's solubility and dose number in each medium, with the common-ion effect and conversion.
 * The salt has passed the profile's checks (the row computes its profile first).
 */
export function mediumResults(
  ctx: ScreenContext,
  cand: ScreeningCandidate,
  salt: ProfileSalt,
  media: readonly ScreenMedium[],
  hcl: HydrochlorideReference | null,
): MediumResult[] {
  const dose = ctx.doseMg;
  const counterIonId = cand.counterIon.id;
  const otherThanHcl = hcl !== null && hcl.cand.id !== cand.id && counterIonId !== 'chloride';
  const out: MediumResult[] = new Array<MediumResult>(media.length);
  for (let i = 0; i < media.length; i++) {
    const m = media[i]!;
    const commonIonM = commonIonIn(ctx, media, i, counterIonId);
    const pt = saltInMedium(ctx, salt, media, i, commonIonM);
    const ownM = pt.solubilityM;
    const toHcl = otherThanHcl ? hydrochlorideBelow(ctx, hcl, m, ownM) : null;
    const solubilityM = toHcl?.solubilityM ?? ownM;
    const convertsTo = toHcl?.convertsTo ?? null;
    const mg = freeFormMgPerMl(ctx, solubilityM);
    out[i] = {
      id: m.id,
      label: m.label,
      pH: m.pH,
      commonIonM,
      solubilityMgPerMl: mg,
      doseNumber: dose === null ? null : doseNumber(dose, mg),
      solid: convertsTo ? 'salt' : pt.solid,
      convertsTo,
    };
  }
  return out;
}

/**
 * The hydrochloride a base converts to in a chloride medium, when it is less soluble there than
 * `solubilityM` (the form's own solubility in that medium): its solubility and label, else null.
 * The hydrochloride's own point is solved once per medium object of the screen (`hcl.inMedium`).
 */
export function hydrochlorideBelow(
  ctx: ScreenContext,
  hcl: HydrochlorideReference,
  m: Pick<ScreeningMedium, 'pH' | 'ions' | 'ionicStrengthM'>,
  solubilityM: number,
): { solubilityM: number; convertsTo: string } | null {
  const chlorideM = m.ions.chloride ?? 0;
  if (chlorideM <= 0) return null;
  let h = hcl.inMedium.get(m);
  if (h === undefined) {
    h = solubilityAtPh(ctx.drug, ctx.log10IntrinsicM.value, hcl.salt, m.pH, {
      activity: mediumActivity(ctx, m),
      commonIonM: chlorideM,
    });
    hcl.inMedium.set(m, h);
  }
  return h.solid === 'salt' && h.solubilityM < solubilityM
    ? { solubilityM: h.solubilityM, convertsTo: hcl.cand.stoichiometry.label ?? 'hydrochloride' }
    : null;
}
