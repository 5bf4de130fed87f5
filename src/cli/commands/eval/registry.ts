import { z } from 'zod';
import { ChemInputError } from '@/chem';
import { CliError } from '../../args/cli-error';

/**
 * The request kinds `saltsmith eval` understands. A kind is a zod schema and a handler; the built-in
 * kinds are added by `registerBuiltInEvalKinds()` (built-in-kinds.ts), called once from main.ts —
 * importing a module never registers anything.
 */
export type EvalHandler = {
  /** zod schema of the request (with its `kind` literal). */
  schema: z.ZodType;
  /** Answer one request (already parsed from JSON); the result is merged into the output line. */
  run: (request: unknown) => Promise<Record<string, unknown>>;
};

export class EvalRegistry {
  private readonly kinds = new Map<string, EvalHandler>();

  /** Add a request kind. Throws if the kind is taken. */
  register(kind: string, handler: EvalHandler): void {
    if (this.kinds.has(kind)) throw new Error(`eval kind "${kind}" is already registered`);
    this.kinds.set(kind, handler);
  }

  has(kind: string): boolean {
    return this.kinds.has(kind);
  }

  get(kind: string): EvalHandler | undefined {
    return this.kinds.get(kind);
  }

  /** The registered kinds, in registration order. */
  list(): string[] {
    return [...this.kinds.keys()];
  }
}

/** The registry the `eval` command reads; filled by `registerBuiltInEvalKinds()`. */
export const evalRegistry = new EvalRegistry();

/** The error object of one failed line: its type, the field at fault, the message, what is accepted. */
export type LineError = { type: string; field: string; message: string; accepted?: string };

/** Turn any thrown error into the JSON error object of one line. */
export function describeError(err: unknown): LineError {
  if (err instanceof ChemInputError)
    return { type: 'input', field: err.field, message: err.message, accepted: err.accepted };
  if (err instanceof CliError) {
    return {
      type: 'input',
      field: err.flag,
      message: err.message,
      ...(err.accepted ? { accepted: err.accepted } : {}),
    };
  }
  if (err instanceof z.ZodError) {
    const first = err.issues[0];
    const field = first && first.path.length ? first.path.join('.') : 'request';
    return {
      type: 'schema',
      field,
      message: err.issues.map((i) => `${i.path.join('.') || 'request'}: ${i.message}`).join('; '),
    };
  }
  return {
    type: 'internal',
    field: 'request',
    message: err instanceof Error ? err.message : String(err),
  };
}

/** Evaluate one parsed JSON value as a request of a registered kind. */
export async function evaluateRequest(
  value: unknown,
  registry: EvalRegistry = evalRegistry,
): Promise<Record<string, unknown>> {
  if (!value || typeof value !== 'object' || Array.isArray(value)) {
    throw new ChemInputError(
      'request',
      'each line must be a JSON object',
      `an object with "kind": ${registry
        .list()
        .map((k) => `"${k}"`)
        .join(' or ')}`,
    );
  }
  const kind = (value as { kind?: unknown }).kind;
  const handler = typeof kind === 'string' ? registry.get(kind) : undefined;
  if (!handler) {
    const shown =
      typeof kind === 'string'
        ? JSON.stringify(kind.slice(0, 40))
        : typeof kind === 'undefined'
          ? 'null'
          : `a ${typeof kind}`;
    throw new ChemInputError('kind', `unknown kind ${shown}`, registry.list().join(', '));
  }
  return { kind, ...(await handler.run(value)) };
}
