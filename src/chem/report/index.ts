/** What the core says alongside its numbers when a user reads or exports them: cautions, safe CSV cells. */
export * from './cautions';
export * from './csv-cell-guard';
export * from './precision';
export * from './shown-numbers';
export * from './superscript';
