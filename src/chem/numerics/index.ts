/** Numerical helpers of the core: root finding, least squares, seeded random numbers. */
export * from './prng';
export * from './root-finding';
export * from './least-squares';
