/**
 * Safeguarded Newton iteration on a bracket (Newton step, bisection when the step leaves the
 * bracket or does not shrink it fast enough). Internal helper for the z-factor solvers.
 * After Press, W.H. et al. (2007) Numerical Recipes, 3rd ed., section 9.4 ("rtsafe").
 *
 * @throws Error naming `fn` when f(lo) and f(hi) do not bracket a root or after maxIter steps
 */
export function newtonBracketed(
  fn: string,
  f: (x: number) => number,
  df: (x: number) => number,
  lo: number,
  hi: number,
  x0: number,
  tol = 1e-13,
  maxIter = 200,
): number {
  let flo = f(lo);
  const fhi = f(hi);
  if (flo === 0) return lo;
  if (fhi === 0) return hi;
  if (Math.sign(flo) === Math.sign(fhi)) {
    throw new Error(`${fn}: root not bracketed in [${lo}, ${hi}]`);
  }
  // Orient so that f(a) < 0 < f(b).
  let a = flo < 0 ? lo : hi;
  let b = flo < 0 ? hi : lo;
  let x = x0 > Math.min(lo, hi) && x0 < Math.max(lo, hi) ? x0 : 0.5 * (lo + hi);
  let dxOld = Math.abs(hi - lo);
  let dx = dxOld;
  let fx = f(x);
  let dfx = df(x);
  for (let i = 0; i < maxIter; i++) {
    const newtonOut = ((x - b) * dfx - fx) * ((x - a) * dfx - fx) > 0;
    const slow = Math.abs(2 * fx) > Math.abs(dxOld * dfx);
    if (newtonOut || slow) {
      dxOld = dx;
      dx = 0.5 * (b - a);
      x = a + dx;
    } else {
      dxOld = dx;
      dx = fx / dfx;
      x -= dx;
    }
    if (Math.abs(dx) < tol * Math.max(1, Math.abs(x))) return x;
    fx = f(x);
    dfx = df(x);
    if (fx < 0) a = x;
    else b = x;
    flo = fx;
  }
  throw new Error(`${fn}: no convergence after ${maxIter} iterations`);
}
