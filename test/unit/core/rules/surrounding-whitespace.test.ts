// Leading/trailing white space, as String.prototype.trim defines it (ECMAScript: WhiteSpace and LineTerminator).
import { describe, expect, it } from 'vitest';
import { surroundingWhitespace } from '../../../../src/core/rules/surrounding-whitespace';

describe('surroundingWhitespace', () => {
  it('runs the doc comment example', () => {
    const cells = Object.freeze([' a', 'b', 'c\t ']);
    const r = surroundingWhitespace(cells);
    expect(r.hits.map((h) => [h.index, h.fix, h.severity])).toEqual([[0, 'a', 'hint'], [2, 'c', 'hint']]);
    expect(r.hits[1]?.message).toBe('"c\\t " has 2 trailing white-space characters; trimmed it reads "c" — a candidate for review');
    expect(r.hits[0]?.message).toBe('" a" has 1 leading white-space character; trimmed it reads "a" — a candidate for review');
  });

  it('counts both ends, sees no-break spaces, and leaves blank cells to the missing rules', () => {
    const r = surroundingWhitespace(['\u00a0x ', '   ', '', 'y']);
    expect(r.total).toBe(1);
    expect(r.hits[0]?.message).toContain('has 1 leading white-space character and 1 trailing white-space character');
  });

  it('caps hits and counts all', () => {
    const r = surroundingWhitespace(Array.from({ length: 10 }, () => ' z'), { maxFlags: 2 });
    expect([r.hits.length, r.total]).toEqual([2, 10]);
  });
});
