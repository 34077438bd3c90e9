/**
 * Ordinary least-squares helpers shared by the data tools: a straight-line fit with standard uncertainties
 * and a small symmetric-matrix inverse for covariance from a Jacobian. Formulas: Press et al., Numerical
 * Recipes (3rd ed.), §15.2 (straight line) and §15.4–15.5 (covariance s²·(JᵀJ)⁻¹ of a least-squares fit).
 */

/** A straight-line fit y = intercept + slope·x with standard uncertainties from the residual scatter. */
export interface LinearFit {
  slope: number;
  intercept: number;
  /** Standard uncertainty of the slope (same units as slope); NaN with fewer than 3 points. */
  slopeStdError: number;
  /** Standard uncertainty of the intercept; NaN with fewer than 3 points. */
  interceptStdError: number;
  /** Covariance of slope and intercept; NaN with fewer than 3 points. */
  slopeInterceptCovariance: number;
  /** Residual standard deviation s = √(SSR/(n − 2)). */
  residualStdDev: number;
  /** Coefficient of determination R². */
  rSquared: number;
  pointCount: number;
}

/**
 * Fits y = a + b·x by ordinary least squares (unitless: slope in y-units per x-unit); returns null when
 * there are fewer than 2 points or every x is the same.
 */
export function linearFit(x: ArrayLike<number>, y: ArrayLike<number>): LinearFit | null {
  const n = Math.min(x.length, y.length);
  if (n < 2) return null;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i]!;
    my += y[i]!;
  }
  mx /= n;
  my /= n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i]! - mx;
    const dy = y[i]! - my;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  if (!(sxx > 0)) return null;
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  const ssr = Math.max(0, syy - slope * sxy);
  const dof = n - 2;
  const s2 = dof > 0 ? ssr / dof : NaN;
  return {
    slope,
    intercept,
    slopeStdError: Math.sqrt(s2 / sxx),
    interceptStdError: Math.sqrt(s2 * (1 / n + (mx * mx) / sxx)),
    slopeInterceptCovariance: (-mx * s2) / sxx,
    residualStdDev: Math.sqrt(s2),
    rSquared: syy > 0 ? 1 - ssr / syy : 1,
    pointCount: n,
  };
}

/**
 * Inverts a small symmetric positive-definite matrix (row-major, size k×k) by Gauss–Jordan elimination
 * with partial pivoting; returns null when the matrix is singular to working precision.
 */
export function symmetricInverse(matrix: number[][]): number[][] | null {
  const k = matrix.length;
  const a = matrix.map((row, i) => [...row, ...Array.from({ length: k }, (_, j) => (i === j ? 1 : 0))]);
  const scale = Math.max(...matrix.map((row, i) => Math.abs(row[i] ?? 0)), Number.MIN_VALUE);
  for (let col = 0; col < k; col++) {
    let pivot = col;
    for (let r = col + 1; r < k; r++) if (Math.abs(a[r]![col]!) > Math.abs(a[pivot]![col]!)) pivot = r;
    if (Math.abs(a[pivot]![col]!) <= scale * 1e-14) return null;
    [a[col], a[pivot]] = [a[pivot]!, a[col]!];
    const p = a[col]!;
    const pv = p[col]!;
    for (let j = 0; j < 2 * k; j++) p[j] = p[j]! / pv;
    for (let r = 0; r < k; r++) {
      if (r === col) continue;
      const row = a[r]!;
      const f = row[col]!;
      if (f === 0) continue;
      for (let j = 0; j < 2 * k; j++) row[j] = row[j]! - f * p[j]!;
    }
  }
  return a.map((row) => row.slice(k));
}

/**
 * Covariance s²·(JᵀJ)⁻¹ of a least-squares fit from its Jacobian rows (one row per point, one column per
 * parameter) and its sum of squared residuals; null when JᵀJ is singular or there are no spare points.
 */
export function fitCovariance(jacobianRows: ArrayLike<number>[], sumSquaredResiduals: number): number[][] | null {
  const n = jacobianRows.length;
  const k = jacobianRows[0]?.length ?? 0;
  if (k === 0 || n <= k) return null;
  const jtj = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  for (const row of jacobianRows) {
    for (let i = 0; i < k; i++) for (let j = i; j < k; j++) jtj[i]![j]! += row[i]! * row[j]!;
  }
  for (let i = 0; i < k; i++) for (let j = 0; j < i; j++) jtj[i]![j] = jtj[j]![i]!;
  const inv = symmetricInverse(jtj);
  if (!inv) return null;
  const s2 = sumSquaredResiduals / (n - k);
  return inv.map((row) => row.map((v) => v * s2));
}
