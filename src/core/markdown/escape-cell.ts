// Text from the data file goes into Markdown only through these two functions. They follow the
// CommonMark rule that any ASCII punctuation may be backslash-escaped (CommonMark 0.31, section 2.4)
// and GitHub-flavoured Markdown's rule that `\|` is a literal pipe inside a table cell (GFM, 4.10).
import { revealInvisibles, type RevealOptions } from './reveal-invisibles';

export type EscapeOptions = RevealOptions;

/**
 * Characters escaped wherever they stand: `` ` `` (code spans), `*` (emphasis, also inside words),
 * `~` (strikethrough), `[` `]` (links and images), `|` (table cells), `$` (math on GitHub).
 */
const ALWAYS = new Set(['`', '*', '~', '[', ']', '|', '$']);

const ASCII_PUNCTUATION = /[!-/:-@[-`{-~]/;
const WORD = /[\p{L}\p{N}]/u;

/**
 * Escapes the characters that CommonMark reads as markup, and only where they can act, so that
 * ordinary text (`C:\data`, `snake_case`, `AT&T`, `x < 3`) stays readable in the source:
 * - `\` when an ASCII punctuation character follows, or at the end (it would escape what comes next);
 * - `_` unless it stands between two letters or digits (intraword `_` never opens emphasis, CommonMark 6.2);
 * - `&` when it starts an entity reference such as `&lt;` or `&#60;` (CommonMark 2.5);
 * - `<` unless a space follows or it ends the text (a tag, comment or autolink needs a non-space next);
 * - the characters in ALWAYS.
 */
function escapeMarkup(text: string): string {
  let out = '';
  for (let i = 0; i < text.length; i++) {
    const c = text.charAt(i);
    const next = text.charAt(i + 1);
    let escape = ALWAYS.has(c);
    if (c === '\\') escape = next === '' || ASCII_PUNCTUATION.test(next);
    else if (c === '_') escape = !(WORD.test(text.charAt(i - 1)) && WORD.test(next));
    else if (c === '&') escape = /^&(#[0-9]{1,7}|#[xX][0-9a-fA-F]{1,6}|[A-Za-z][A-Za-z0-9]{0,31});/.test(text.slice(i, i + 40));
    else if (c === '<') escape = next !== '' && next !== ' ';
    out += escape ? `\\${c}` : c;
  }
  return out;
}

/**
 * Makes `text` safe and readable as one GitHub-flavoured Markdown table cell.
 *
 * First the text is made visible (see `revealInvisibles`): line breaks (CRLF, CR, LF, U+2028, ...)
 * become "↵" (never `<br>`: no HTML is written), bidirectional controls, NUL and other controls become
 * `\u202E`-style escapes, leading/trailing spaces become "␠", and text longer than `maxLength` code
 * points (default 200) is cut with "…". Then Markdown is neutralised: markup characters are
 * backslash-escaped where they could act (see `escapeMarkup`), and a leading `#`, `=`, `>`, `-`/`+`
 * (unless a number follows) or an ordered-list start such as `1.` / `1)` is escaped so that the text
 * cannot start a block if it is ever placed at the start of a line.
 *
 * Rendered, the cell shows the original text (with the visible marks above); no tag, link, image,
 * emphasis or extra cell can come out of it. One exception is left to the reader's renderer: one that
 * links bare URLs (GitHub does, for http, https, ftp, mailto and www.) may still make a link of a URL
 * written in the data; no renderer links `javascript:`. Cost: O(length).
 *
 * Example: escapeCell("a|b <i>") === "a\\|b \\<i>".
 */
export function escapeCell(text: string, options: EscapeOptions = {}): string {
  return escapeMarkup(revealInvisibles(text, options))
    .replace(/^(#|=|>|[-+](?![\d.]))/, '\\$1')
    .replace(/^(\d{1,9})([.)])(?=[\s↵]|$)/u, '$1\\$2');
}

/**
 * The same escaping for text in prose (headings, captions, paragraphs, list items): Markdown reads
 * the same characters as markup there, so the rules are identical; a separate name keeps the call
 * sites honest about where the text goes.
 *
 * Example: escapeInline("# not a heading") === "\\# not a heading".
 */
export function escapeInline(text: string, options: EscapeOptions = {}): string {
  return escapeCell(text, options);
}
