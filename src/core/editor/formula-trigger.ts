// The one place Assay writes CSV is a quick fix the user applies to a cell. A spreadsheet that opens
// the file evaluates a cell starting with `=`, `+`, `-`, `@` (and, in some, tab or CR) as a formula
// (OWASP, "CSV Injection"), so a fix must never turn a cell that did not start that way into one that does.

const TRIGGER = /^[=+\-@\t\r]/;
/** Plain decimal numbers, which every spreadsheet reads as themselves: -3, +4.5, -1e3, -0,5. */
const PLAIN_NUMBER = /^[-+]?(\d+([.,]\d*)?|[.,]\d+)([eE][-+]?\d+)?$/;

/**
 * True when a spreadsheet may evaluate `value` as a formula: it starts with `=`, `+`, `-`, `@`, tab or
 * CR and is not a plain number. A lone `-` (a common missing-value token) is exempt too: alone it is
 * no formula. Cost O(length).
 * Example: startsLikeFormula('=HYPERLINK("x")') === true; startsLikeFormula('-3.5') === false.
 */
export function startsLikeFormula(value: string): boolean {
  return TRIGGER.test(value) && value !== '-' && !PLAIN_NUMBER.test(value);
}
