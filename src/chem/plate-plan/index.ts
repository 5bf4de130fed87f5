/**
 * The salt-screen plan: the bundled solvent table (ICH Q3C classes), how each counter-ion's parent is
 * dosed, the well plate, the per-well arithmetic, the pick list and the summary of recorded outcomes.
 */
export * from './solvents.data';
export * from './counter-ion-handling.data';
export * from './plate-layout';
export * from './plate-plan.schema';
export * from './well-amounts';
export * from './build-plate-plan';
export * from './pick-list';
export * from './outcome-summary';
