// Repeated values in a key-like column (common practice; primary keys: "Model for Tabular Data" §4.5).
import { describe, expect, it } from 'vitest';
import { duplicateKey, looksLikeKeyName } from '../../../../src/core/rules/duplicate-key';

describe('looksLikeKeyName', () => {
  it('runs the doc comment examples', () => {
    for (const n of ['id', 'batchID', 'order_code', 'Customer Key', 'ID', 'sku', 'uuid']) expect(looksLikeKeyName(n), n).toBe(true);
    for (const n of ['paid', 'idle_time', 'width', 'decode', 'keyboard']) expect(looksLikeKeyName(n), n).toBe(false);
  });
});

describe('duplicateKey', () => {
  it('runs the doc comment example: 1..100 and 7 again', () => {
    const cells = Object.freeze([...Array.from({ length: 100 }, (_, i) => String(i + 1)), '7']);
    const r = duplicateKey(cells, { name: 'id' });
    expect(r.hits.map((h) => [h.index, h.value, h.severity])).toEqual([[100, '7', 'information']]);
    expect(r.hits[0]?.message).toBe('"7" repeats the value of row 7 in "id", which looks like a key (it is named like a key and 99.01% of its values are distinct) — a candidate for review');
  });

  it('flags every repeat, naming the first row each time', () => {
    const r = duplicateKey(['a', 'b', 'a', 'a'], { name: 'x', declared: true });
    expect(r.hits.map((h) => h.message.match(/row \d+/)?.[0])).toEqual(['row 1', 'row 1']);
  });

  it('needs a key-like name and nearly all values distinct, unless declared', () => {
    const cells = [...Array.from({ length: 19 }, (_, i) => `k${i}`), 'k0'];
    expect(duplicateKey(cells, { name: 'value' }).skipped).toBe('the column is not named like a key and is not declared one');
    expect(duplicateKey(cells, { name: 'code' }).total).toBe(1); // 19 of 20 distinct: 95%
    expect(duplicateKey([...cells, 'k1'], { name: 'code' }).skipped).toBe('only 90.476% of values are distinct, below 95%');
    expect(duplicateKey([...cells, 'k1'], { name: 'value', declared: true }).total).toBe(2);
  });

  it('skips missing cells', () => {
    expect(duplicateKey(['', 'a', '', 'b'], { name: 'id' }).total).toBe(0);
  });
});
