// Makes text that could hide, reorder or break a line visible, before any markup escaping.
// Shared by the Markdown and the HTML reports, so that a value reads the same in both.

/** Default longest value shown, in code points, before it is cut with an ellipsis. */
export const DEFAULT_MAX_TEXT_LENGTH = 200;

/** What a line break (CRLF, CR, LF, U+0085, U+2028, U+2029) is shown as: U+21B5. */
export const LINE_BREAK_MARK = '↵';

/** What a leading or trailing ASCII space is shown as, so that "a" and "a " stay apart: U+2420. */
export const EDGE_SPACE_MARK = '␠';

/** What ends a cut value: U+2026. */
export const ELLIPSIS = '…';

export interface RevealOptions {
  /** Longest text kept, in code points, before the ellipsis; default 200. Infinity keeps all. */
  maxLength?: number;
}

/**
 * True for code points that are invisible or change how nearby text is laid out: C0 and C1 controls
 * (tab included), DEL, bidirectional controls (U+200E/F, U+202A-U+202E, U+2066-U+2069, U+061C), zero-width
 * and invisible format characters (U+200B-U+200D, U+2060-U+2064, U+FEFF), spaces other than U+0020
 * (U+00A0, U+1680, U+2000-U+200A, U+202F, U+205F, U+3000), Unicode tag characters (U+E0000-U+E007F, which
 * can smuggle text past a reader) and unpaired surrogates. Line breaks are handled before this.
 */
function isHidden(cp: number): boolean {
  return cp < 0x20 || (cp >= 0x7f && cp <= 0x9f) || cp === 0xa0 || cp === 0x61c || cp === 0x1680
    || (cp >= 0x2000 && cp <= 0x200f) || (cp >= 0x202a && cp <= 0x202f) || (cp >= 0x205f && cp <= 0x2064)
    || (cp >= 0x2066 && cp <= 0x2069) || cp === 0x3000 || cp === 0xfeff
    || (cp >= 0xd800 && cp <= 0xdfff) || (cp >= 0xe0000 && cp <= 0xe007f);
}

/** `\u202E` for a BMP code point, `\u{E0041}` above it: the JavaScript spelling, readable as text. */
function escapeCodePoint(cp: number): string {
  const hex = cp.toString(16).toUpperCase();
  return cp > 0xffff ? `\\u{${hex}}` : `\\u${hex.padStart(4, '0')}`;
}

/**
 * Returns `text` with every line break as "↵", every hidden character (see above) as a visible
 * `\uXXXX` escape, leading and trailing ASCII spaces as "␠", and cut after `maxLength` code points
 * with "…" (the cut never splits a surrogate pair). The result has no markup escaping yet.
 *
 * Example: revealInvisibles(" a\r\nb\u202E") === "␠a↵b\\u202E".
 */
export function revealInvisibles(text: string, options: RevealOptions = {}): string {
  const maxLength = options.maxLength ?? DEFAULT_MAX_TEXT_LENGTH;
  if (!(maxLength >= 1)) throw new RangeError(`maxLength: expected a number of at least 1, got ${String(maxLength)}`);
  let source = text;
  let cut = false;
  if (source.length > maxLength) {
    // Code points, not UTF-16 units: a cut inside a pair would leave a lone surrogate. Only the
    // kept part is walked: a cell can be hundreds of MB, more than an array of its characters holds.
    let end = 0;
    for (let points = 0; end < source.length && points < maxLength; points++) {
      const c = source.charCodeAt(end);
      const low = source.charCodeAt(end + 1);
      end += c >= 0xd800 && c <= 0xdbff && low >= 0xdc00 && low <= 0xdfff ? 2 : 1;
    }
    if (end < source.length) {
      source = source.slice(0, end);
      cut = true;
    }
  }
  let out = '';
  for (let i = 0; i < source.length; i++) {
    const cp = source.codePointAt(i) ?? 0;
    if (cp > 0xffff) i++;
    if (cp === 0x0d) {
      if (source.charCodeAt(i + 1) === 0x0a) i++;
      out += LINE_BREAK_MARK;
    } else if (cp === 0x0a || cp === 0x85 || cp === 0x2028 || cp === 0x2029) {
      out += LINE_BREAK_MARK;
    } else if (isHidden(cp)) {
      out += escapeCodePoint(cp);
    } else {
      out += String.fromCodePoint(cp);
    }
  }
  out = out.replace(/^ +| +$/g, (spaces) => EDGE_SPACE_MARK.repeat(spaces.length));
  return cut ? out + ELLIPSIS : out;
}
