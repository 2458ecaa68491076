// A small JSON reader (RFC 8259) that remembers where each value starts, so that a metadata
// problem can be reported at its line and column, not only by its JSON path. JSON.parse gives
// neither positions of values nor a portable position for syntax errors.

export type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };

/** 1-based line and column (UTF-16 code units, as editors count). */
export interface JsonPosition {
  line: number;
  column: number;
}

export interface ParsedJson {
  value: JsonValue;
  /** Start of every value, keyed by its JSON path (`$`, `$.tableSchema.columns[0].name`). */
  positions: Map<string, JsonPosition>;
}

/** A syntax error, with the position of the offending character. */
export class JsonSyntaxError extends Error {
  override name = 'JsonSyntaxError';
  constructor(message: string, readonly line: number, readonly column: number) {
    super(message);
  }
}

/** The JSON path of a member: `$.a`, or `$["a b"]` when the key is not a plain identifier. */
export function memberPath(parent: string, key: string): string {
  return /^[A-Za-z_$][\w$]*$/.test(key) ? `${parent}.${key}` : `${parent}[${JSON.stringify(key)}]`;
}

export function itemPath(parent: string, index: number): string {
  return `${parent}[${index}]`;
}

/**
 * Parses JSON text, recording the start of each value. Throws JsonSyntaxError.
 * Cost: one pass, O(length). Duplicate keys keep the last value, as JSON.parse does.
 * Example: parseJson('{"a": [1]}').positions.get('$.a[0]') gives { line: 1, column: 8 }.
 */
export function parseJson(text: string): ParsedJson {
  const positions = new Map<string, JsonPosition>();
  let i = 0;
  let line = 1;
  let lineStart = 0;
  // A byte order mark is not JSON, but editors write one; skip it.
  if (text.charCodeAt(0) === 0xfeff) {
    i = 1;
    lineStart = 1;
  }

  const fail = (what: string): never => {
    const found = i < text.length ? JSON.stringify(text[i]) : 'the end of the text';
    throw new JsonSyntaxError(`JSON: ${what}, got ${found} at line ${line}, column ${i - lineStart + 1}`, line, i - lineStart + 1);
  };
  const skipSpace = (): void => {
    for (;;) {
      const c = text[i];
      if (c === '\n') { i++; line++; lineStart = i; }
      else if (c === ' ' || c === '\t' || c === '\r') i++;
      else return;
    }
  };
  const here = (): JsonPosition => ({ line, column: i - lineStart + 1 });

  const readString = (): string => {
    i++; // opening quote
    let out = '';
    for (;;) {
      const c = text[i];
      if (c === undefined) fail('unterminated string');
      else if (c === '"') { i++; return out; }
      else if (c === '\\') {
        const e = text[i + 1];
        const simple: Record<string, string> = { '"': '"', '\\': '\\', '/': '/', b: '\b', f: '\f', n: '\n', r: '\r', t: '\t' };
        if (e !== undefined && simple[e] !== undefined) { out += simple[e]; i += 2; }
        else if (e === 'u' && /^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) {
          out += String.fromCharCode(parseInt(text.slice(i + 2, i + 6), 16));
          i += 6;
        } else { i++; fail('invalid escape in a string'); }
      } else if (c < ' ') fail('control character in a string (write it escaped)');
      else { out += c; i++; }
    }
  };

  const readNumber = (): number => {
    const m = /^-?(0|[1-9]\d*)(\.\d+)?([eE][+-]?\d+)?/.exec(text.slice(i, i + 400));
    if (!m) fail('expected a value');
    const s = (m as RegExpExecArray)[0];
    i += s.length;
    return Number(s);
  };

  const readValue = (path: string, depth: number): JsonValue => {
    if (depth > 200) fail('nesting deeper than 200 levels');
    skipSpace();
    positions.set(path, here());
    const c = text[i];
    if (c === '{') {
      i++;
      const obj: { [key: string]: JsonValue } = {};
      skipSpace();
      if (text[i] === '}') { i++; return obj; }
      for (;;) {
        skipSpace();
        if (text[i] !== '"') fail('expected a member name in double quotes');
        const key = readString();
        skipSpace();
        if (text[i] !== ':') fail(`expected ":" after the member name "${key}"`);
        i++;
        const v = readValue(memberPath(path, key), depth + 1);
        Object.defineProperty(obj, key, { value: v, enumerable: true, writable: true, configurable: true });
        skipSpace();
        if (text[i] === ',') { i++; continue; }
        if (text[i] === '}') { i++; return obj; }
        fail('expected "," or "}" in an object');
      }
    }
    if (c === '[') {
      i++;
      const arr: JsonValue[] = [];
      skipSpace();
      if (text[i] === ']') { i++; return arr; }
      for (;;) {
        arr.push(readValue(itemPath(path, arr.length), depth + 1));
        skipSpace();
        if (text[i] === ',') { i++; continue; }
        if (text[i] === ']') { i++; return arr; }
        fail('expected "," or "]" in an array');
      }
    }
    if (c === '"') return readString();
    if (text.startsWith('true', i)) { i += 4; return true; }
    if (text.startsWith('false', i)) { i += 5; return false; }
    if (text.startsWith('null', i)) { i += 4; return null; }
    return readNumber();
  };

  const value = readValue('$', 0);
  skipSpace();
  if (i < text.length) fail('unexpected text after the JSON value');
  return { value, positions };
}
