// Types of generated-compounds.mjs (plain JavaScript, shared with make-batch-golden.mjs).
export declare const BATCH_HEADER: string;
export declare function generatedCompoundLines(n: number): string[];
