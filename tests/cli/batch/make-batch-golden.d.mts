// Types of make-batch-golden.mjs (a plain Node script, so that it runs without a build).
export declare const GOLDEN_FLAGS: string[];
export declare const GOLDEN_INPUTS: Record<string, string | null>;
export declare function generatedFile(dir: string): string;
