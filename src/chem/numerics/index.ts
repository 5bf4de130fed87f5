/** Numerical helpers of the core: root finding, least squares, seeded random numbers, the normal CDF. */
export * from './prng';
export * from './root-finding';
export * from './least-squares';
export * from './normal-cdf';
