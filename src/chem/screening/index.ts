/**
 * Screening: the decision models that turn a compound and its candidate counter-ions into a ranked,
 * explained shortlist (layout in DEVELOPERS.md). Every module is pure; see each file for its sources.
 */
export * from './speciation';
export * from './delta-pka';
export * from './mass-cost';
export * from './ph-solubility-closed-form';
export * from './activity';
export * from './salt-equilibrium';
export * from './ph-profile';
export * from './dose-number';
export * from './disproportionation';
export * from './excipients';
export * from './hygroscopicity';
export * from './van-t-hoff';
export * from './intrinsic-solubility';
export * from './ksp-estimate';
export * from './measurements';
export * from './settings';
export * from './ranking';
export * from './rank-robustness';
export * from './separation';
export * from '../numerics';
export * from './thermo-link';
export * from './screen';
export * from './library-candidates';
export * from './salt-solubility';
export * from './measure-next';
export * from './salt-label';
