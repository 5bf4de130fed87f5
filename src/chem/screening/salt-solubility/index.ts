/**
 * The salt's own solubility in water: computed counter-ion descriptors, the calibrated model, its
 * fitting and nested leave-one-drug-out validation, and the Schröder–van Laar ideal solubility.
 */
export {
  counterIonDescriptorsFromSmiles,
  counterIonFromParentSmiles,
  neutralParentSmiles,
  withoutHydroxide,
  type CounterIonDescriptors,
  type CounterIonFromParent,
} from './counter-ion-descriptors';
export { LIBRARY_COUNTER_ION_DESCRIPTORS } from './library-descriptors.data';
export {
  estimateSaltWaterSolubility,
  SALT_SOLUBILITY_SHARED_LOG10_SD,
  SALT_SOLUBILITY_WITHIN_LOG10_SD,
  DRIVER_THRESHOLD_DECADES,
  type SaltWaterSolubilityEstimate,
  type SolubilityDriver,
  type SolubilityDriverId,
  type SaltSolubilityOrigin,
} from './estimate-salt-solubility';
export { SALT_SOLUBILITY_FEATURES, type SaltSolubilityInput } from './salt-solubility-features';
export {
  SALT_SOLUBILITY_MODEL,
  SALT_SOLUBILITY_SELECTION,
  SALT_SOLUBILITY_FUSION_CHECK,
  SALT_SOLUBILITY_DIVALENT_CATIONS,
  SALT_SOLUBILITY_DOMAIN,
  SALT_SOLUBILITY_VARIANTS,
  SALT_SOLUBILITY_SERIES,
} from './salt-solubility-model.data';
export {
  idealSolubility,
  moleFractionToMolPerL,
  type IdealSolubility,
  type FusionHeatCapacityAssumption,
} from './fusion';
export { spearmanRho } from './rank-statistics';
export {
  descriptorGainWords,
  sigmaSplitWords,
  fusionCheckWords,
  divalentCationWords,
} from './evidence-words';
