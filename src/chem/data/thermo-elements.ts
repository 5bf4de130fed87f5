/**
 * Element data for molecular volumes: Bondi van der Waals radii (Å) and the Zhao–Abraham–Zissimos atom
 * volumes (Å³). The values live in fixtures/reference/thermo-elements.json (with their sources);
 * thermo-elements.data.ts is generated from it by fixtures/reference/generate-thermo-data.mjs — edit the
 * JSON, not the TypeScript. Atomic weights have one home, src/chem/compound/atomic-weights.ts.
 */
export { BONDI_RADIUS_A, BONDI_RADIUS_SOURCE, ZHAO_ATOM_VOLUME_A3 } from './thermo-elements.data';
