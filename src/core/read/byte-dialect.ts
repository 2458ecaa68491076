// The byte-level form of a dialect that the scanner, cell spans and range splitting share.
// Only single-byte ASCII characters can be matched without decoding, so that is what we accept.

/** Delimiter and quote as byte codes. `quote` is -1 for "no quoting" (every quote byte is literal). */
export interface ByteDialect {
  delimiter: number;
  quote: number;
}

const LF = 0x0a;
const CR = 0x0d;

/**
 * Turns a text dialect into byte codes, checking that the scanner can use it.
 * Throws `Error` with a one-line message for a character it cannot match byte by byte.
 * Example: `byteDialect({ delimiter: ';', quote: '"' })` gives `{ delimiter: 59, quote: 34 }`.
 */
export function byteDialect(d: { delimiter: string; quote: string | null }): ByteDialect {
  const delimiter = codeOf('delimiter', d.delimiter);
  const quote = d.quote === null || d.quote === '' ? -1 : codeOf('quote', d.quote);
  if (delimiter === quote) throw new Error(`dialect: the delimiter and the quote must differ, got "${d.delimiter}" for both`);
  return { delimiter, quote };
}

function codeOf(what: string, ch: string): number {
  const problem = dialectCharProblem(what, ch);
  if (problem !== null) throw new Error(problem);
  return ch.charCodeAt(0);
}

/**
 * Why `ch` cannot be the delimiter or quote (`what` names which), or null when it can: the scanner
 * matches one ASCII byte other than CR and LF. Lets option and metadata readers refuse such a
 * character with a clear message before a job starts.
 * Example: `dialectCharProblem('delimiter', 'é')` gives `delimiter: expected one ASCII character, got "é"`.
 */
export function dialectCharProblem(what: string, ch: string): string | null {
  const c = ch.length === 1 ? ch.charCodeAt(0) : -1;
  if (c < 0 || c > 0x7f) return `${what}: expected one ASCII character, got "${ch}"`;
  if (c === LF || c === CR) return `${what}: a line break cannot be used, got ${JSON.stringify(ch)}`;
  return null;
}

/** Checks byte codes given directly (as the scanner's constructor receives them). */
export function checkByteDialect(d: ByteDialect): void {
  if (!Number.isInteger(d.delimiter) || d.delimiter < 0 || d.delimiter > 0x7f || d.delimiter === LF || d.delimiter === CR) {
    throw new Error(`delimiter: expected an ASCII byte code other than CR or LF, got ${d.delimiter}`);
  }
  if (!Number.isInteger(d.quote) || d.quote < -1 || d.quote > 0x7f || d.quote === LF || d.quote === CR) {
    throw new Error(`quote: expected an ASCII byte code other than CR or LF, or -1, got ${d.quote}`);
  }
  if (d.quote === d.delimiter) throw new Error(`dialect: the delimiter and the quote must differ, got ${d.delimiter} for both`);
}
