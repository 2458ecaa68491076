import fc from 'fast-check';
import { sampleKurtosis, sampleSkewness, sampleVariance } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { compensatedSum } from '../../../../src/core/stats/compensated-sum';
import { meanAndSd } from '../../../../src/core/stats/mean-and-sd';
import { Moments } from '../../../../src/core/stats/moments';
import { jStat } from './jstat-oracle';
import { CERTIFIED, strd } from './strd';

const rel = (a: number, b: number): number => (a === b ? 0 : Math.abs(a - b) / Math.abs(b));

describe('Moments', () => {
  it('runs its doc example', () => {
    const x = Object.freeze([2, 4, 4, 4, 5, 5, 7, 9]);
    const m = Moments.of(x);
    expect(m.mean).toBe(5);
    expect(m.sd).toBeCloseTo(2.138089935299395, 15);
    expect(m.variance).toBeCloseTo(32 / 7, 15);
    // simple-statistics 7.12: sampleSkewness is G1, sampleKurtosis is G2 (same as Excel SKEW / KURT).
    expect(m.skewness).toBeCloseTo(sampleSkewness([...x]), 14);
    expect(m.skewness).toBeCloseTo(0.8184875533568, 12);
    expect(m.kurtosis).toBeCloseTo(sampleKurtosis([...x]), 14);
    expect(m.kurtosis).toBeCloseTo(0.940625, 12);
  });

  describe('meets the NIST StRD certified mean and SD at GNU GSL test tolerances (one pass)', () => {
    for (const c of CERTIFIED) {
      it(c.name, () => {
        const data = strd(c.name);
        expect(data.length).toBe(c.n);
        const m = Moments.of(data);
        expect(m.n).toBe(c.n);
        expect(rel(m.mean, c.mean), 'mean').toBeLessThanOrEqual(c.meanTol);
        expect(rel(m.sd as number, c.sd), 'sd').toBeLessThanOrEqual(c.sdTol);
      });
    }
  });

  describe('Moments.centred (two passes about a given mean) meets the same NIST StRD certified values', () => {
    for (const c of CERTIFIED) {
      it(c.name, () => {
        const data = strd(c.name);
        const m = Moments.centred(data, compensatedSum(data));
        // The SD is meanAndSd's, to the bit.
        expect(m.sd).toBe(meanAndSd(data).sd);
        expect(m.n).toBe(c.n);
        expect(rel(m.mean, c.mean), 'mean').toBeLessThanOrEqual(c.meanTol);
        expect(rel(m.sd as number, c.sd), 'sd').toBeLessThanOrEqual(c.sdTol);
      });
    }
  });

  it('Moments.centred agrees with simple-statistics on random data, whatever mean it is given (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 4, maxLength: 60 }), fc.double({ min: -1, max: 1, noNaN: true }), (x, shift) => {
        // A first pass whose mean is off by up to 1 still gives the sample's own moments (the δ corrections).
        const first = compensatedSum(x);
        const m = Moments.centred(x, { ...first, compensation: first.compensation + shift * x.length });
        const v = sampleVariance(x);
        if (!(v > 1e-6)) return;
        expect(rel(m.variance as number, v)).toBeLessThan(1e-9);
        expect(Math.abs((m.skewness as number) - sampleSkewness(x))).toBeLessThan(1e-7);
        expect(Math.abs((m.kurtosis as number) - sampleKurtosis(x))).toBeLessThan(1e-7);
        expect(m.min).toBe(Math.min(...x));
        expect(m.max).toBe(Math.max(...x));
      }),
      { numRuns: 200 },
    );
    const doc = [2, 4, 4, 4, 5, 5, 7, 9];
    expect(Moments.centred(doc, compensatedSum(doc)).sd).toBeCloseTo(2.138089935299395, 15);
    expect(Moments.centred([NaN], compensatedSum([NaN])).n).toBe(0);
  });

  it('gives the Anscombe (1973) quartet summary: mean x = 9, var x = 11, mean y = 7.50', async () => {
    const { readFileSync } = await import('node:fs');
    const rows = readFileSync(new URL('../../../fixtures/stats/handbook/anscombe.csv', import.meta.url), 'utf8')
      .split(/\r?\n/).filter((l) => l && !l.startsWith('#')).slice(1).map((l) => l.split(','));
    for (const set of ['I', 'II', 'III', 'IV']) {
      const part = rows.filter((r) => r[0] === set);
      const x = Moments.of(part.map((r) => Number(r[1])));
      const y = Moments.of(part.map((r) => Number(r[2])));
      expect(x.mean).toBeCloseTo(9, 12);
      expect(x.variance).toBeCloseTo(11, 12);
      expect(y.mean.toFixed(2)).toBe('7.50');
    }
  });

  it('agrees with simple-statistics and jstat on random data', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 4, maxLength: 60 }), (x) => {
        const m = Moments.of(x);
        const v = sampleVariance(x);
        if (!(v > 1e-9)) return;
        expect(rel(m.variance as number, v)).toBeLessThan(1e-10);
        expect(Math.abs((m.skewness as number) - sampleSkewness(x))).toBeLessThan(1e-8);
        expect(Math.abs((m.kurtosis as number) - sampleKurtosis(x))).toBeLessThan(1e-8);
        // jstat's skewness is the biased g1 (population SD): G1 = √(n(n−1))/(n−2) · g1.
        const n = x.length;
        expect(Math.abs((m.skewness as number) - (Math.sqrt(n * (n - 1)) / (n - 2)) * jStat.skewness(x))).toBeLessThan(1e-8);
      }),
      { numRuns: 200 },
    );
  });

  it('merging the moments of two parts equals one pass (~1e-12 relative), fast-check', () => {
    fc.assert(
      fc.property(
        // Magnitudes below 1e-50 are left out: fourth powers of their spread would underflow.
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }).filter((v) => v === 0 || Math.abs(v) > 1e-50), { minLength: 2, maxLength: 200 }),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.nat(),
        (x, offset, cut) => {
          const data = x.map((v) => v + offset);
          const k = cut % (data.length + 1);
          const one = Moments.of(data);
          const merged = Moments.merge(Moments.of(data.slice(0, k)), Moments.of(data.slice(k)));
          expect(merged.n).toBe(one.n);
          expect(merged.min).toBe(one.min);
          expect(merged.max).toBe(one.max);
          const scale = Math.max(...data.map(Math.abs), 1e-300);
          expect(Math.abs(merged.mean - one.mean) / scale).toBeLessThan(1e-12);
          expect(Math.abs(merged.total - one.total) / (scale * data.length)).toBeLessThan(1e-12);
          if (!(one.m2 > 1e-6 * scale * scale)) return; // nearly constant data: moments are rounding noise
          const sd = Math.sqrt(one.m2 / one.n);
          // Both sides round the deviations from a mean of size `scale`: their relative error grows
          // as (scale / sd)^2 (Chan, Golub & LeVeque 1983, condition number of the variance).
          const tol = 1e-12 * Math.max(1, (scale / sd) ** 2);
          expect(rel(merged.m2, one.m2)).toBeLessThan(tol);
          expect(Math.abs(merged.m3 - one.m3) / (one.n * sd ** 3)).toBeLessThan(tol);
          expect(Math.abs(merged.m4 - one.m4) / (one.n * sd ** 4)).toBeLessThan(tol);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('merges many chunks of a NIST set to the certified values', () => {
    const data = strd('NumAcc4');
    let acc = new Moments();
    for (let i = 0; i < data.length; i += 37) acc = Moments.merge(acc, Moments.of(data.slice(i, i + 37)));
    expect(rel(acc.mean, 10000000.2)).toBeLessThanOrEqual(1e-15);
    expect(rel(acc.sd as number, 0.1)).toBeLessThanOrEqual(1e-7);
  });

  it('survives JSON and keeps merging', () => {
    const a = Moments.of([1, 2, 3.5]);
    const state = JSON.parse(JSON.stringify(a)) as ReturnType<Moments['toJSON']>;
    expect(state).toEqual(a.toJSON());
    const b = Moments.fromJSON(state);
    b.push(10);
    expect(b.toJSON()).toEqual(Moments.of([1, 2, 3.5, 10]).toJSON());
    expect(JSON.stringify(new Moments())).toBe('{"n":0,"mean":0,"m2":0,"m3":0,"m4":0,"min":null,"max":null,"sum":0,"compensation":0}');
  });

  it('skips NaN and does not modify its inputs', () => {
    const x = Object.freeze([3, NaN, 5, NaN, 10]);
    const a = Object.freeze(Moments.of([1, 2]).toJSON());
    const b = Object.freeze(Moments.of([7]).toJSON());
    expect(Moments.of(x).toJSON()).toEqual(Moments.of([3, 5, 10]).toJSON());
    expect(Moments.of(new Float64Array([3, NaN, 5, 10])).n).toBe(3);
    Moments.merge(a, b);
    expect(a).toEqual(Moments.of([1, 2]).toJSON());
  });

  it('returns null where a statistic is undefined', () => {
    const empty = new Moments();
    expect([empty.variance, empty.sd, empty.sem, empty.skewness, empty.kurtosis, empty.cv, empty.populationSd]).toEqual([null, null, null, null, null, null, null]);
    const one = Moments.of([4]);
    expect([one.mean, one.variance, one.sd, one.populationSd]).toEqual([4, null, null, 0]);
    const three = Moments.of([1, 2, 4]);
    expect(three.skewness).not.toBeNull();
    expect(three.kurtosis).toBeNull();
    const flat = Moments.of([5, 5, 5, 5, 5]);
    expect([flat.sd, flat.skewness, flat.kurtosis]).toEqual([0, null, null]);
    expect(Moments.of([-1, 1]).cv).toBeNull();
  });

  it('gives sem and cv from their definitions', () => {
    const m = Moments.of([2, 4, 4, 4, 5, 5, 7, 9]);
    expect(m.sem).toBeCloseTo(2.138089935299395 / Math.sqrt(8), 15);
    expect(m.cv).toBeCloseTo(2.138089935299395 / 5, 15);
    expect(m.populationSd).toBeCloseTo(2, 15);
  });
  it('Moments.of gives the very state of pushing the values one by one (fast-check)', () => {
    const value = fc.oneof(
      fc.double({ noNaN: false }),
      fc.constantFrom(NaN, -0, 0, 1e308, -1e308, 5e-324, Infinity, -Infinity),
      fc.integer({ min: -1000, max: 1000 }),
    );
    fc.assert(fc.property(fc.array(value, { maxLength: 60 }), (values) => {
      const pushed = new Moments();
      for (const x of values) pushed.push(x);
      expect(Moments.of(Float64Array.from(values)).toJSON()).toEqual(pushed.toJSON());
    }), { numRuns: 1000 });
  });
});
