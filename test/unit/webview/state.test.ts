import { describe, expect, it } from 'vitest';
import { readState } from '../../../webview/state';

describe('restoring the panel state', () => {
  it('falls back to an empty state for anything that is not a saved state', () => {
    for (const saved of [undefined, null, 42, 'x', [1, 2]]) {
      expect(readState(saved)).toEqual({ uri: null, column: null, bins: {}, groupBy: {}, view: 'counts' });
    }
  });

  it('keeps valid entries and drops malformed ones', () => {
    const s = readState({
      uri: 'file:///a.csv', column: 'price', view: 'cumulative',
      bins: { price: { rule: 'sturges' }, weight: { rule: 'count', count: 12 }, bad: { rule: 'count', count: 0 }, worse: { rule: 'eval' }, width: { rule: 'width', width: -1 } },
      groupBy: { price: 'region', odd: 3 },
    });
    expect(s.uri).toBe('file:///a.csv');
    expect(s.column).toBe('price');
    expect(s.view).toBe('cumulative');
    expect({ ...s.bins }).toEqual({ price: { rule: 'sturges' }, weight: { rule: 'count', count: 12 } });
    expect({ ...s.groupBy }).toEqual({ price: 'region' });
  });

  it('treats a column called __proto__ as a plain key', () => {
    const s = readState(JSON.parse('{"bins":{"__proto__":{"rule":"fd"}},"groupBy":{"__proto__":"x"}}'));
    expect(Object.keys(s.bins)).toEqual(['__proto__']);
    expect(s.groupBy['__proto__']).toBe('x');
    expect(({} as Record<string, unknown>).rule).toBeUndefined();
  });
});
