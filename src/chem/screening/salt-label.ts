/**
 * One vocabulary for salts, in the app and in the CLI: the trade's name of the salt with its ratio
 * (drug ions : counter-ions), e.g. 'hydrochloride (1:1)', 'hemisulfate (2:1)', 'mesylate (1:1)'.
 * The names are the counter-ion library's stoichiometry labels (src/chem/library/counter-ions.data.ts,
 * the usual pharmaceutical salt names, common practice); a ratio the library does not list is named by
 * the ion's name in lower case with the ratio.
 */

/** A stoichiometry as the library lists it: its trade label and its ratio. */
export interface LabelledRatio {
  label: string;
  drugPerSalt: number;
  counterIonPerSalt: number;
  ionCharge?: number;
}

/** A label that carries no name, only a ratio such as '(2:1)'. */
const nameless = (label: string): boolean => /^\s*(\([^)]*\))?\s*$/.test(label);

/**
 * The salt's name with its ratio: the stoichiometry's own label when it names the salt, else the
 * label the library lists for that ratio (and charge, when known), else the ion's name in lower case and the ratio.
 */
export function saltLabel(
  ionName: string,
  st: { label?: string; drugPerSalt: number; counterIonPerSalt: number; ionCharge?: number },
  listed: readonly LabelledRatio[] = [],
): string {
  if (st.label && !nameless(st.label)) return st.label;
  const same = listed.find(
    (s) =>
      s.drugPerSalt === st.drugPerSalt &&
      s.counterIonPerSalt === st.counterIonPerSalt &&
      (st.ionCharge === undefined || s.ionCharge === undefined || s.ionCharge === st.ionCharge) &&
      !nameless(s.label),
  );
  if (same) return same.label;
  return `${ionName.toLowerCase()} (${st.drugPerSalt}:${st.counterIonPerSalt})`;
}
