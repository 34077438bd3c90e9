/**
 * The regularized incomplete beta function I_x(a, b) for whole-number a, b ≥ 1 (all a binomial interval
 * needs) and its inverse in x. I_x is evaluated by its continued fraction with the modified Lentz method,
 * switching to 1 − I_{1−x}(b, a) where that converges faster (Press et al., Numerical Recipes, 3rd ed.,
 * §6.4, eqs. 6.4.5–6.4.6); the inverse is bisection, which cannot fail on a monotone function.
 * Written here rather than taken from a statistics package: it is some forty lines, and a package would
 * put a whole distribution library into the server bundle for one quantile.
 */

const EPS = 1e-15;
const FPMIN = 1e-300;
const MAX_ITERATIONS = 10_000;

/** ln((k)!) for a whole k ≥ 0, summed (exact enough for k up to millions; the tools use thousands). */
function lnFactorial(k: number): number {
  let s = 0;
  for (let i = 2; i <= k; i++) s += Math.log(i);
  return s;
}

/** ln B(a, b) = ln Γ(a) + ln Γ(b) − ln Γ(a + b) for whole a, b ≥ 1. */
function lnBetaWhole(a: number, b: number): number {
  return lnFactorial(a - 1) + lnFactorial(b - 1) - lnFactorial(a + b - 1);
}

/** The continued fraction of I_x(a, b) (Numerical Recipes' betacf), modified Lentz. */
function betaContinuedFraction(x: number, a: number, b: number): number {
  const tiny = (v: number) => (Math.abs(v) < FPMIN ? FPMIN : v);
  const qab = a + b;
  let c = 1;
  let d = 1 / tiny(1 - (qab * x) / (a + 1));
  let h = d;
  for (let m = 1; m <= MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    let aa = (m * (b - m) * x) / ((a - 1 + m2) * (a + m2));
    d = 1 / tiny(1 + aa * d);
    c = tiny(1 + aa / c);
    h *= d * c;
    aa = (-(a + m) * (qab + m) * x) / ((a + m2) * (a + 1 + m2));
    d = 1 / tiny(1 + aa * d);
    c = tiny(1 + aa / c);
    const step = d * c;
    h *= step;
    if (Math.abs(step - 1) < EPS) break;
  }
  return h;
}

function betaRegularizedWithLnB(x: number, a: number, b: number, lnB: number): number {
  if (x <= 0) return 0;
  if (x >= 1) return 1;
  const front = Math.exp(a * Math.log(x) + b * Math.log1p(-x) - lnB);
  return x < (a + 1) / (a + b + 2)
    ? (front * betaContinuedFraction(x, a, b)) / a
    : 1 - (front * betaContinuedFraction(1 - x, b, a)) / b;
}

function wholeCheck(a: number, b: number): void {
  if (!Number.isInteger(a) || !Number.isInteger(b) || a < 1 || b < 1) {
    throw new RangeError(`beta function: needs whole a, b ≥ 1; got a = ${a}, b = ${b}`);
  }
}

/** I_x(a, b) for 0 ≤ x ≤ 1 and whole a, b ≥ 1 (the beta distribution's CDF). Throws RangeError otherwise. */
export function betaRegularized(x: number, a: number, b: number): number {
  wholeCheck(a, b);
  return betaRegularizedWithLnB(x, a, b, lnBetaWhole(a, b));
}

/**
 * The x in 0…1 with I_x(a, b) = q (the beta distribution's q-quantile) for whole a, b ≥ 1, to about
 * 1e-15; q = 0 gives 0 and q = 1 gives 1. Throws RangeError outside those domains.
 */
export function betaRegularizedInverse(q: number, a: number, b: number): number {
  wholeCheck(a, b);
  if (!(q >= 0 && q <= 1)) throw new RangeError(`beta quantile: needs 0 ≤ q ≤ 1; got ${q}`);
  if (q === 0) return 0;
  if (q === 1) return 1;
  const lnB = lnBetaWhole(a, b);
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 200 && hi - lo > 1e-15; i++) {
    const mid = (lo + hi) / 2;
    if (betaRegularizedWithLnB(mid, a, b, lnB) < q) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
