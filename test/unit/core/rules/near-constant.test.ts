// Near-constant columns (common practice; cf. the near-zero-variance screen): one value holds ≥ 99% of cells.
import { describe, expect, it } from 'vitest';
import { nearConstant } from '../../../../src/core/rules/near-constant';

describe('nearConstant', () => {
  it('runs the doc comment example: 199 × "ok" and one "OK?"', () => {
    const cells = [...Array<string>(120).fill('ok'), 'OK?', ...Array<string>(79).fill('ok')];
    const r = nearConstant(Object.freeze(cells));
    expect(r.dominant).toEqual({ value: 'ok', count: 199, share: 0.995 });
    expect(r.hits.map((h) => [h.index, h.severity])).toEqual([[120, 'hint']]);
    expect(r.hits[0]?.message).toBe('"OK?" is the only cell that differs from "ok", which holds 99.5% of the 200 non-missing cells (near-constant at 99%) — a candidate for review');
  });

  it('does not flag a column below the share, and ignores missing cells in the share', () => {
    const below = [...Array<string>(98).fill('a'), 'b', 'c'];
    expect(nearConstant(below).dominant).toBeNull();
    const withMissing = [...Array<string>(99).fill('a'), 'b', ...Array<string>(50).fill('')];
    expect(nearConstant(withMissing).dominant?.share).toBe(0.99);
  });

  it('reports a constant column without hits, and needs two values', () => {
    expect(nearConstant(['x', 'x', 'x'])).toMatchObject({ dominant: { value: 'x', count: 3, share: 1 }, total: 0 });
    expect(nearConstant(['x']).skipped).toBe('needs at least two values');
  });
});
