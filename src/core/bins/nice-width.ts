/** A width written as a decimal: integer × 10^exponent (e.g. 2.5e-3 = 25 × 10⁻⁴). */
export interface DecimalWidth {
  width: number;
  integer: number;
  exponent: number;
}

/** Mantissas of the nice widths within one decade, with the integer and exponent shift of each. */
const STEPS: readonly { value: number; integer: number; shift: number }[] = [
  { value: 1, integer: 1, shift: 0 },
  { value: 2, integer: 2, shift: 0 },
  { value: 2.5, integer: 25, shift: -1 },
  { value: 5, integer: 5, shift: 0 },
  { value: 10, integer: 1, shift: 1 },
];

/** Slack for "already nice": 2.5 computed as 2.5000000000000004 must stay 2.5, not become 5. */
const SLACK = 1e-9;

/**
 * The smallest width of the form 1, 2, 2.5 or 5 × 10^k that is at least `width` (within 1e-9
 * relative, so a width that is already nice up to rounding stays as it is), with its decimal form.
 *
 * Why these four: they give edges that read cleanly (…, 2.5, 5, 7.5, …) and are the usual
 * "nice number" steps of axis labelling (Heckbert 1990, "Nice numbers for graph labels", Graphics
 * Gems, with 2.5 added as in many plotting libraries). The value is parsed from its decimal text, so
 * 0.3 is the double nearest 3/10, not 3 × 0.1.
 *
 * Cost: O(1). Returns null for a width that is not positive and finite.
 *
 * @example niceWidth(0.37) // { width: 0.5, integer: 5, exponent: -1 }
 */
export function niceWidth(width: number): DecimalWidth | null {
  if (!(width > 0) || !Number.isFinite(width)) return null;
  let k = Math.floor(Math.log10(width));
  // log10 can be off by one next to powers of ten; settle k so that 10^k ≤ width < 10^(k+1).
  if (Number(`1e${k}`) > width * (1 + SLACK)) k--;
  if (Number(`1e${k + 1}`) <= width * (1 - SLACK)) k++;
  for (const step of STEPS) {
    const candidate = Number(`${step.value}e${k}`);
    if (candidate >= width * (1 - SLACK)) {
      const exponent = k + step.shift;
      return { width: Number(`${step.integer}e${exponent}`), integer: step.integer, exponent };
    }
  }
  /* c8 ignore next */
  return null; // unreachable: 10 × 10^k ≥ width by the choice of k
}

/** The next nice width above `nice` (1 → 2 → 2.5 → 5 → 10 × 10^k). */
export function nextNiceWidth(nice: DecimalWidth): DecimalWidth {
  return niceWidth(nice.width * (1 + 10 * SLACK)) as DecimalWidth;
}

/**
 * The decimal form integer × 10^exponent of a width given by a user (from its shortest decimal
 * text), or null when it needs more than 15 significant digits.
 */
export function decimalWidth(width: number): DecimalWidth | null {
  const m = /^(\d+)(?:\.(\d+))?(?:e([+-]\d+))?$/.exec(String(width));
  if (!m) return null;
  const fraction = m[2] ?? '';
  const digits = ((m[1] ?? '') + fraction).replace(/^0+(?=\d)/, '');
  if (digits.length > 15) return null;
  return { width, integer: Number(digits), exponent: Number(m[3] ?? 0) - fraction.length };
}

/** j × width, read from decimal text so that the edge is the double nearest the exact decimal. */
export function edgeAt(j: number, w: DecimalWidth): number {
  const product = j * w.integer;
  return Number.isSafeInteger(product) ? Number(`${product}e${w.exponent}`) : j * w.width;
}
