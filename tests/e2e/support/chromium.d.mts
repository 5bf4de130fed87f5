/** Types of chromium.mjs (plain JavaScript so that the Node runner scripts can import it too). */
export declare const CHROMIUM_ARGS: readonly string[];
export declare function findChromium(): string | null;
export declare const CHROMIUM_MISSING_MESSAGE: string;
