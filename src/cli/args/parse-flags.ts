import { usageError, valueError } from './cli-error';

/**
 * Strict flag parsing for every `saltsmith` command. A command declares its flags; anything else is
 * refused, naming the flag: unknown flags, stray arguments, missing or empty values (`--mp=`,
 * `--pka ,7.8`), a flag given twice, a switch given a value. Numbers must be written as plain decimals
 * (no `Infinity`, `0x…`, empty text) and fall inside the declared range.
 */
export type FlagSpec =
  | { type: 'switch' }
  | { type: 'string'; maxLength?: number }
  | { type: 'enum'; values: readonly string[] }
  | { type: 'number'; min: number; max: number; integer?: boolean; unit?: string }
  | {
      type: 'number-list';
      minItems: number;
      maxItems: number;
      min: number;
      max: number;
      unit?: string;
    }
  | { type: 'string-list'; minItems: number; maxItems: number; maxLength?: number };

export type FlagSpecs = Readonly<Record<string, FlagSpec>>;

type ValueOf<F extends FlagSpec> = F extends { type: 'switch' }
  ? boolean
  : F extends { type: 'number' }
    ? number
    : F extends { type: 'number-list' }
      ? number[]
      : F extends { type: 'string-list' }
        ? string[]
        : F extends { type: 'enum'; values: readonly (infer V)[] }
          ? V
          : string;

/** The parsed flags: each present flag with its typed value; absent flags are undefined. */
export type ParsedFlags<S extends FlagSpecs> = { -readonly [K in keyof S]?: ValueOf<S[K]> };

/** A decimal number as people type it: sign, digits, optional fraction and exponent. */
const DECIMAL = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

const DEFAULT_MAX_STRING = 2000;

/** Read one number for `flag`, finite and within [min, max]; `integer` asks for a whole number. */
export function readNumber(
  flag: string,
  text: string,
  spec: { min: number; max: number; integer?: boolean; unit?: string },
): number {
  const accepted = `${spec.integer ? 'a whole number' : 'a number'} from ${spec.min} to ${spec.max}${spec.unit ? ` ${spec.unit}` : ''}`;
  const t = text.trim();
  if (t === '') throw usageError(flag, 'the value is empty', accepted);
  if (!DECIMAL.test(t)) throw valueError(flag, `"${clip(text)}" is not a number`, accepted);
  const x = Number(t);
  if (!Number.isFinite(x))
    throw valueError(flag, `"${clip(text)}" is not a finite number`, accepted);
  if (spec.integer && !Number.isInteger(x))
    throw valueError(flag, `${x} is not a whole number`, accepted);
  if (x < spec.min || x > spec.max) throw valueError(flag, `${x} is out of range`, accepted);
  return x === 0 ? 0 : x; // no −0
}

const clip = (s: string) => (s.length > 40 ? `${s.slice(0, 40)}…` : s);

function splitList(flag: string, text: string, minItems: number, maxItems: number): string[] {
  const items = text.split(',').map((s) => s.trim());
  if (items.some((s) => s === ''))
    throw usageError(
      flag,
      `"${clip(text)}" has an empty entry`,
      'comma-separated values, none empty',
    );
  if (items.length < minItems || items.length > maxItems) {
    throw valueError(
      flag,
      `${items.length} value(s) given`,
      `${minItems} to ${maxItems} comma-separated values`,
    );
  }
  return items;
}

function readValue(flag: string, text: string, spec: FlagSpec): unknown {
  switch (spec.type) {
    case 'switch':
      throw usageError(flag, 'is a switch and takes no value');
    case 'string': {
      if (text.trim() === '') throw usageError(flag, 'the value is empty');
      const max = spec.maxLength ?? DEFAULT_MAX_STRING;
      if (text.length > max) throw valueError(flag, `the value is longer than ${max} characters`);
      return text;
    }
    case 'enum': {
      if (text.trim() === '') throw usageError(flag, 'the value is empty', spec.values.join(', '));
      if (!spec.values.includes(text))
        throw usageError(flag, `"${clip(text)}" is not one of the choices`, spec.values.join(', '));
      return text;
    }
    case 'number':
      return readNumber(flag, text, spec);
    case 'number-list':
      return splitList(flag, text, spec.minItems, spec.maxItems).map((s, i) =>
        readNumber(`${flag}[${i + 1}]`, s, spec),
      );
    case 'string-list': {
      const items = splitList(flag, text, spec.minItems, spec.maxItems);
      const max = spec.maxLength ?? 200;
      const long = items.find((s) => s.length > max);
      if (long !== undefined)
        throw valueError(flag, `"${clip(long)}" is longer than ${max} characters`);
      return items;
    }
  }
}

function distance(a: string, b: string): number {
  const d = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = d[0]!;
    d[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const cur = d[j]!;
      d[j] = Math.min(d[j]! + 1, d[j - 1]! + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = cur;
    }
  }
  return d[b.length]!;
}

function unknownFlag(token: string, specs: FlagSpecs): Error {
  const name = token.replace(/^-+/, '').split('=')[0]!;
  const near = Object.keys(specs).find((k) => distance(k, name) <= 2);
  return usageError(
    clip(token.split('=')[0]!),
    `unknown flag${near ? ` (did you mean --${near}?)` : ''}`,
    Object.keys(specs)
      .map((k) => `--${k}`)
      .join(', '),
  );
}

/**
 * Parse `args` against `specs`. Flags are `--name value`, `--name=value` or, for switches, `--name`;
 * `-h` means `--help` when the command has one. No positional arguments are taken.
 * @throws CliError naming the flag (exit 2 for the shape of the line, 1 for a refused value).
 */
export function parseFlags<S extends FlagSpecs>(args: readonly string[], specs: S): ParsedFlags<S> {
  const out: Record<string, unknown> = {};
  for (let i = 0; i < args.length; i++) {
    let token = args[i]!;
    if (token === '-h' && specs.help?.type === 'switch') token = '--help';
    if (!token.startsWith('--') || token === '--') {
      if (/^-[A-Za-z]/.test(token)) throw unknownFlag(token, specs);
      throw usageError(
        `"${clip(token)}"`,
        'unexpected argument (every value follows its flag, e.g. --dose 200)',
      );
    }
    const eq = token.indexOf('=');
    const name = eq > 0 ? token.slice(2, eq) : token.slice(2);
    const spec = Object.prototype.hasOwnProperty.call(specs, name) ? specs[name] : undefined;
    if (!spec) throw unknownFlag(token, specs);
    const flag = `--${name}`;
    if (Object.prototype.hasOwnProperty.call(out, name))
      throw usageError(flag, 'is given more than once');
    if (spec.type === 'switch') {
      if (eq > 0) throw usageError(flag, 'is a switch and takes no value');
      out[name] = true;
      continue;
    }
    let text: string;
    if (eq > 0) text = token.slice(eq + 1);
    else {
      const next = args[i + 1];
      if (next === undefined || next.startsWith('--')) throw usageError(flag, 'needs a value');
      text = next;
      i++;
    }
    out[name] = readValue(flag, text, spec);
  }
  return out as ParsedFlags<S>;
}

/** Refuse two flags given together (exit status 2). */
export function refuseTogether(
  flags: Record<string, unknown>,
  a: string,
  b: string,
  why: string,
): void {
  if (flags[a] !== undefined && flags[b] !== undefined)
    throw usageError(`--${a}`, `cannot be combined with --${b}: ${why}`);
}
