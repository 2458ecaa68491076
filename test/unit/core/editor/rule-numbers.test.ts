// A flag's numbers named by its rule, in a fixed order.
import { describe, expect, it } from 'vitest';
import type { Flag } from '../../../../src/core/profile/types';
import { ruleNumbers } from '../../../../src/core/editor/rule-numbers';

const base: Flag = { row: 1, line: 2, column: 'x', field: 0, value: '1', rule: 'tukey-fence', severity: 'information', message: 'm' };

describe('ruleNumbers', () => {
  it('runs the doc comment example', () => {
    expect(ruleNumbers({ ...base, lower: 1, upper: 17, threshold: 1.5, score: 2 })).toEqual([
      ['lower fence', 1], ['upper fence', 17], ['k', 1.5], ['IQRs beyond the quartile', 2],
    ]);
  });

  it('names the modified z-score and its cut-off, and uses plain names for other rules', () => {
    expect(ruleNumbers({ ...base, rule: 'modified-z', score: 29.9627, threshold: 3.5 })).toEqual([['cut-off |M|', 3.5], ['modified z-score', 29.9627]]);
    expect(ruleNumbers({ ...base, rule: 'constraint', lower: 0, upper: 10 })).toEqual([['lower bound', 0], ['upper bound', 10]]);
    expect(ruleNumbers({ ...base, rule: 'toString', score: 1 })).toEqual([['score', 1]]);
    expect(ruleNumbers(base)).toEqual([]);
  });
});
