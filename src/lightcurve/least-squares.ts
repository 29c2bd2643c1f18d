/**
 * Weighted linear least squares, w_i = 1 / sigma_i^2: minimise
 * chi^2 = sum w_i (y_i - sum_j X_ij b_j)^2 through the normal equations
 * N b = X^T W y, N = X^T W X, solved by Cholesky after scaling N to unit diagonal
 * (Jacobi scaling, which makes the pivot test independent of the column units). The
 * covariance of b is N^-1 (e.g. Press et al., Numerical Recipes, 3rd ed. 2007,
 * section 15.4). With a handful of columns the normal equations are accurate enough
 * in double precision; a degenerate column is reported by name, not returned as NaN.
 */
import { HesperError } from '../errors.ts';

export interface LeastSquaresFit {
  coefficients: Float64Array;
  /** cols x cols, row-major. */
  covariance: Float64Array;
  chiSquare: number;
  dof: number;
  residuals: Float64Array;
}

/** Smallest pivot of the unit-diagonal normal matrix accepted (relative; our choice). */
const PIVOT_TOLERANCE = 1e-10;

/**
 * Fits y = X b with per-point errors. `matrix` is rows x cols, row-major; `names`
 * names the columns for the error message.
 */
export function weightedLeastSquares(matrix: Float64Array, rows: number, cols: number, y: Float64Array, sigma: Float64Array, names: readonly string[]): LeastSquaresFit {
  if (rows <= cols) {
    throw new HesperError('degenerate-fit', `${rows} usable points for ${cols} model terms: need more points than terms`, [
      { path: 'curve', message: `${rows} usable points for ${cols} model terms: need more points than terms`, value: rows, allowed: `> ${cols}` },
    ]);
  }
  const n = new Float64Array(cols * cols);
  const rhs = new Float64Array(cols);
  for (let r = 0; r < rows; r++) {
    const s = sigma[r]!;
    const w = 1 / (s * s);
    const o = r * cols;
    const wy = w * y[r]!;
    for (let j = 0; j < cols; j++) {
      const xj = matrix[o + j]!;
      if (xj === 0) continue;
      const wxj = w * xj;
      rhs[j] = rhs[j]! + xj * wy;
      for (let k = 0; k <= j; k++) n[j * cols + k] = n[j * cols + k]! + wxj * matrix[o + k]!;
    }
  }
  const scale = new Float64Array(cols);
  for (let j = 0; j < cols; j++) {
    const d = n[j * cols + j]!;
    if (!(d > 0)) throw degenerate(names[j] ?? `column ${j}`, 'has no data (it is zero at every usable point)');
    scale[j] = 1 / Math.sqrt(d);
  }
  // Scaled lower triangle, then in-place Cholesky: A = L L^T.
  const a = new Float64Array(cols * cols);
  for (let j = 0; j < cols; j++) for (let k = 0; k <= j; k++) a[j * cols + k] = n[j * cols + k]! * scale[j]! * scale[k]!;
  for (let j = 0; j < cols; j++) {
    let d = a[j * cols + j]!;
    for (let k = 0; k < j; k++) d -= a[j * cols + k]! ** 2;
    if (!(d > PIVOT_TOLERANCE)) throw degenerate(names[j] ?? `column ${j}`, 'is (nearly) a combination of the other terms over the phases covered');
    const l = Math.sqrt(d);
    a[j * cols + j] = l;
    for (let i = j + 1; i < cols; i++) {
      let v = a[i * cols + j]!;
      for (let k = 0; k < j; k++) v -= a[i * cols + k]! * a[j * cols + k]!;
      a[i * cols + j] = v / l;
    }
  }
  // Inverse of the scaled matrix, column by column: solve L L^T x = e_c.
  const inv = new Float64Array(cols * cols);
  const tmp = new Float64Array(cols);
  for (let c = 0; c < cols; c++) {
    solveCholesky(a, cols, (i) => (i === c ? 1 : 0), tmp);
    for (let i = 0; i < cols; i++) inv[i * cols + c] = tmp[i]!;
  }
  const covariance = new Float64Array(cols * cols);
  for (let i = 0; i < cols; i++) for (let j = 0; j < cols; j++) covariance[i * cols + j] = inv[i * cols + j]! * scale[i]! * scale[j]!;
  const coefficients = new Float64Array(cols);
  solveCholesky(a, cols, (i) => rhs[i]! * scale[i]!, tmp);
  for (let i = 0; i < cols; i++) coefficients[i] = tmp[i]! * scale[i]!;
  const residuals = new Float64Array(rows);
  let chiSquare = 0;
  for (let r = 0; r < rows; r++) {
    let m = 0;
    const o = r * cols;
    for (let j = 0; j < cols; j++) m += matrix[o + j]! * coefficients[j]!;
    const res = y[r]! - m;
    residuals[r] = res;
    chiSquare += (res / sigma[r]!) ** 2;
  }
  return { coefficients, covariance, chiSquare, dof: rows - cols, residuals };
}

/** Forward then back substitution with the lower-triangular factor in `l`. */
function solveCholesky(l: Float64Array, cols: number, b: (i: number) => number, out: Float64Array): void {
  for (let i = 0; i < cols; i++) {
    let v = b(i);
    for (let k = 0; k < i; k++) v -= l[i * cols + k]! * out[k]!;
    out[i] = v / l[i * cols + i]!;
  }
  for (let i = cols - 1; i >= 0; i--) {
    let v = out[i]!;
    for (let k = i + 1; k < cols; k++) v -= l[k * cols + i]! * out[k]!;
    out[i] = v / l[i * cols + i]!;
  }
}

function degenerate(column: string, why: string): HesperError {
  return new HesperError('degenerate-fit', `the ${column} term cannot be fitted: it ${why}`, [
    { path: `model.${column}`, message: `the ${column} term ${why}; check the phase coverage, period, epoch and geometry` },
  ]);
}
