// Triggers from OWASP "CSV Injection" (cells beginning with =, +, -, @, tab, carriage return);
// the payload examples are the classic ones from that page, from memory.
import { describe, expect, it } from 'vitest';
import { startsLikeFormula } from '../../../../src/core/editor/formula-trigger';

describe('startsLikeFormula', () => {
  it('runs the doc-comment examples', () => {
    expect(startsLikeFormula('=HYPERLINK("x")')).toBe(true);
    expect(startsLikeFormula('-3.5')).toBe(false);
  });
  it.each(['=1+1', '+1+1', '-2+3+cmd|\' /C calc\'!A0', '@SUM(A1:A2)', '\t=1', '\r=1', '=', '@', '+', '-x', '+-1'])('%j may be evaluated', (v) => {
    expect(startsLikeFormula(v)).toBe(true);
  });
  it.each(['', 'plain', ' =1', '1=1', '-', '-3', '+4', '-0,5', '+1e3', '.5', 'a@b', 'x-y'])('%j is read as itself', (v) => {
    expect(startsLikeFormula(v)).toBe(false);
  });
});
