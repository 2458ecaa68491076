import { describe, expect, it } from 'vitest';
import { formatEdges } from '../../../../src/core/markdown/format-edges';

describe('formatEdges', () => {
  it('runs the doc comment example', () => {
    expect(formatEdges([100.01, 100.02, 100.03], 4)).toEqual(['100.01', '100.02', '100.03']);
  });

  it('keeps the asked digits when they suffice', () => {
    expect(formatEdges([0, 2.5, 5, 7.5], 4)).toEqual(['0', '2.5', '5', '7.5']);
    expect(formatEdges([], 4)).toEqual([]);
  });

  it('adds up to 17 digits, which tell any two doubles apart (IEEE 754: 17 significant digits round-trip)', () => {
    // 0.1 + 1e-17 is the next double above 0.1.
    expect(formatEdges([0.1, 0.1 + 1e-17], 4)).toEqual(['0.10000000000000001', '0.10000000000000002']);
    expect(formatEdges([1, 1], 4)).toEqual(['1', '1']);
  });
});
