/** The screen of one compound against its candidate salts, in named steps (see screen-compound.ts). */
export type * from './screen.types';
export { screenCompound } from './screen-compound';
export { counterIonProtolyte } from './counter-ion-protolyte';
export { GASTRIC_SODIUM_M } from './media';
export { chooseKsp, type KspChoice } from './ksp-choice';
export {
  SOLUBILITY_DRIVER_WORDS,
  SALT_WATER_ORIGIN_LABELS,
  SALT_WATER_ORIGIN_BASIS,
} from './salt-water-words';
export { uncertaintiesOf } from './row-uncertainty';
export {
  BIORELEVANT_MEDIA,
  biorelevantMedium,
  type BiorelevantMediumRecord,
} from './biorelevant-media';
