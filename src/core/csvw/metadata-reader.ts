// The shared state of one metadata parse: where each JSON value sits, and the problems found.
// Every message starts with the value's path, then says what was wrong: `<what>: <problem>, got <value>`.
import { checkCommonProperty } from './check-common-property';
import type { JsonPosition, JsonValue } from './parse-json';
import type { MetadataError } from './types';

export type JsonObject = { [key: string]: JsonValue };

export const isObject = (v: JsonValue | undefined): v is JsonObject => typeof v === 'object' && v !== null && !Array.isArray(v);

/** `$.tableSchema.columns[0]` is shown as `tableSchema.columns[0]`, `$["rdf:value"]` as `rdf:value`; the root as `the metadata document`. */
export function displayPath(path: string): string {
  if (path === '$') return 'the metadata document';
  return path.replace(/\[("(?:[^"\\]|\\.)*")\]/g, (_, key: string) => `.${JSON.parse(key) as string}`).replace(/^\$\.?/, '');
}

/** A short JSON rendering of a value for messages. */
export function shown(v: JsonValue | undefined): string {
  const s = v === undefined ? 'nothing' : JSON.stringify(v);
  return s.length > 60 ? `${s.slice(0, 57)}...` : s;
}

export class MetadataReader {
  readonly errors: MetadataError[] = [];
  constructor(private readonly positions: Map<string, JsonPosition>) {}

  /** Where the value at `path` starts in the metadata text, when known. */
  at(path: string): { line: number | null; column: number | null } {
    const p = this.positions.get(path);
    return { line: p?.line ?? null, column: p?.column ?? null };
  }

  private add(path: string, message: string, severity: 'error' | 'warning'): void {
    const at = this.positions.get(path) ?? null;
    this.errors.push({ path, line: at?.line ?? null, column: at?.column ?? null, severity, message: `${displayPath(path)}: ${message}` });
  }

  error(path: string, message: string): void {
    this.add(path, message, 'error');
  }

  warning(path: string, message: string): void {
    this.add(path, message, 'warning');
  }

  /**
   * Handles a member that the object's own reader does not know: prefixed names and absolute URLs are
   * common properties (checked, then ignored); other `@` keywords are errors; anything else is ignored
   * with a warning, as the standard says (§5.8, §4).
   */
  other(path: string, key: string, value: JsonValue): void {
    if (key === '@id') {
      if (typeof value !== 'string') this.error(path, `expected a string, got ${shown(value)}`);
      else if (value.startsWith('_:')) this.error(path, `must not be a blank node, got "${value}"`);
    } else if (key.startsWith('@')) this.error(path, 'not a keyword allowed here');
    else if (key.includes(':')) checkCommonProperty(value, path, (p, m) => this.error(p, m));
    else this.warning(path, 'not a property of the CSV on the Web vocabulary here; ignored');
  }

  /** Checks an `@type` member against the one class the object must be. */
  type(path: string, value: JsonValue | undefined, expected: string): void {
    if (value !== undefined && value !== expected) this.error(path, `expected "${expected}", got ${shown(value)}`);
  }
}
