/** Units and their conversions (SI inside the core). */
export * from './temperature';
