import { z } from 'zod';

/**
 * zod 4 compiles object parsers with `new Function` when the page allows it, and probes for that
 * with `Function('')`. The Content-Security-Policy (vite.config.ts) forbids eval, so the probe alone
 * is reported as a violation. Parsing without the compiled fast path is plain JavaScript and fast
 * enough for our inputs. Imported first by the entry and by each worker.
 */
z.config({ jitless: true });
