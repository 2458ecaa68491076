import type { BinChoice, BinRuleId } from '../options';
import { auto } from './auto';
import type { Moments } from '../stats/moments';
import { type BinRule, binStats, type BinStats } from './bin-stats';
import { doane } from './doane';
import { freedmanDiaconis } from './freedman-diaconis';
import { decimalWidth, type DecimalWidth, edgeAt, niceWidth, nextNiceWidth } from './nice-width';
import { rice } from './rice';
import { scott } from './scott';
import { sqrt } from './sqrt';
import { sturges } from './sturges';

export interface BinEdges {
  /** The rule that produced the width: a BinRuleId, `count` or `width` (`sturges` after a fallback). */
  rule: string;
  /** Plain words, e.g. "Freedman-Diaconis, 12 intervals of width 2.5". */
  label: string;
  width: number;
  /** k + 1 increasing edges for k intervals [edges[i], edges[i+1]); in `exact` mode the last is closed. */
  edges: number[];
  edgeMode: 'nice' | 'exact';
}

const RULES: Readonly<Record<BinRuleId, { name: string; rule: BinRule }>> = {
  sqrt: { name: 'Square root', rule: sqrt },
  sturges: { name: 'Sturges', rule: sturges },
  rice: { name: 'Rice', rule: rice },
  doane: { name: 'Doane', rule: doane },
  scott: { name: 'Scott', rule: scott },
  fd: { name: 'Freedman-Diaconis', rule: freedmanDiaconis },
  auto: { name: 'Auto', rule: auto },
};

/** For `auto`, which of its candidate widths won (numpy: min(max(FD, sqrt/2), Sturges)). */
function autoName(sorted: Float64Array, stats: BinStats): string {
  const fd = freedmanDiaconis(sorted, stats);
  const half = sqrt(sorted, stats) / 2;
  const st = sturges(sorted, stats);
  if (st <= Math.max(Number.isNaN(fd) ? 0 : fd, half)) return 'Auto (Sturges, narrower than Freedman-Diaconis)';
  if (!Number.isNaN(fd) && fd >= half) return 'Auto (Freedman-Diaconis, narrower than Sturges)';
  return 'Auto (half the square-root width, the floor on Freedman-Diaconis)';
}

/** Why a rule gave no width, for the label. */
function undefinedBecause(id: BinRuleId, stats: BinStats): string {
  if (id === 'fd') return 'the IQR is 0';
  if (id === 'doane') return stats.n < 3 ? 'fewer than 3 values' : 'the SD is 0';
  return 'no width';
}

const intervals = (k: number): string => `${k} interval${k === 1 ? '' : 's'}`;
/** A width for a label: nice widths print as they are, others to 6 significant digits. */
const show = (w: number): string => String(Number(w.toPrecision(6)));

/**
 * A width whose multiples j·w near the data are still distinct doubles: for data that vary only in
 * their last bits (e.g. 1e6 and 1e6 + 1e-10) a rule's width can be so small that j passes 2^53.
 */
function representable(min: number, max: number, w: DecimalWidth): DecimalWidth {
  const size = Math.max(Math.abs(min), Math.abs(max));
  return size / w.width > 2 ** 50 ? (niceWidth(size / 2 ** 50) ?? w) : w;
}

/** The multiples j0·w ≤ min (the largest such) and j1·w > max (the smallest such). */
function niceSpan(min: number, max: number, w: DecimalWidth): { j0: number; j1: number } {
  let j0 = Math.floor(min / w.width);
  while (edgeAt(j0, w) > min) j0--;
  while (edgeAt(j0 + 1, w) <= min) j0++;
  let j1 = Math.floor(max / w.width) + 1;
  while (edgeAt(j1 - 1, w) > max) j1--;
  while (edgeAt(j1, w) <= max) j1++;
  return { j0, j1 };
}

/** Nice edges j·w for j from j0 to j1. */
function niceEdges({ j0, j1 }: { j0: number; j1: number }, w: DecimalWidth): number[] {
  const edges: number[] = [];
  for (let j = j0; j <= j1; j++) edges.push(edgeAt(j, w));
  return edges;
}

/** Drops repeated edges, which appear only when intervals are narrower than the data's resolution. */
function distinct(edges: number[]): number[] {
  return edges.filter((e, i) => i === 0 || e > (edges[i - 1] as number));
}

/** numpy.linspace(min, max, k + 1): min + i·step, the last edge exactly max. */
function linspace(min: number, max: number, k: number): number[] {
  const step = (max - min) / k;
  const edges: number[] = [];
  for (let i = 0; i < k; i++) edges.push(min + i * step);
  edges.push(max);
  return edges;
}

/**
 * Histogram bin edges for values sorted ascending, by a named rule, a fixed count or a fixed width.
 *
 * Each rule (one file each: sqrt, sturges, rice, doane, scott, freedman-diaconis, auto) gives a
 * width as numpy.histogram_bin_edges computes it; then:
 * - `exact`: numpy's edges: k = ⌈(max − min)/width⌉ equal intervals from min to max
 *   (numpy.linspace), the last one closed [a, b], the others [a, b). A fixed width w gives edges
 *   min + i·w up to the first at or above max.
 * - `nice`: the width rounded up to 1, 2, 2.5 or 5 × 10^k (`niceWidth`; a fixed width is kept),
 *   the first edge the multiple of the width at or below min, the last the first multiple strictly
 *   above max, so every interval is [a, b) and every value falls in exactly one. Edges are computed
 *   as integer multiples j × width from decimal text, so they do not drift and print cleanly.
 * As numpy does for integer arrays, a rule's width below 1 is widened to 1 when every value is a
 * whole number. Degenerate cases: no values → null; all values equal → one interval
 * ([v − ½, v + ½] in `exact` mode, as numpy; [v, v + 1) on whole multiples in `nice` mode); a rule
 * undefined for the data (Freedman-Diaconis with IQR = 0, Doane with n < 3) → Sturges, and the label
 * says so (numpy would make one bin); more than `maxBins` intervals → capped (`exact`: maxBins equal
 * intervals; `nice`: the next nice width that fits), and the label says so.
 *
 * Cost: O(n) for the statistics plus O(k) for the edges; the input is not modified. `moments`, when
 * given, is `Moments.of(sorted)` (see `binStats`).
 *
 * @example binEdges(Float64Array.of(1, 2, 2, 3, 3, 3, 4, 4, 5, 9), { rule: 'sturges' }, 'nice')
 * // { rule: 'sturges', label: 'Sturges, 5 intervals of width 2', width: 2,
 * //   edges: [0, 2, 4, 6, 8, 10], edgeMode: 'nice' }
 */
export function binEdges(sorted: Float64Array, choice: BinChoice, mode: 'nice' | 'exact', maxBins = 250, moments?: Moments): BinEdges | null {
  const stats = binStats(sorted, moments);
  return stats === null ? null : binEdgesFromStats(stats, choice, mode, maxBins, sorted);
}

/**
 * `binEdges` from the statistics the rules read (BinStats), for a column summarised by a sketch
 * rather than kept sorted: every rule here reads only `stats`, so `sorted` may be empty.
 */
export function binEdgesFromStats(stats: BinStats, choice: BinChoice, mode: 'nice' | 'exact', maxBins = 250, sorted: Float64Array = new Float64Array(0)): BinEdges | null {
  if (!Number.isInteger(maxBins) || maxBins < 1) throw new RangeError(`binEdges: maxBins must be a whole number of at least 1, got ${maxBins}`);
  const { min, max } = stats;

  if (min === max) {
    if (mode === 'exact') return { rule: choice.rule, label: `All values equal: ${intervals(1)} of width 1`, width: 1, edges: [min - 0.5, min + 0.5], edgeMode: mode };
    let w = niceWidth(1) as DecimalWidth;
    while (edgeAt(Math.floor(min / w.width) + 1, w) === edgeAt(Math.floor(min / w.width), w)) w = niceWidth(w.width * 10) as DecimalWidth; // |v| ≥ 2^53
    const edges = niceEdges(niceSpan(min, max, w), w);
    return { rule: choice.rule, label: `All values equal: ${intervals(1)} of width ${show(w.width)}`, width: w.width, edges, edgeMode: mode };
  }

  const range = max - min;
  // Values spanning more than the double range (1e308 - -1e308), or only a few subnormals, leave
  // no representable width: no histogram rather than NaN edges.
  if (!Number.isFinite(range) || !(range / maxBins > 0)) return null;
  // The raw width, the rule that gave it, and how the label names it.
  let rule: string = choice.rule;
  let name: string;
  let width: number;
  const notes: string[] = [];
  if (choice.rule === 'count') {
    if (!Number.isInteger(choice.count) || choice.count < 1) throw new RangeError(`binEdges: a count must be a whole number of at least 1, got ${choice.count}`);
    name = `Fixed count ${choice.count}`;
    width = range / choice.count;
  } else if (choice.rule === 'width') {
    if (!(choice.width > 0) || !Number.isFinite(choice.width)) throw new RangeError(`binEdges: a width must be a positive number, got ${choice.width}`);
    name = `Fixed width ${show(choice.width)}`;
    width = choice.width;
  } else {
    name = choice.rule === 'auto' ? autoName(sorted, stats) : RULES[choice.rule].name;
    width = RULES[choice.rule].rule(sorted, stats);
    if (!(width > 0) || !Number.isFinite(width)) {
      name = `Sturges (${RULES[choice.rule].name} is undefined: ${undefinedBecause(choice.rule, stats)})`;
      rule = 'sturges';
      width = sturges(sorted, stats);
    }
    if (stats.integer && width < 1) {
      width = 1;
      notes.push('widened to 1 for whole numbers');
    }
  }

  if (!(width > 0) || !Number.isFinite(width)) return null; // underflow of range / count

  if (mode === 'exact') {
    const fixedWidth = choice.rule === 'width';
    const wanted = choice.rule === 'count' ? choice.count : Math.max(1, Math.ceil(range / width));
    let edges: number[];
    let actual: number;
    if (wanted > maxBins) {
      notes.push(`capped at ${maxBins} intervals (the ${fixedWidth ? 'width' : 'rule'} gives ${wanted})`);
      edges = linspace(min, max, maxBins);
      actual = range / maxBins;
    } else if (fixedWidth) {
      const w = decimalWidth(width);
      const at = (i: number): number => (w === null ? min + i * width : min + edgeAt(i, w));
      edges = [];
      for (let i = 0; i <= wanted; i++) edges.push(at(i));
      // range / width can round just below a whole number: make sure max is covered.
      for (let extra = 0; extra < 2 && (edges[edges.length - 1] as number) < max; extra++) edges.push(at(edges.length));
      if ((edges[edges.length - 1] as number) < max) edges[edges.length - 1] = max; // a width below the data's resolution
      actual = width;
    } else {
      edges = linspace(min, max, wanted);
      actual = range / wanted;
    }
    edges = distinct(edges);
    const label = [name, ...notes, `${intervals(edges.length - 1)} of width ${show(actual)}`].join(', ');
    return { rule, label, width: actual, edges, edgeMode: mode };
  }

  const first = choice.rule === 'width' ? (decimalWidth(width) ?? { width, integer: NaN, exponent: 0 }) : niceWidth(width);
  if (first === null || !(first.width > 0)) return null; // a width too small for a decimal form
  let w = representable(min, max, first);
  let span = niceSpan(min, max, w);
  const wanted = span.j1 - span.j0;
  if (wanted > maxBins) {
    // Jump near the cap first (the count can be huge for a tiny fixed width), then step up.
    w = representable(min, max, niceWidth(Math.max(w.width, range / maxBins)) as DecimalWidth);
    span = niceSpan(min, max, w);
    while (span.j1 - span.j0 > maxBins) {
      w = nextNiceWidth(w);
      span = niceSpan(min, max, w);
    }
    notes.push(`capped at ${maxBins} intervals (the ${choice.rule === 'width' ? 'width' : 'rule'} gives ${wanted})`);
  }
  const edges = niceEdges(span, w);
  const k = edges.length - 1;
  const label = [name, ...notes, `${intervals(k)} of width ${show(w.width)}`].join(', ');
  return { rule, label, width: w.width, edges, edgeMode: mode };
}
