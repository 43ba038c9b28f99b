/**
 * Influence coefficients of the elastic deformation of a half-space under a line load, in Hertz
 * units (X = x/b, P = p/pH, H = hR/b²), for pressure constant over each cell of width Δ:
 *
 *   H_def(X_i) = −(1/π) Σ_j P_j ∫_{X_j−Δ/2}^{X_j+Δ/2} ln|X_i − X′| dX′ = Σ_j K_{|i−j|} P_j
 *
 * With F(u) = u ln|u| − u, K_k = −(1/π)[F(kΔ + Δ/2) − F(kΔ − Δ/2)]. The kernel is Toeplitz, so one
 * array of N values holds the whole matrix (Venner & Lubrecht, Multilevel Methods in Lubrication,
 * Elsevier 2000, ch. 3 and 7 [memory]; the constant of the logarithm is absorbed by H0).
 * @param nodes - number of grid nodes N
 * @param dx - grid spacing Δ in units of the Hertz semi-width
 * @param out - array of length ≥ N, filled with K_0 … K_{N−1}
 */
export function deformationKernel(nodes: number, dx: number, out: Float64Array): Float64Array {
  const f = (u: number): number => (u === 0 ? 0 : u * Math.log(Math.abs(u)) - u);
  for (let k = 0; k < nodes; k++) {
    const a = k * dx;
    out[k] = -(f(a + dx / 2) - f(a - dx / 2)) / Math.PI;
  }
  return out;
}
