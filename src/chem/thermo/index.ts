/**
 * Thermochemistry engine: lattice, hydration and solution enthalpies with sourced ion data and measured
 * uncertainty (sign conventions in hess-law-assembly.ts). Everything here is pure and deterministic.
 */
export type * from './thermo.types';
export {
  getThermoIon,
  findThermoIon,
  findThermoIonByFormula,
  listThermoIonIds,
  derivedAnionVolumes,
  KAPUSTINSKII_RADIUS_SET,
} from './ions';
export {
  checkFormulaUnit,
  type CheckedFormulaUnit,
  type FormulaUnitFields,
} from './models/formula-unit';
export { checkSaltRequest, type CheckedSaltRequest } from './lattice-inputs';
export {
  kapustinskiiPotentialKJ,
  stoichiometryFromCharges,
  KAPUSTINSKII_K_KJ_A_PER_MOL,
  KAPUSTINSKII_K_ALT_KJ_A_PER_MOL,
  KAPUSTINSKII_RHO_A,
  type KapustinskiiInput,
} from './models/kapustinskii/kapustinskii';
export {
  bornMayerPotentialKJ,
  bornLandePotentialKJ,
  MADELUNG_CONSTANTS,
  BORN_MAYER_RHO_A,
  nearestDistanceFromVolumeA,
} from './models/born-mayer/born-mayer';
export {
  vbtPotentialKJ,
  volumeFromDensityNm3,
  ionicStrengthFactor,
  VBT_CONSTANTS,
} from './models/vbt/vbt';
export { latticeEnthalpyCorrectionKJ } from './models/lattice-correction';
export { schroderVanLaarLnMoleFraction } from './models/fusion/schroder-van-laar';
export {
  vanDerWaalsVolumeA3,
  radiusFromVolumeA,
  organicIonFromFormula,
  packingCalibration,
  type PackingCalibration,
  type RingCounts,
} from './models/ion-volume/ion-volume';
export { organicIonFromSmiles } from './models/ion-volume/from-smiles';
export {
  bornHydrationEnthalpyKJ,
  bornEnthalpyFactor,
  fitBornOffsets,
  type BornOffsetFit,
} from './models/hydration/hydration';
export { hydrationEnthalpyKJ } from './models/hydration/hydration-enthalpy';
export {
  solveCycle,
  bornHaberCycle,
  solutionCycle,
  type BornHaberInput,
  type SolutionCycleInput,
} from './models/cycle/cycle';
export { latticeFromSolutionEnthalpy } from './models/solution/solution';
export { solutionEnthalpiesRelativeToMedianKJ } from './models/solution/relative';
export { estimateSaltThermo, latticeEnthalpyEstimate, SIGN_CONVENTION } from './estimate-salt';
export { calibratedMethodName } from './lattice-estimate';
export { solutionEnthalpyNumbersKJ } from './solution-enthalpy-numbers';
export type { CalibratedSaltThermoResult, LatticeCalibrationOptions } from './estimate-salt';
export {
  validationReport,
  kapustinskiiVariants,
  type SolutionValidation,
} from './validation/report';
export { solutionValidationSections } from './validation/report';
export {
  SHIPPED_LATTICE_CALIBRATION,
  fitLatticeCalibration,
  findLatticeFactor,
  chargeClassOf,
  CALIBRATION_MIN_SALTS,
  type CalibrationRow,
} from './calibration/calibration';
export type * from './calibration/calibration.types';
export {
  latticeValidation,
  hydrationValidation,
  publishedHydrationClosure,
} from './validation/validation';
export {
  referenceLatticeEnthalpyKJ,
  referenceSolutionEnthalpyKJ,
  referenceVolumeNm3,
} from './validation/reference';
export {
  LATTICE_REFERENCE_SALTS,
  SOLUTION_REFERENCE_SALTS,
  type LatticeReferenceSalt,
} from '../data/thermo-reference';
