// The rules' shared pieces: the hit list, message numbers, the severity mapping, and hits to Flags.
import { describe, expect, it } from 'vitest';
import { ALL_RULES } from '../../../../src/core/options';
import { hitList } from '../../../../src/core/rules/hit-list';
import { messageNumber } from '../../../../src/core/rules/message-number';
import { RULE_SEVERITY, severityOf } from '../../../../src/core/rules/severity';
import { toFlag } from '../../../../src/core/rules/to-flag';
import type { RuleHit } from '../../../../src/core/rules/types';

const hit = (index: number): RuleHit => ({ index, value: index, severity: 'information', message: 'm' });

describe('hitList', () => {
  it('runs the doc comment example', () => {
    const list = hitList('z-score', 1);
    const a = hit(0);
    list.push(a);
    list.push(hit(1));
    expect(list.result()).toEqual({ rule: 'z-score', hits: [a], total: 2, skipped: null });
  });

  it('says when it is full, and counts hits it would not keep', () => {
    const list = hitList('z-score', 1);
    expect(list.full).toBe(false);
    list.push(hit(0));
    expect(list.full).toBe(true);
    list.count();
    list.count();
    expect(list.result()).toEqual({ rule: 'z-score', hits: [hit(0)], total: 3, skipped: null });
  });
});

describe('messageNumber', () => {
  it('runs the doc comment examples', () => {
    expect(messageNumber(1272.125)).toBe('1272.1');
    expect(messageNumber(29.96269)).toBe('29.963');
    expect(messageNumber(1405)).toBe('1405');
  });
});

describe('severity', () => {
  it('maps every rule, never to error, and raises far outliers above ordinary ones', () => {
    expect(Object.keys(RULE_SEVERITY).sort()).toEqual([...ALL_RULES].sort());
    expect(Object.values(RULE_SEVERITY)).not.toContain('error');
    expect(severityOf('tukey-fence')).toBe('information');
    expect(severityOf('tukey-fence', true)).toBe('warning');
    expect(severityOf('constraint')).toBe('warning');
    expect(severityOf('surrounding-whitespace')).toBe('hint');
  });
});

describe('toFlag', () => {
  it('runs the doc comment example, leaving out absent and non-finite numbers', () => {
    const f = toFlag('z-score', { index: 4, value: 9, severity: 'information', message: 'm', score: 3.2, threshold: Infinity }, { row: 5, line: 6, column: 'x', field: 0, value: '9' });
    expect(f).toEqual({ row: 5, line: 6, column: 'x', field: 0, value: '9', rule: 'z-score', severity: 'information', message: 'm', score: 3.2 });
    expect(JSON.parse(JSON.stringify(f))).toEqual(f);
  });

  it('carries a fix', () => {
    expect(toFlag('surrounding-whitespace', { ...hit(0), fix: 'a' }, { row: 1, line: 2, column: 'c', field: 1, value: ' a' }).fix).toBe('a');
  });
});
