// The standard normal distribution: CDF by Cody's rational Chebyshev approximations, quantile by
// Wichura's AS 241. Both are the methods R uses (pnorm, qnorm), accurate to about 1e-16.

// Cody (1969), Math. Comp. 23:631-637, and Cody (1993) ACM TOMS 715 (ANORM): coefficients for
// |z| ≤ 0.67448975 (A, B), 0.67448975 < |z| ≤ √32 (C, D), and √32 < |z| < 37.5193 (P, Q).
const A = [2.2352520354606839287, 161.02823106855587881, 1067.6894854603709582, 18154.981253343561249, 0.065682337918207449113];
const B = [47.20258190468824187, 976.09855173777669322, 10260.932208618978205, 45507.789335026729956];
const C = [
  0.39894151208813466764, 8.8831497943883759412, 93.506656132177855979, 597.27027639480026226,
  2494.5375852903726711, 6848.1904505362823326, 11602.651437647350124, 9842.7148383839780218,
  1.0765576773720192317e-8,
];
const D = [
  22.266688044328115691, 235.38790178262499861, 1519.377599407554805, 6485.558298266760755,
  18615.571640885098091, 34900.952721145977266, 38912.003286093271411, 19685.429676859990727,
];
const P = [0.21589853405795699, 0.1274011611602473639, 0.022235277870649807, 0.001421619193227893466, 2.9112874951168792e-5, 0.02307344176494017303];
const Q = [1.28426009614491121, 0.468238212480865118, 0.0659881378689285515, 0.00378239633202758244, 7.29751555083966205e-5];
const INV_SQRT_2PI = 0.398942280401432677939946059934;
const SQRT_32 = 5.656854249492380195206754896838;

/** exp(−y²/2) without the rounding error of y² in the exponent: y is split into y₁ + (y − y₁), y₁ a multiple of 1/16. */
function gaussianFactor(y: number): number {
  const y1 = Math.trunc(y * 16) / 16;
  return Math.exp(-0.5 * y1 * y1) * Math.exp(-0.5 * (y - y1) * (y + y1));
}

/**
 * Standard normal cumulative distribution function Φ(z) = P(Z ≤ z).
 *
 * Method: W. J. Cody's rational Chebyshev approximations to erf/erfc (Cody 1969, Math. Comp. 23:631;
 * as packaged in ACM TOMS Algorithm 715, 1993, and used by R's `pnorm`): three ranges of |z|, with the
 * tail factor exp(−z²/2) formed without cancellation. Accuracy about 1e-16 relative for the lower tail.
 * For an upper-tail p-value use `normalCdf(-z)`, which keeps its relative accuracy far out (1 − Φ(z)
 * would not). Φ(z) is 0 below −37.5193 (the result underflows) and 1 above 8.3.
 *
 * Cost: O(1).
 *
 * @example normalCdf(1.96) // 0.9750021048517795 (R: pnorm(1.96), from memory)
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) return NaN;
  const y = Math.abs(z);
  if (y <= 0.67448975) {
    const s = z * z;
    let num = (A[4] as number) * s;
    let den = s;
    for (let i = 0; i < 3; i++) {
      num = (num + (A[i] as number)) * s;
      den = (den + (B[i] as number)) * s;
    }
    return 0.5 + (z * (num + (A[3] as number))) / (den + (B[3] as number));
  }
  let tail: number; // P(Z > y)
  if (y <= SQRT_32) {
    let num = (C[8] as number) * y;
    let den = y;
    for (let i = 0; i < 7; i++) {
      num = (num + (C[i] as number)) * y;
      den = (den + (D[i] as number)) * y;
    }
    tail = gaussianFactor(y) * ((num + (C[7] as number)) / (den + (D[7] as number)));
  } else if (y < 37.5193) {
    const s = 1 / (y * y);
    let num = (P[5] as number) * s;
    let den = s;
    for (let i = 0; i < 4; i++) {
      num = (num + (P[i] as number)) * s;
      den = (den + (Q[i] as number)) * s;
    }
    const r = (s * (num + (P[4] as number))) / (den + (Q[4] as number));
    tail = gaussianFactor(y) * ((INV_SQRT_2PI - r) / y);
  } else {
    tail = 0;
  }
  return z > 0 ? 1 - tail : tail;
}

// Wichura (1988), Algorithm AS 241 PPND16, Applied Statistics 37:477-484: rational approximations
// for |p − ½| ≤ 0.425 (A, B), r = √(−ln min(p, 1−p)) ≤ 5 (C, D), and r > 5 (E, F). Highest power first.
const AS241_A = [2509.0809287301226727, 33430.575583588128105, 67265.770927008700853, 45921.953931549871457, 13731.693765509461125, 1971.5909503065514427, 133.14166789178437745, 3.387132872796366608];
const AS241_B = [5226.495278852854561, 28729.085735721942674, 39307.89580009271061, 21213.794301586595867, 5394.1960214247511077, 687.1870074920579083, 42.313330701600911252, 1];
const AS241_C = [7.7454501427834140764e-4, 0.0227238449892691845833, 0.24178072517745061177, 1.27045825245236838258, 3.64784832476320460504, 5.7694972214606914055, 4.6303378461565452959, 1.42343711074968357734];
const AS241_D = [1.05075007164441684324e-9, 5.475938084995344946e-4, 0.0151986665636164571966, 0.14810397642748007459, 0.68976733498510000455, 1.6763848301838038494, 2.05319162663775882187, 1];
const AS241_E = [2.01033439929228813265e-7, 2.71155556874348757815e-5, 0.0012426609473880784386, 0.026532189526576123093, 0.29656057182850489123, 1.7848265399172913358, 5.4637849111641143699, 6.6579046435011037772];
const AS241_F = [2.04426310338993978564e-15, 1.4215117583164458887e-7, 1.8463183175100546818e-5, 7.868691311456132591e-4, 0.0148753612908506148525, 0.13692988092273580531, 0.59983220655588793769, 1];

function horner(coefficients: readonly number[], x: number): number {
  let v = 0;
  for (const c of coefficients) v = v * x + c;
  return v;
}

/**
 * Standard normal quantile function Φ⁻¹(p): the z with Φ(z) = p.
 *
 * Method: Wichura (1988), "Algorithm AS 241: The percentage points of the normal distribution",
 * Applied Statistics 37(3):477-484 (PPND16, accurate to about 1 part in 10¹⁶): a rational function of
 * p − ½ in the centre and of √(−ln min(p, 1−p)) in the two tail ranges.
 *
 * Cost: O(1).
 *
 * Returns −Infinity at 0, Infinity at 1, NaN outside [0, 1] or for NaN.
 *
 * @example normalQuantile(0.975) // 1.959963984540054 (R: qnorm(0.975), from memory)
 */
export function normalQuantile(p: number): number {
  if (Number.isNaN(p) || p < 0 || p > 1) return NaN;
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  const q = p - 0.5;
  if (Math.abs(q) <= 0.425) {
    const r = 0.180625 - q * q;
    return (q * horner(AS241_A, r)) / horner(AS241_B, r);
  }
  let r = Math.sqrt(-Math.log(q < 0 ? p : 1 - p));
  let z: number;
  if (r <= 5) {
    r -= 1.6;
    z = horner(AS241_C, r) / horner(AS241_D, r);
  } else {
    r -= 5;
    z = horner(AS241_E, r) / horner(AS241_F, r);
  }
  return q < 0 ? -z : z;
}
