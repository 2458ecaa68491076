// "Model for Tabular Data" §4.5 (W3C Recommendation 2015): no two rows may share a primary key.
import { describe, expect, it } from 'vitest';
import { primaryKeyTracker } from '../../../../src/core/csvw/primary-key-tracker';

describe('primaryKeyTracker', () => {
  it('runs the doc comment example', () => {
    const t = primaryKeyTracker([0]);
    expect(t.add(1, ['x'])).toBeNull();
    expect(t.add(2, ['x'])).toBe(1);
  });

  it('compares whole combinations of cells, without joining ambiguities', () => {
    const t = primaryKeyTracker([0, 1]);
    expect(t.add(1, ['a,b', 'c'])).toBeNull();
    expect(t.add(2, ['a', 'b,c'])).toBeNull();
    expect(t.add(3, ['foo', 'bar'])).toBeNull();
    expect(t.add(4, ['foo', 'baz'])).toBeNull();
    expect(t.add(5, ['foo', 'bar'])).toBe(3);
  });

  it('never reports without key fields', () => {
    const t = primaryKeyTracker([]);
    t.add(1, ['a']);
    expect(t.add(2, ['a'])).toBeNull();
  });
});
