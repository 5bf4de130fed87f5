/**
 * The only entry point that app/, features/, persistence/ and cli/ import from the core.
 * Each area of the core keeps its own index file; add one export line per area here.
 */
export * from './constants/physical';
export * from './result';
export * from './models/kapustinskii/kapustinskii';
export * from './data/skeleton-radii';
export * from './screening';
