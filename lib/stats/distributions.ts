// Special functions and distributions the tolerance factors and outlier tests are built on.
// Written out here because the noncentral t is in no installed library, and the tests need
// more digits than the usual closed-form approximations give.
import { probit } from "simple-statistics";

const EPS = 1e-15;
const TINY = 1e-300;
const MAX_ITERATIONS = 10_000;

// Lanczos approximation, g = 7, nine coefficients (Godfrey), relative error about 1e-15.
const LANCZOS = [
  0.99999999999980993, 676.5203681218851, -1259.1392167224028, 771.32342877765313, -176.61502916214059, 12.507343278686905, -0.13857109526572012,
  9.9843695780195716e-6, 1.5056327351493116e-7,
];

/** ln Γ(x) for x > 0. */
export function logGamma(x: number): number {
  if (!(x > 0)) throw new Error("The log-gamma function is only used here for positive arguments");
  // Reflection Γ(x)Γ(1−x) = π/sin(πx) keeps the series on x ≥ 0.5, where it is accurate.
  if (x < 0.5) return Math.log(Math.PI / Math.sin(Math.PI * x)) - logGamma(1 - x);
  const z = x - 1;
  let a = LANCZOS[0];
  for (let i = 1; i < LANCZOS.length; i++) a += LANCZOS[i] / (z + i);
  const t = z + 7.5;
  return 0.5 * Math.log(2 * Math.PI) + (z + 0.5) * Math.log(t) - t + Math.log(a);
}

/**
 * ln B(a, b) = ln Γ(a) + ln Γ(b) − ln Γ(a + b). With a large argument the three ln Γ are large and
 * nearly cancel, so the Stirling parts are taken out and cancelled by hand, as R's lbeta does
 * (after Didonato & Morris 1992; the Stirling error from stirlingError below).
 */
export function logBeta(a: number, b: number): number {
  const p = Math.min(a, b);
  const q = Math.max(a, b);
  if (p >= 10) {
    const corr = stirlingError(p) + stirlingError(q) - stirlingError(p + q);
    return -0.5 * Math.log(q) + 0.5 * Math.log(2 * Math.PI) + corr + (p - 0.5) * Math.log(p / (p + q)) + q * Math.log1p(-p / (p + q));
  }
  if (q >= 10) {
    const corr = stirlingError(q) - stirlingError(p + q);
    return logGamma(p) + corr + p - p * Math.log(p + q) + (q - 0.5) * Math.log1p(-p / (p + q));
  }
  return logGamma(a) + logGamma(b) - logGamma(a + b);
}

// Continued fraction for I_x(a, b), modified Lentz method (Numerical Recipes §6.4, betacf).
function betaContinuedFraction(x: number, a: number, b: number): number {
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < TINY) d = TINY;
  d = 1 / d;
  let h = d;
  for (let m = 1; m <= MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a + m2 - 1) * (a + m2));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    h *= d * c;
    aa = (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1));
    d = 1 + aa * d;
    if (Math.abs(d) < TINY) d = TINY;
    c = 1 + aa / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) return h;
  }
  throw new Error("The incomplete beta continued fraction did not converge");
}

/** Regularized incomplete beta I_x(a, b) (Numerical Recipes §6.4, betai). */
export function regularizedBeta(x: number, a: number, b: number): number {
  if (!(a > 0 && b > 0)) throw new Error("The incomplete beta function needs positive parameters");
  if (!(x >= 0 && x <= 1)) throw new Error("The incomplete beta function needs x between 0 and 1");
  if (x === 0 || x === 1) return x;
  const front = Math.exp(a * Math.log(x) + b * Math.log1p(-x) - logBeta(a, b));
  // The fraction converges fast on the side of the mean (a+1)/(a+b+2); use symmetry on the other.
  if (x < (a + 1) / (a + b + 2)) return (front * betaContinuedFraction(x, a, b)) / a;
  return 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

// Regularized upper incomplete gamma Q(a, x): series or Lentz continued fraction (Numerical Recipes §6.2).
function upperGamma(a: number, x: number): number {
  if (x <= 0) return 1;
  const front = Math.exp(-x + a * Math.log(x) - logGamma(a));
  if (x < a + 1) {
    let ap = a;
    let del = 1 / a;
    let sum = del;
    for (let i = 0; i < MAX_ITERATIONS && Math.abs(del) > Math.abs(sum) * EPS; i++) {
      ap += 1;
      del *= x / ap;
      sum += del;
    }
    return 1 - sum * front;
  }
  let b = x + 1 - a;
  let c = 1 / TINY;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i <= MAX_ITERATIONS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < TINY) d = TINY;
    c = b + an / c;
    if (Math.abs(c) < TINY) c = TINY;
    d = 1 / d;
    const del = d * c;
    h *= del;
    if (Math.abs(del - 1) < EPS) break;
  }
  return front * h;
}

/** Standard normal CDF Φ(z), via erfc(x) = Q(½, x²) so that both tails keep their digits. */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) throw new Error("The normal CDF needs a number");
  const tail = 0.5 * upperGamma(0.5, (z * z) / 2); // = Φ(−|z|)
  return z < 0 ? tail : 1 - tail;
}

/** Standard normal density φ(z). */
export function normalPdf(z: number): number {
  return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
}

/** Standard normal quantile z_p: simple-statistics' probit as a start, then Newton steps on Φ. */
export function normalQuantile(p: number): number {
  if (!(p > 0 && p < 1)) throw new Error("A normal quantile needs a probability strictly between 0 and 1");
  // 1 − p is exact for p ≥ 0.5, so solve in the lower tail where Φ is accurate.
  if (p > 0.5) return -normalQuantile(1 - p);
  let z = probit(p);
  for (let i = 0; i < 8; i++) {
    const step = (normalCdf(z) - p) / normalPdf(z);
    z -= step;
    if (Math.abs(step) < 1e-14 * Math.max(1, Math.abs(z))) break;
  }
  return z;
}

function checkDf(df: number): void {
  if (!(df > 0) || !Number.isFinite(df)) throw new Error("Degrees of freedom must be a positive number");
}

/** Upper tail P(T > t) of Student t with df degrees of freedom, for t ≥ 0: ½·I_{df/(df+t²)}(df/2, ½). */
function studentTUpper(t: number, df: number): number {
  // Near t = 0, df/(df+t²) rounds to 1; the complementary form ½(1 − I_{t²/(df+t²)}(½, df/2)) keeps the digits.
  if (t * t < df) return 0.5 * (1 - regularizedBeta((t * t) / (df + t * t), 0.5, df / 2));
  return 0.5 * regularizedBeta(df / (df + t * t), df / 2, 0.5);
}

/** Student t CDF, from the incomplete beta (Abramowitz & Stegun 26.7.1 / 26.5.27). */
export function studentTCdf(t: number, df: number): number {
  checkDf(df);
  if (Number.isNaN(t)) throw new Error("The Student t CDF needs a number");
  if (t === Infinity) return 1;
  if (t === -Infinity) return 0;
  const upper = studentTUpper(Math.abs(t), df);
  return t >= 0 ? 1 - upper : upper;
}

/** Student t quantile: bisection on the tail probability, which is monotone in t. */
export function studentTQuantile(p: number, df: number): number {
  checkDf(df);
  if (!(p > 0 && p < 1)) throw new Error("A Student t quantile needs a probability strictly between 0 and 1");
  if (p === 0.5) return 0;
  // Work with the upper tail q of |t| so small probabilities keep their relative precision.
  const q = p > 0.5 ? 1 - p : p;
  let lo = 0;
  let hi = 1;
  while (studentTUpper(hi, df) > q) {
    lo = hi;
    hi *= 2;
    if (hi > 1e300) throw new Error("The Student t quantile is too far in the tail to compute");
  }
  for (let i = 0; i < 200 && hi - lo > 1e-14 * hi; i++) {
    const mid = 0.5 * (lo + hi);
    if (studentTUpper(mid, df) > q) lo = mid;
    else hi = mid;
  }
  const t = 0.5 * (lo + hi);
  return p > 0.5 ? t : -t;
}

/**
 * Noncentral t CDF P(T′ ≤ t; df, δ), for any noncentrality.
 * The Poisson-weighted series in incomplete beta functions of Lenth (1989), Applied Statistics
 * algorithm AS 243:
 *   F(t) = Φ(−δ) + ½ Σⱼ [ Pⱼ·I_x(j + ½, ν/2) + Qⱼ·I_x(j + 1, ν/2) ],  x = t²/(t² + ν), λ = δ²/2,
 *   Pⱼ = e^(−λ) λʲ / j!,  Qⱼ = δ e^(−λ) λʲ / (√2 Γ(j + 3/2)),
 * summed outwards from the largest Poisson weight (j = ⌊λ⌋) in both directions, as Benton &
 * Krishnamoorthy (2003), Computational Statistics & Data Analysis 43, 249–267, do. AS 243 itself
 * starts at j = 0, where e^(−λ) underflows once δ exceeds about 37 (a lab with 253 balls at 99 %
 * coverage); starting at the mode keeps every weight representable.
 * For t < 0 the value comes as 1 − (a value near 1) when δ ≫ 0, so that far tail is accurate to about
 * 1e-15 absolutely, not relatively; tolerance factors only use t > 0.
 */
export function nonCentralTCdf(t: number, df: number, delta: number): number {
  checkDf(df);
  if (Number.isNaN(t) || !Number.isFinite(delta)) throw new Error("The noncentral t CDF needs numbers");
  if (t === Infinity) return 1;
  if (t === -Infinity) return 0;
  // P(T′ ≤ t; δ) = 1 − P(T′ ≤ −t; −δ) reduces to t ≥ 0 (AS 243).
  const negative = t < 0;
  const tt = negative ? -t : t;
  const del = negative ? -delta : delta;
  const x = (tt * tt) / (tt * tt + df);
  const tnc = Math.min(1, Math.max(0, (x > 0 ? 0.5 * poissonBetaSeries(x, df / 2, del) : 0) + normalCdf(-del)));
  return negative ? 1 - tnc : tnc;
}

/**
 * stirlerr(x) = ln Γ(x + 1) − (x + ½)·ln x + x − ½·ln 2π = ln Γ(x) − (x − ½)·ln x + x − ½·ln 2π,
 * the error of Stirling's formula.
 * Loader (2000), "Fast and accurate computation of binomial probabilities": its asymptotic series
 * (coefficients 1/12, 1/360, 1/1260, 1/1680, 1/1188) above 15, ln Γ directly below, where it is small.
 */
function stirlingError(x: number): number {
  if (x <= 15) return logGamma(x + 1) - (x + 0.5) * Math.log(x) + x - 0.5 * Math.log(2 * Math.PI);
  const x2 = x * x;
  const [s0, s1, s2, s3, s4] = [1 / 12, 1 / 360, 1 / 1260, 1 / 1680, 1 / 1188];
  if (x > 500) return (s0 - s1 / x2) / x;
  if (x > 80) return (s0 - (s1 - s2 / x2) / x2) / x;
  if (x > 35) return (s0 - (s1 - (s2 - s3 / x2) / x2) / x2) / x;
  return (s0 - (s1 - (s2 - (s3 - s4 / x2) / x2) / x2) / x2) / x;
}

/** bd0(x, μ) = x·ln(x/μ) + μ − x, by its series in v = (x − μ)/(x + μ) when x is near μ (Loader 2000). */
function deviance(x: number, mu: number): number {
  if (Math.abs(x - mu) < 0.1 * (x + mu)) {
    const v = (x - mu) / (x + mu);
    const v2 = v * v;
    let sum = (x - mu) * v;
    let ej = 2 * x * v;
    for (let j = 1; j < 1000; j++) {
      ej *= v2;
      const next = sum + ej / (2 * j + 1);
      if (next === sum) return next;
      sum = next;
    }
    return sum;
  }
  return x * Math.log(x / mu) + mu - x;
}

/** Σⱼ [Pⱼ·I_x(j + ½, b) + Qⱼ·I_x(j + 1, b)] from the mode outwards (see nonCentralTCdf). */
function poissonBetaSeries(x: number, b: number, del: number): number {
  const lambda = (del * del) / 2;
  const m = Math.floor(lambda);
  const logX = Math.log(x);
  const log1mX = Math.log1p(-x);
  // Weights at the mode by Loader's saddle-point form, so that neither e^(−λ) nor λ^m under- or
  // overflows and no digits are lost to ln Γ of a large argument (with λ = δ²/2 and y = m + ½):
  //   P_m = e^(−bd0(m, λ) − stirlerr(m))/√(2πm),   |Q_m| = e^(−bd0(y, λ) − stirlerr(y))/√(2πy).
  const p0 = m === 0 ? Math.exp(-lambda) : Math.exp(-deviance(m, lambda) - stirlingError(m)) / Math.sqrt(2 * Math.PI * m);
  const y = m + 0.5;
  const q0 = del === 0 ? 0 : (Math.sign(del) * Math.exp(-deviance(y, lambda) - stirlingError(y))) / Math.sqrt(2 * Math.PI * y);
  // I_x(a, b) at the mode, and g(a) = xᵃ(1 − x)ᵇ/(a·B(a, b)), for which I_x(a + 1, b) = I_x(a, b) − g(a).
  const g = (a: number) => Math.exp(a * logX + b * log1mX - Math.log(a) - logBeta(a, b));
  const iOdd0 = regularizedBeta(x, m + 0.5, b);
  const iEven0 = regularizedBeta(x, m + 1, b);
  const gOdd0 = g(m + 0.5);
  const gEven0 = g(m + 1);
  let sum = p0 * iOdd0 + q0 * iEven0;

  // Forward: j = m + 1, m + 2, … Beyond the mode the weights fall by at least λ/(j + 1) < 1 a step and
  // the beta terms are at most 1, so once a term is below 1e-16 of the sum the rest is smaller still.
  let p = p0,
    q = q0,
    iOdd = iOdd0,
    iEven = iEven0,
    gOdd = gOdd0,
    gEven = gEven0;
  for (let j = m + 1; j <= m + MAX_ITERATIONS; j++) {
    iOdd -= gOdd;
    iEven -= gEven;
    gOdd *= (x * (j - 0.5 + b)) / (j + 0.5);
    gEven *= (x * (j + b)) / (j + 1);
    p *= lambda / j;
    q *= lambda / (j + 0.5);
    const term = p * Math.max(iOdd, 0) + q * Math.max(iEven, 0);
    sum += term;
    if (Math.abs(p) + Math.abs(q) <= 1e-16 * Math.abs(sum) || (iOdd <= 0 && iEven <= 0)) break;
    if (j === m + MAX_ITERATIONS) throw new Error("The noncentral t series did not converge");
  }

  // Backward: j = m − 1, …, 0, with I_x(a − 1, b) = I_x(a, b) + g(a − 1).
  p = p0;
  q = q0;
  iOdd = iOdd0;
  iEven = iEven0;
  gOdd = gOdd0;
  gEven = gEven0;
  for (let j = m - 1; j >= 0; j--) {
    // A term that underflowed to 0 (x tiny) is computed afresh, never as 0 × ∞.
    gOdd = gOdd > 0 ? (gOdd * (j + 1.5)) / (x * (j + 0.5 + b)) : g(j + 0.5);
    gEven = gEven > 0 ? (gEven * (j + 2)) / (x * (j + 1 + b)) : g(j + 1);
    iOdd += gOdd;
    iEven += gEven;
    p *= (j + 1) / lambda;
    q *= (j + 1.5) / lambda;
    sum += p * Math.min(iOdd, 1) + q * Math.min(iEven, 1);
    if (Math.abs(p) + Math.abs(q) <= 1e-16 * Math.abs(sum)) break;
  }
  return sum;
}

/** γ-quantile of the noncentral t: bracket, then bisection on the CDF, which rises monotonically in t. */
export function nonCentralTQuantile(gamma: number, df: number, delta: number): number {
  if (!(gamma > 0 && gamma < 1)) throw new Error("A noncentral t quantile needs a probability strictly between 0 and 1");
  let lo = delta - 1;
  let hi = delta + 1;
  for (let step = 1; nonCentralTCdf(lo, df, delta) > gamma; step *= 2) {
    hi = lo;
    lo -= step;
    if (step > 1e12) throw new Error("The noncentral t quantile could not be bracketed");
  }
  for (let step = 1; nonCentralTCdf(hi, df, delta) < gamma; step *= 2) {
    lo = hi;
    hi += step;
    if (step > 1e12) throw new Error("The noncentral t quantile could not be bracketed");
  }
  for (let i = 0; i < 200 && hi - lo > 1e-12 * Math.max(1, Math.abs(hi)); i++) {
    const mid = 0.5 * (lo + hi);
    if (nonCentralTCdf(mid, df, delta) < gamma) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
