// Bin edges need as many digits as it takes to tell neighbours apart.
import { formatNumber } from './format-number';

/**
 * Formats bin edges with `significantDigits`, adding digits (up to 17) until no two neighbouring
 * edges read the same: at 4 digits, 100.01 and 100.02 would both be "100".
 *
 * Example: formatEdges([100.01, 100.02, 100.03], 4) yields ["100.01", "100.02", "100.03"].
 */
export function formatEdges(edges: readonly number[], significantDigits: number): string[] {
  for (let digits = significantDigits; ; digits++) {
    const out = edges.map((e) => formatNumber(e, digits));
    const clash = out.some((t, i) => i > 0 && t === out[i - 1] && edges[i] !== edges[i - 1]);
    if (!clash || digits >= 17) return out;
  }
}
