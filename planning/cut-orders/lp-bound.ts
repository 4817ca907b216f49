/**
 * LP relaxation of the covering problem  min Σ c_j x_j  s.t.  Σ_j a_ij x_j ≥ d_i,  x ≥ 0,
 * solved by a small revised simplex (rows = sizes, so the basis stays tiny).
 */
export interface CoveringBound {
  /** Optimal LP value (a lower bound on any integer plan), rounded down by the safety scaling. */
  value: number;
  /** Dual prices per row, ≥ 0 and scaled so Σ_i a_ij y_i ≤ c_j for every column: y·d bounds any residual d. */
  duals: number[];
}

const EPS = 1e-9;

/**
 * Solves the covering LP. Precondition: for every row i with d_i > 0, some column is the unit vector
 * e_i (the single-garment marker), which gives the starting basis. Columns: `a[j]` (length = rows),
 * costs `c[j]` > 0. Iterations are capped (`maxIterations`, default 5 000); the returned duals are
 * always dual-feasible, so `duals · d` is a valid lower bound even if the cap is hit.
 */
export function solveCoveringLp(a: number[][], c: number[], d: number[], maxIterations = 5000): CoveringBound {
  const m = d.length;
  const unit = new Array<number>(m).fill(-1);
  a.forEach((col, j) => {
    const nz = col.filter((v) => v !== 0);
    if (nz.length === 1 && nz[0] === 1) {
      const i = col.indexOf(1);
      if (unit[i] < 0 || c[j] < c[unit[i]]) unit[i] = j;
    }
  });
  const rows = [...Array(m).keys()].filter((i) => d[i] > 0);
  if (rows.some((i) => unit[i] < 0)) throw new RangeError('covering LP needs a single-garment marker for every size');
  const k = rows.length;
  // Columns 0..n-1 are markers; n + r is the surplus column of row rows[r] (cost 0, −e_r).
  const col = (j: number): number[] => (j < a.length ? rows.map((i) => a[j][i]) : rows.map((_, r) => (r === j - a.length ? -1 : 0)));
  const cost = (j: number): number => (j < a.length ? c[j] : 0);
  const basis = rows.map((i) => unit[i]);
  let binv: number[][] = rows.map((_, r) => rows.map((__, s) => (r === s ? 1 : 0)));
  let xb = rows.map((i) => d[i]);
  for (let it = 0; it < maxIterations; it++) {
    const y = rows.map((_, s) => basis.reduce((acc, bj, r) => acc + cost(bj) * binv[r][s], 0));
    let enter = -1;
    let best = -EPS * 10;
    for (let j = 0; j < a.length + k; j++) {
      const aj = col(j);
      const rc = cost(j) - aj.reduce((acc, v, r) => acc + v * y[r], 0);
      if (rc < best) {
        best = rc;
        enter = j;
      }
    }
    if (enter < 0) break;
    const aj = col(enter);
    const u = binv.map((row) => row.reduce((acc, v, s) => acc + v * aj[s], 0));
    let leave = -1;
    let theta = Infinity;
    u.forEach((ur, r) => {
      if (ur > EPS && xb[r] / ur < theta - EPS) {
        theta = xb[r] / ur;
        leave = r;
      }
    });
    if (leave < 0) break; // unbounded direction cannot occur with c ≥ 0; stop defensively
    const piv = u[leave];
    const newRow = binv[leave].map((v) => v / piv);
    binv = binv.map((row, r) => (r === leave ? newRow : row.map((v, s) => v - u[r] * newRow[s])));
    xb = xb.map((v, r) => (r === leave ? theta : v - u[r] * theta));
    basis[leave] = enter;
  }
  const yRows = rows.map((_, s) => Math.max(0, basis.reduce((acc, bj, r) => acc + cost(bj) * binv[r][s], 0)));
  // Scale so every column is dual-feasible: keeps y·d a true lower bound despite round-off.
  let rho = 1;
  a.forEach((colj, j) => {
    const lhs = rows.reduce((acc, i, r) => acc + colj[i] * yRows[r], 0);
    if (lhs > c[j]) rho = Math.max(rho, lhs / c[j]);
  });
  const duals = new Array<number>(m).fill(0);
  rows.forEach((i, r) => (duals[i] = (yRows[r] / rho) * (1 - 1e-12)));
  return { value: duals.reduce((acc, y, i) => acc + y * d[i], 0), duals };
}
