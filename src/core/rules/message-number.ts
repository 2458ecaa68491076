// Numbers in flag messages: the report's one number format (src/core/markdown/format-number.ts) at
// five significant digits, enough to tell a value from a fence near it ("1405 is above the upper
// fence 1272.1"), so that the same number reads the same in messages and tables.
import { formatNumber } from '../markdown/format-number';

export const MESSAGE_SIGNIFICANT_DIGITS = 5;

/**
 * Formats a number for a message. Example: messageNumber(1272.125) === "1272.1";
 * messageNumber(29.96269) === "29.963"; messageNumber(1405) === "1405".
 */
export function messageNumber(x: number): string {
  return formatNumber(x, MESSAGE_SIGNIFICANT_DIGITS);
}
