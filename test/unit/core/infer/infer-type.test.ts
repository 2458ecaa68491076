import { describe, expect, it } from 'vitest';
import { KIND_DECIMAL, KIND_INTEGER, KIND_TEXT } from '../../../../src/core/infer/classify-cell';
import { inferType, type KindCounts } from '../../../../src/core/infer/infer-type';

const counts = (c: Partial<KindCounts>): KindCounts => ({ integer: 0, decimal: 0, boolean: 0, date: 0, datetime: 0, slash: 0, text: 0, impossible: 0, ...c });
const none = { dayFirst: 0, monthFirst: 0 };

// The majority rule is our own convention (documented in infer-type.ts); the day/month evidence
// rule (a part above 12 decides) is common practice.
describe('inferType', () => {
  it('takes the family that holds more than half of the non-missing cells', () => {
    expect(inferType(counts({ integer: 95, text: 1 }), null, none).type).toBe('integer');
    expect(inferType(counts({ integer: 50, decimal: 40, text: 3 }), null, none).type).toBe('decimal');
    expect(inferType(counts({ integer: 4, text: 6 }), null, none).type).toBe('text');
    expect(inferType(counts({ boolean: 9, text: 1 }), null, none).type).toBe('boolean');
    expect(inferType(counts({ date: 7, datetime: 1 }), null, none).type).toBe('datetime');
  });
  it('marks the other cells as not fitting', () => {
    const d = inferType(counts({ integer: 95, text: 1 }), null, none);
    expect(d.fits(KIND_INTEGER)).toBe(true);
    expect(d.fits(KIND_TEXT)).toBe(false);
    expect(d.fits(KIND_DECIMAL)).toBe(false);
    expect(d.reason).toContain('95 of 96');
  });
  it('reads numeric dates only when one order fits better', () => {
    expect(inferType(counts({ slash: 10 }), null, { dayFirst: 10, monthFirst: 6 }).slashOrder).toBe('day-first');
    expect(inferType(counts({ slash: 10 }), null, { dayFirst: 4, monthFirst: 10 }).slashOrder).toBe('month-first');
    const tie = inferType(counts({ slash: 10 }), null, { dayFirst: 10, monthFirst: 10 });
    expect(tie.type).toBe('text');
    expect(tie.reason).toContain('day-first and month-first');
  });
  it('lets a declared type win', () => {
    expect(inferType(counts({ text: 10 }), 'integer', none).type).toBe('integer');
  });
});
