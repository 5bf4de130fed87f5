import { StrictJsonError } from './strict-json-error';

/**
 * The grammar walk behind the strict JSON reader (strict-json.ts): JSON as RFC 8259 defines it, read
 * once with an explicit stack, refusing too deep nesting, a key seen twice in one object and a
 * `__proto__` key. Anything the grammar does not allow ends the walk with JSON.parse's own message.
 */

const ACCEPTED_JSON = 'standard JSON (RFC 8259) in UTF-8, each key once per object';

type Frame =
  | { kind: 'object'; keys: Set<string>; key: string | null; path: string }
  | { kind: 'array'; index: number; path: string };

const join = (path: string, key: string | number) => (path === '' ? String(key) : `${path}.${key}`);

const NUMBER = /-?(?:0|[1-9][0-9]*)(?:\.[0-9]+)?(?:[eE][+-]?[0-9]+)?/y;

/** The platform's message for a text it cannot read, or ours when the scanner is stricter. */
function syntaxError(text: string, field: string, at: number): StrictJsonError {
  let reason = `unexpected input at character ${at + 1}`;
  try {
    JSON.parse(text);
  } catch (err) {
    if (err instanceof Error) reason = err.message;
  }
  return new StrictJsonError('syntax', field, '', `is not valid JSON: ${reason}`, ACCEPTED_JSON);
}

/** End index (after the closing quote) of the string starting at `i` (a '"'), or -1. */
function stringEnd(text: string, i: number): number {
  for (let j = i + 1; j < text.length; j++) {
    const c = text.charCodeAt(j);
    if (c === 0x22) return j + 1;
    if (c < 0x20) return -1;
    if (c === 0x5c) {
      const e = text[j + 1];
      if (e === 'u') {
        if (!/^[0-9a-fA-F]{4}$/.test(text.slice(j + 2, j + 6))) return -1;
        j += 5;
      } else if (e !== undefined && '"\\/bfnrt'.includes(e)) j++;
      else return -1;
    }
  }
  return -1;
}

/**
 * Walk the text once along the JSON grammar, with an explicit stack: refuse too deep nesting, a key
 * seen twice in one object and a `__proto__` key; anything the grammar does not allow ends the walk
 * with JSON.parse's own message.
 */
export function scanJson(text: string, maxDepth: number, field: string, pathPrefix = ''): void {
  new JsonScanner(text, maxDepth, field, pathPrefix).run();
}

type Expect = 'value' | 'value-or-close' | 'key' | 'key-or-close' | 'colon' | 'comma-or-close';

class JsonScanner {
  private readonly stack: Frame[] = [];
  private i = 0;
  private expect: Expect = 'value';
  private done = false;
  constructor(
    private readonly text: string,
    private readonly maxDepth: number,
    private readonly field: string,
    private readonly pathPrefix: string,
  ) {}

  run(): void {
    const { text } = this;
    for (;;) {
      this.skipWhitespace();
      if (this.done) {
        if (this.i < text.length) throw syntaxError(text, this.field, this.i);
        return;
      }
      if (this.i >= text.length) throw syntaxError(text, this.field, this.i);
      const ch = text[this.i]!;
      if (this.expect === 'value' || this.expect === 'value-or-close') this.value(ch);
      else if (this.expect === 'key' || this.expect === 'key-or-close') this.key(ch);
      else if (this.expect === 'colon') {
        if (ch !== ':') throw syntaxError(text, this.field, this.i);
        this.i++;
        this.expect = 'value';
      } else this.commaOrClose(ch);
    }
  }

  private skipWhitespace() {
    const { text } = this;
    while (this.i < text.length) {
      const c = text.charCodeAt(this.i);
      if (c === 0x20 || c === 0x09 || c === 0x0a || c === 0x0d) this.i++;
      else break;
    }
  }

  private valueDone() {
    if (this.stack.length === 0) this.done = true;
    else this.expect = 'comma-or-close';
  }

  private close() {
    this.stack.pop();
    this.i++;
    this.valueDone();
  }

  private childPath(): string {
    const top = this.stack[this.stack.length - 1];
    if (!top) return '';
    return top.kind === 'array' ? join(top.path, top.index) : join(top.path, top.key ?? '');
  }

  private value(ch: string) {
    const { text } = this;
    if (this.expect === 'value-or-close' && ch === ']') return this.close();
    if (ch === '{' || ch === '[') {
      const path = this.childPath();
      if (this.stack.length + 1 > this.maxDepth) {
        // Named as the whole input: the path down to this depth would be as long as the nesting.
        throw new StrictJsonError(
          'too-deep',
          this.field,
          path,
          `nested deeper than ${this.maxDepth} levels`,
          `JSON nested at most ${this.maxDepth} levels deep`,
        );
      }
      this.stack.push(
        ch === '{'
          ? { kind: 'object', keys: new Set(), key: null, path }
          : { kind: 'array', index: 0, path },
      );
      this.expect = ch === '{' ? 'key-or-close' : 'value-or-close';
      this.i++;
      return;
    }
    if (ch === '"') {
      const end = stringEnd(text, this.i);
      if (end < 0) throw syntaxError(text, this.field, this.i);
      this.i = end;
    } else if (text.startsWith('true', this.i)) this.i += 4;
    else if (text.startsWith('false', this.i)) this.i += 5;
    else if (text.startsWith('null', this.i)) this.i += 4;
    else {
      NUMBER.lastIndex = this.i;
      if (!NUMBER.test(text)) throw syntaxError(text, this.field, this.i);
      this.i = NUMBER.lastIndex;
    }
    this.valueDone();
  }

  private key(ch: string) {
    const { text } = this;
    const top = this.stack[this.stack.length - 1]!;
    if (this.expect === 'key-or-close' && ch === '}') return this.close();
    if (ch !== '"' || top.kind !== 'object') throw syntaxError(text, this.field, this.i);
    const end = stringEnd(text, this.i);
    if (end < 0) throw syntaxError(text, this.field, this.i);
    const raw = text.slice(this.i, end);
    const key = raw.includes('\\') ? (JSON.parse(raw) as string) : raw.slice(1, -1);
    const path = join(top.path, key);
    if (key === '__proto__') {
      throw new StrictJsonError(
        'forbidden-key',
        this.pathPrefix + path,
        path,
        'the key "__proto__" is not accepted',
        'keys other than __proto__',
      );
    }
    if (top.keys.has(key)) {
      throw new StrictJsonError(
        'duplicate-key',
        this.pathPrefix + path,
        path,
        `the key "${key.length > 60 ? `${key.slice(0, 60)}…` : key}" appears twice in one object`,
        'each key once per object',
      );
    }
    top.keys.add(key);
    top.key = key;
    this.i = end;
    this.expect = 'colon';
  }

  private commaOrClose(ch: string) {
    const top = this.stack[this.stack.length - 1]!;
    if (ch === ',') {
      this.i++;
      if (top.kind === 'array') {
        top.index++;
        this.expect = 'value';
      } else this.expect = 'key';
      return;
    }
    if ((ch === '}' && top.kind === 'object') || (ch === ']' && top.kind === 'array'))
      return this.close();
    throw syntaxError(this.text, this.field, this.i);
  }
}
