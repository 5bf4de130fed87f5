/** The compound: its schema, molecular formulas and masses, structure parsing and the derived drug ion. */
export * from './compound.schema';
export * from './atomic-weights';
export * from './formula';
export * from './structure';
export * from './drug-ion';
export * from './free-form-volume';
export * from './salt-stoichiometry';
