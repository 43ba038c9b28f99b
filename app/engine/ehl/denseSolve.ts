/**
 * Solve A x = b in place by Gaussian elimination with partial pivoting (Golub & Van Loan, Matrix
 * Computations, §3.4). A is row-major m×m and is destroyed; b becomes x. Rows whose multiplier is 0
 * are skipped, which makes the identity rows of a cavitated outlet nearly free.
 * @returns false when a pivot is zero or not finite (the system is singular or the state is bad)
 */
export function solveDenseInPlace(a: Float64Array, b: Float64Array, m: number): boolean {
  for (let k = 0; k < m; k++) {
    let piv = k;
    let best = Math.abs(a[k * m + k] as number);
    for (let i = k + 1; i < m; i++) {
      const v = Math.abs(a[i * m + k] as number);
      if (v > best) {
        best = v;
        piv = i;
      }
    }
    if (!(best > 0) || !Number.isFinite(best)) return false;
    if (piv !== k) {
      const rk = k * m, rp = piv * m;
      for (let j = k; j < m; j++) {
        const t = a[rk + j] as number;
        a[rk + j] = a[rp + j] as number;
        a[rp + j] = t;
      }
      const t = b[k] as number;
      b[k] = b[piv] as number;
      b[piv] = t;
    }
    const rk = k * m;
    const inv = 1 / (a[rk + k] as number);
    const bk = b[k] as number;
    for (let i = k + 1; i < m; i++) {
      const ri = i * m;
      const f = (a[ri + k] as number) * inv;
      if (f === 0) continue;
      for (let j = k + 1; j < m; j++) a[ri + j] = (a[ri + j] as number) - f * (a[rk + j] as number);
      b[i] = (b[i] as number) - f * bk;
    }
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
