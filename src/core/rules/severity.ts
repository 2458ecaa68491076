// How strongly each rule's findings are shown. Every flag is a candidate for review, never an error,
// so no rule uses `error`. The order: a far outlier, a broken declared constraint or a ragged row
// or a cell that does not fit its column's type (warning) ranks above an ordinary outlier (information), which ranks above
// tidiness findings such as stray spaces or spelling variants (hint).
import type { RuleId } from '../options';
import type { Severity } from '../profile/types';

export const RULE_SEVERITY: Readonly<Record<RuleId, Severity>> = Object.freeze({
  'tukey-fence': 'information',
  'modified-z': 'information',
  'z-score': 'information',
  grubbs: 'information',
  'generalized-esd': 'information',
  'not-a-number': 'warning',
  'not-a-date': 'warning',
  'impossible-date': 'warning',
  'not-a-boolean': 'warning',
  'out-of-domain': 'information',
  'duplicate-key': 'information',
  'duplicate-record': 'information',
  constraint: 'warning',
  'ragged-row': 'warning',
  'mixed-missing-tokens': 'hint',
  'surrounding-whitespace': 'hint',
  'category-variant': 'hint',
  'near-constant': 'hint',
});

/** A far outlier (beyond Tukey's far fences) is raised one step, to warning. */
export const FAR_SEVERITY: Severity = 'warning';

/** Example: severityOf('tukey-fence') === 'information'; severityOf('tukey-fence', true) === 'warning'. */
export function severityOf(rule: RuleId, far = false): Severity {
  return far ? FAR_SEVERITY : RULE_SEVERITY[rule];
}
