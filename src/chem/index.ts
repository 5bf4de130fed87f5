/**
 * The only entry point that app/, features/, persistence/ and cli/ import from the core.
 * Each area of the core keeps its own index file; add one export line per area here.
 */
export * from './constants/physical';
export * from './constants/water';
export * from './units';
export * from './result';
export * from './thermo';
export * from './compound';
export * from './library';
export * from './screening';
export * from './report';
export * from './plate-plan';
export * from './input';
