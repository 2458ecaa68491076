import { logBeta } from './log-beta';
import { normalCdf } from './normal';

// Coefficients f_n of (sinh(w/2)/(w/2))^(-1/2) = Σ f_n w^(2n), built once from
// ln(sinh(w/2)/(w/2)) = Σ_j B_2j w^(2j) / (2j (2j)!) (B the Bernoulli numbers, A&S 4.5.64/23.1).
const BERNOULLI_2J = [1 / 6, -1 / 30, 1 / 42, -1 / 30, 5 / 66, -691 / 2730, 7 / 6, -3617 / 510];
const TERMS = BERNOULLI_2J.length;
const F = ((): number[] => {
  const ell = BERNOULLI_2J.map((b, i) => {
    const j = i + 1;
    let factorial = 1;
    for (let m = 2; m <= 2 * j; m++) factorial *= m;
    return b / (2 * j * factorial);
  });
  const k = -0.5; // the power b − 1 with b = 1/2
  const f = [1];
  for (let n = 1; n <= TERMS; n++) {
    let s = 0;
    for (let j = 1; j <= n; j++) s += j * k * (ell[j - 1] as number) * (f[n - j] as number);
    f.push(s / n);
  }
  return f;
})();

/**
 * P(T > t) for t ≥ 0 and large ν (ν ≥ 1000), or null where the expansion is not used.
 *
 * Why: the continued fraction for I_x(ν/2, ½) loses digits when x = ν/(ν+t²) is near 1 and ν is
 * large (about 1e-11 at ν = 1e6). This uses instead the incomplete-gamma expansion of the incomplete
 * beta function for a large first parameter (the idea of Temme 1987 and DiDonato & Morris 1992,
 * ACM TOMS 708, BGRAT): with x = e^(−λ), b = ½, T = a + (b − 1)/2 and u = Tλ,
 *   I_x(a, b) = T^(−b) / B(a, b) · Σ_n f_n T^(−2n) Γ(b + 2n, u),
 * from writing (1 − e^(−w))^(b−1) = w^(b−1) e^(−(b−1)w/2) (sinh(w/2)/(w/2))^(b−1) under the integral;
 * Γ(s, u) is the upper incomplete gamma function, Γ(½, u) = √π erfc(√u), raised by
 * Γ(s + 1, u) = s Γ(s, u) + u^s e^(−u). The terms shrink like (λ/2π)^(2n); the sum stops below 1e-17.
 *
 * Cost: O(1) (at most 8 terms).
 *
 * @example studentTTailLargeDf(3, 1e6) // ≈ 0.00134993127071090 (mpmath: ½ I_x(5e5, ½), x = 10⁶/(10⁶ + 9))
 */
export function studentTTailLargeDf(t: number, df: number): number | null {
  if (!(df >= 1000) || !(t >= 0)) return null;
  const lambda = Math.log1p((t / Math.sqrt(df)) * (t / Math.sqrt(df)));
  if (!(lambda <= 1)) return null;
  const a = df / 2;
  const bigT = a - 0.25;
  const u = bigT * lambda;
  const logU = Math.log(u);
  // G = Γ(½ + 2n, u), starting from Γ(½, u) = √π erfc(√u) = √π · 2Φ(−√(2u)).
  let g = Math.sqrt(Math.PI) * 2 * normalCdf(-Math.sqrt(2 * u));
  let s = 0.5;
  let sum = g;
  const invT2 = 1 / (bigT * bigT);
  let scale = 1;
  let converged = false;
  for (let n = 1; n <= TERMS; n++) {
    for (let step = 0; step < 2; step++) {
      g = s * g + (u > 0 ? Math.exp(s * logU - u) : 0);
      s += 1;
    }
    scale *= invT2;
    const term = (F[n] as number) * scale * g;
    sum += term;
    if (Math.abs(term) <= 1e-17 * Math.abs(sum)) {
      converged = true;
      break;
    }
  }
  if (!converged) return null;
  return 0.5 * Math.exp(-0.5 * Math.log(bigT) - logBeta(a, 0.5)) * sum;
}
