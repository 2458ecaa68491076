// A flag's numbers with the names its rule gives them ("upper fence 204.98", "modified z-score 29.96"),
// for hovers and lists. Pure.
import type { Flag } from '../profile/types';

type NumberKey = 'score' | 'threshold' | 'lower' | 'upper';

const NAMES: Readonly<Record<string, Partial<Record<NumberKey, string>>>> = {
  'tukey-fence': { lower: 'lower fence', upper: 'upper fence', threshold: 'k', score: 'IQRs beyond the quartile' },
  'modified-z': { score: 'modified z-score', threshold: 'cut-off |M|' },
  'z-score': { score: 'z-score', threshold: 'cut-off |z|' },
  grubbs: { score: 'G', threshold: 'critical value' },
  'generalized-esd': { score: 'R', threshold: 'critical value λ' },
  'near-constant': { score: 'share of the most common value', threshold: 'share above which a column is near-constant' },
};

const GENERIC: Record<NumberKey, string> = { lower: 'lower bound', upper: 'upper bound', threshold: 'threshold', score: 'score' };

/** Fences and bounds first, then the cut-off, then the score. */
const ORDER: readonly NumberKey[] = ['lower', 'upper', 'threshold', 'score'];

/**
 * The flag's numbers that are present, named for its rule, in a fixed order. Cost: O(1).
 * Example: ruleNumbers({ rule: 'tukey-fence', lower: 1, upper: 17, threshold: 1.5, score: 2, ... })
 * → [['lower fence', 1], ['upper fence', 17], ['k', 1.5], ['IQRs beyond the quartile', 2]].
 */
export function ruleNumbers(flag: Flag): [string, number][] {
  const names = Object.hasOwn(NAMES, flag.rule) ? NAMES[flag.rule] ?? {} : {};
  const out: [string, number][] = [];
  for (const k of ORDER) {
    const v = flag[k];
    if (typeof v === 'number' && Number.isFinite(v)) out.push([names[k] ?? GENERIC[k], v]);
  }
  return out;
}
