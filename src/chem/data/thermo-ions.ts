/**
 * The bundled ions of the thermochemistry engine. The values live in fixtures/reference/thermo-ions.json
 * (every value with its source); thermo-ions.data.ts is generated from it by
 * fixtures/reference/generate-thermo-data.mjs — edit the JSON, not the TypeScript.
 */
export type { SourcedValue, ThermoIonRecord } from './thermo-ions.types';
export { THERMO_IONS } from './thermo-ions.data';
