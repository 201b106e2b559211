/**
 * Matrix exponential of a small dense square matrix (row-major `Float64Array`, n x n), by scaling and
 * squaring with the [6/6] Padé approximant (Moler & Van Loan 2003, "Nineteen dubious ways to compute
 * the exponential of a matrix", method 3; Golub & Van Loan, Matrix Computations, Algorithm 11.3.1).
 * The matrix is scaled so its infinity norm is at most 1/2, where the [6/6] approximant's relative
 * error bound (Golub & Van Loan, Theorem 11.3.1) is below 1e-16.
 *
 * @param a row-major n x n matrix
 * @param n dimension
 * @returns a new row-major n x n matrix exp(a)
 * @example expm(Float64Array.of(0, 1, -1, 0), 2) // ≈ [cos 1, sin 1, -sin 1, cos 1]
 */
export function expm(a: Float64Array, n: number): Float64Array {
  let norm = 0;
  for (let i = 0; i < n; i++) {
    let row = 0;
    for (let j = 0; j < n; j++) row += Math.abs(a[i * n + j]);
    norm = Math.max(norm, row);
  }
  const squarings = norm > 0.5 ? Math.max(0, Math.ceil(Math.log2(norm / 0.5))) : 0;
  const scale = 2 ** -squarings;
  const x = a.map((v) => v * scale);

  // Padé [q/q] with q = 6: c_k = c_{k-1} (q - k + 1) / (k (2q - k + 1)).
  const q = 6;
  let c = 1;
  const numerator = identity(n);
  const denominator = identity(n);
  let power = identity(n);
  for (let k = 1; k <= q; k++) {
    c = (c * (q - k + 1)) / (k * (2 * q - k + 1));
    power = multiply(power, x, n);
    const sign = k % 2 === 0 ? 1 : -1;
    for (let i = 0; i < n * n; i++) {
      numerator[i] += c * power[i];
      denominator[i] += sign * c * power[i];
    }
  }
  let result = solve(denominator, numerator, n);
  for (let s = 0; s < squarings; s++) result = multiply(result, result, n);
  return result;
}

function identity(n: number): Float64Array {
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) m[i * n + i] = 1;
  return m;
}

function multiply(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      for (let j = 0; j < n; j++) out[i * n + j] += aik * b[k * n + j];
    }
  }
  return out;
}

/** Solves D X = N for X by Gaussian elimination with partial pivoting (D is well conditioned here). */
function solve(d: Float64Array, rhs: Float64Array, n: number): Float64Array {
  const a = Float64Array.from(d);
  const x = Float64Array.from(rhs);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r * n + col]) > Math.abs(a[pivot * n + col])) pivot = r;
    if (pivot !== col) {
      for (let j = 0; j < n; j++) {
        [a[col * n + j], a[pivot * n + j]] = [a[pivot * n + j], a[col * n + j]];
        [x[col * n + j], x[pivot * n + j]] = [x[pivot * n + j], x[col * n + j]];
      }
    }
    const p = a[col * n + col];
    for (let r = 0; r < n; r++) {
      if (r === col) continue;
      const f = a[r * n + col] / p;
      if (f === 0) continue;
      for (let j = 0; j < n; j++) {
        a[r * n + j] -= f * a[col * n + j];
        x[r * n + j] -= f * x[col * n + j];
      }
    }
  }
  for (let r = 0; r < n; r++) {
    const p = a[r * n + r];
    for (let j = 0; j < n; j++) x[r * n + j] /= p;
  }
  return x;
}
