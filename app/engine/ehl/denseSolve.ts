/**
 * LU factorisation with partial pivoting, in place (Golub & Van Loan, Matrix Computations, §3.4):
 * A (row-major m×m) becomes L (unit, below the diagonal) and U; `piv[k]` is the row swapped into k.
 * Rows whose multiplier is 0 are skipped, which makes the identity rows of a cavitated outlet cheap.
 * @returns false when a pivot is zero or not finite (the system is singular or the state is bad)
 */
export function luFactor(a: Float64Array, piv: Int32Array, m: number): boolean {
  for (let k = 0; k < m; k++) {
    let p = k;
    let best = Math.abs(a[k * m + k] as number);
    for (let i = k + 1; i < m; i++) {
      const v = Math.abs(a[i * m + k] as number);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > 0) || !Number.isFinite(best)) return false;
    piv[k] = p;
    const rk = k * m;
    if (p !== k) {
      const rp = p * m;
      for (let j = 0; j < m; j++) {
        const t = a[rk + j] as number;
        a[rk + j] = a[rp + j] as number;
        a[rp + j] = t;
      }
    }
    const inv = 1 / (a[rk + k] as number);
    for (let i = k + 1; i < m; i++) {
      const ri = i * m;
      const f = (a[ri + k] as number) * inv;
      a[ri + k] = f;
      if (f === 0) continue;
      for (let j = k + 1; j < m; j++) a[ri + j] = (a[ri + j] as number) - f * (a[rk + j] as number);
    }
  }
  return true;
}

/** Solve with the factors of {@link luFactor}: b becomes x. Returns false on a non-finite result. */
export function luSolve(a: Float64Array, piv: Int32Array, b: Float64Array, m: number): boolean {
  // The factorisation swapped whole rows, so all interchanges apply to b before L (as LAPACK's getrs).
  for (let k = 0; k < m; k++) {
    const p = piv[k] as number;
    if (p !== k) {
      const t = b[k] as number;
      b[k] = b[p] as number;
      b[p] = t;
    }
  }
  for (let k = 0; k < m; k++) {
    const bk = b[k] as number;
    if (bk === 0) continue;
    for (let i = k + 1; i < m; i++) b[i] = (b[i] as number) - (a[i * m + k] as number) * bk;
  }
  for (let k = m - 1; k >= 0; k--) {
    const rk = k * m;
    let s = b[k] as number;
    for (let j = k + 1; j < m; j++) s -= (a[rk + j] as number) * (b[j] as number);
    const v = s / (a[rk + k] as number);
    if (!Number.isFinite(v)) return false;
    b[k] = v;
  }
  return true;
}
