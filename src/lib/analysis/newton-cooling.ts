/**
 * Newton's law of cooling (lumped capacitance; Incropera et al., Fundamentals of Heat and Mass Transfer,
 * ch. 5, eq. 5.6): T(t) = T∞ + (T0 − T∞)·e^(−(t − t0)/τ), fitted to a temperature log by nonlinear least
 * squares. For each trial τ the model is linear in T∞ and T0 − T∞, so those come from linear least squares
 * and only τ is searched (variable projection; Golub & Pereyra, SIAM J. Numer. Anal. 10, 1973): a
 * log-spaced scan, then golden-section refinement. Uncertainties: covariance s²·(JᵀJ)⁻¹ of all three
 * parameters at the optimum (least-squares.ts).
 */
import { fitCovariance } from './least-squares';

/** Fewest readings the fit uses: three parameters and at least two degrees of freedom. */
export const NEWTON_FIT_MIN_POINTS = 5;

export interface NewtonCoolingFit {
  /** Time constant τ and its standard uncertainty, s. */
  timeConstantS: number;
  timeConstantStdErrorS: number;
  /** Final (surroundings) temperature T∞ and its standard uncertainty, in the log's unit. */
  finalTemperature: number;
  finalTemperatureStdError: number;
  /** Fitted temperature at the first reading, T0, and its standard uncertainty. */
  initialTemperature: number;
  initialTemperatureStdError: number;
  /** Residual standard deviation √(SSR/(n − 3)), in the log's unit. */
  residualStdDev: number;
}

export type NewtonCoolingOutcome =
  | { ok: true; fit: NewtonCoolingFit }
  | { ok: false; reason: 'too-few-points' | 'no-levelling-off' | 'too-fast' | 'flat'; message: string };

function linearPart(t: ArrayLike<number>, temp: ArrayLike<number>, tau: number) {
  const n = t.length;
  let se = 0;
  let see = 0;
  let sy = 0;
  let sey = 0;
  for (let i = 0; i < n; i++) {
    const e = Math.exp(-t[i]! / tau);
    se += e;
    see += e * e;
    sy += temp[i]!;
    sey += e * temp[i]!;
  }
  const det = n * see - se * se;
  const b = det > 0 ? (n * sey - se * sy) / det : 0;
  const a = (sy - b * se) / n;
  let ssr = 0;
  for (let i = 0; i < n; i++) ssr += (temp[i]! - a - b * Math.exp(-t[i]! / tau)) ** 2;
  return { a, b, ssr };
}

/**
 * Fits Newton's law of cooling (or heating) to readings at strictly increasing times in seconds; returns
 * the fit, or a reason and message when the log is too short, does not level off within 10 times its
 * length, changes faster than its sampling resolves, or is flat.
 */
export function newtonCoolingFit(timeS: ArrayLike<number>, temperature: ArrayLike<number>): NewtonCoolingOutcome {
  const n = Math.min(timeS.length, temperature.length);
  if (n < NEWTON_FIT_MIN_POINTS) {
    return {
      ok: false,
      reason: 'too-few-points',
      message: `The fit needs at least ${NEWTON_FIT_MIN_POINTS} readings; this run has ${n}.`,
    };
  }
  const t0 = timeS[0]!;
  const t = Float64Array.from({ length: n }, (_, i) => timeS[i]! - t0);
  const y = Float64Array.from({ length: n }, (_, i) => temperature[i]!);
  const span = t[n - 1]!;
  const minStep = t.reduce((m, v, i) => (i > 0 ? Math.min(m, v - t[i - 1]!) : m), Infinity);
  const lo = Math.log(minStep / 4);
  const hi = Math.log(span * 10);
  const steps = 240;
  let best = 0;
  let bestSsr = Infinity;
  for (let i = 0; i <= steps; i++) {
    const { ssr } = linearPart(t, y, Math.exp(lo + ((hi - lo) * i) / steps));
    if (ssr < bestSsr) [best, bestSsr] = [i, ssr];
  }
  const mean = y.reduce((s, v) => s + v, 0) / n;
  const sst = y.reduce((s, v) => s + (v - mean) ** 2, 0);
  if (!(sst > 0))
    return {
      ok: false,
      reason: 'flat',
      message: 'The temperature does not change in this run; there is nothing to fit.',
    };
  if (best === steps) {
    return {
      ok: false,
      reason: 'no-levelling-off',
      message:
        'The temperature is still changing steadily at the end of the run, so the final temperature cannot be told yet; record until it levels off.',
    };
  }
  if (best === 0) {
    return {
      ok: false,
      reason: 'too-fast',
      message: 'The temperature settles faster than the readings are spaced; take readings more often.',
    };
  }
  // Golden-section search on ln τ between the scan neighbours of the best point (Press et al., Numerical Recipes §10.2).
  let a = lo + ((hi - lo) * (best - 1)) / steps;
  let b = lo + ((hi - lo) * (best + 1)) / steps;
  const g = (Math.sqrt(5) - 1) / 2;
  const ssrAt = (logTau: number) => linearPart(t, y, Math.exp(logTau)).ssr;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = ssrAt(c);
  let fd = ssrAt(d);
  for (let iter = 0; iter < 80 && b - a > 1e-12; iter++) {
    if (fc < fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = ssrAt(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = ssrAt(d);
    }
  }
  const tau = Math.exp((a + b) / 2);
  const lin = linearPart(t, y, tau);
  const rows = Array.from(t, (ti) => {
    const e = Math.exp(-ti / tau);
    return [1, e, (lin.b * ti * e) / (tau * tau)];
  });
  const cov = fitCovariance(rows, lin.ssr);
  const sd = (v: number | undefined) => Math.sqrt(Math.max(0, v ?? NaN));
  return {
    ok: true,
    fit: {
      timeConstantS: tau,
      timeConstantStdErrorS: sd(cov?.[2]?.[2]),
      finalTemperature: lin.a,
      finalTemperatureStdError: sd(cov?.[0]?.[0]),
      initialTemperature: lin.a + lin.b,
      initialTemperatureStdError: cov ? sd(cov[0]![0]! + cov[1]![1]! + 2 * cov[0]![1]!) : NaN,
      residualStdDev: Math.sqrt(lin.ssr / (n - 3)),
    },
  };
}
