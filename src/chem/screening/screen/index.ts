/** The screen of one compound against its candidate salts, in named steps (see screen-compound.ts). */
export type * from './screen.types';
export { screenCompound } from './screen-compound';
export {
  screenCompoundTop,
  solutionEnthalpyRanks,
  type ScreenTopOptions,
  type ScreenTopResult,
} from './screen-top';
export { counterIonProtolyte } from './counter-ion-protolyte';
export { GASTRIC_SODIUM_M } from './media';
export { chooseKsp, type KspChoice } from './ksp-choice';
export { SOLUBILITY_DRIVER_WORDS, SALT_WATER_ORIGIN_LABELS } from './salt-water-words';
export {
  basisWords as saltSolubilityBasisWords,
  basisShortWords as saltSolubilityBasisShortWords,
  type SaltSolubilityBasis,
} from './salt-water-basis';
export { uncertaintiesOf } from './row-uncertainty';
export {
  BIORELEVANT_MEDIA,
  biorelevantMedium,
  type BiorelevantMediumRecord,
} from './biorelevant-media';
export {
  solutionEnthalpyShown,
  solubilityFactor25To37C,
  PLAUSIBLE_SOLUTION_ENTHALPY_PER_DRUG_ION_KJ,
  type SolutionEnthalpyShown,
} from './solution-enthalpy-shown';
export {
  separationSummary,
  separationCandidateOf,
  CRITERION_SHORT_WORDS,
  type SeparationSummary,
} from './separation-words';
export { S0_LOG10_SIGMA_BY_ORIGIN } from './screen-context';
export { decideLimitingSolid, LIMITING_SOLID_MARGIN_SIGMA } from './bench-solubility';
export {
  temperatureTransfer,
  UNCORRECTED_LOG10_PER_K,
  type TemperatureTransfer,
} from './bench-temperature';
