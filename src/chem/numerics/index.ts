/** Numerical helpers of the core: root finding, least squares, seeded random numbers, the normal CDF
 * and its quantile. */
export * from './prng';
export * from './root-finding';
export * from './least-squares';
export * from './normal-cdf';
export * from './normal-quantile';
