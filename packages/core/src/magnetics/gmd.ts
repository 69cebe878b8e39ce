/**
 * Geometric mean distances (GMD) between plane figures with sides parallel to the axes: the
 * quantity that turns filament formulas into formulas for conductors of finite section
 * (Maxwell, Treatise §691–693; Grover, Inductance Calculations, ch. 2):
 *
 *   ln g = (1/(A1·A2)) ∫_{A1}∫_{A2} ln|p − q| dA dA
 *
 * Both integrals are done in closed form from antiderivatives of ln ρ, ρ = √(x² + y²):
 *
 *   ∂²H/∂x∂y = ln ρ:       H(x, y) = xy·(ln ρ − 3/2) + (x²/2)·atan(y/x) + (y²/2)·atan(x/y)
 *   ∂⁴F/∂x²∂y² = ln ρ:     F(x, y) = ½·[(x²y²/4 − x⁴/24 − y⁴/24)·ln(x² + y²)
 *                                     + (x³y/3)·atan(y/x) + (xy³/3)·atan(x/y) − 25x²y²/24]
 *
 * (both checked symbolically by differentiation). The point–rectangle integral is the
 * alternating sum of H over the four corners; the rectangle–rectangle integral is the
 * alternating sum of F over the 4 × 4 corner offsets. Square: g = 0.44705·a (Grover).
 *
 * Numerics: the sums cancel large terms when the figures are far apart relative to their size
 * (relative error ≈ 1e-16·(ρ/size)⁴); they are meant for near pairs, where GMD and centre
 * distance differ. For ρ/size > 30 the centre distance is returned (the two agree to < 1e-4).
 */

/** An axis-aligned rectangle [x1, x2] × [y1, y2] (here: r and z of a ring's cross-section). */
export interface Rect {
  x1: number;
  x2: number;
  y1: number;
  y2: number;
}

function H(x: number, y: number): number {
  if (x === 0 || y === 0) return 0;
  const r2 = x * x + y * y;
  return x * y * (0.5 * Math.log(r2) - 1.5) + 0.5 * x * x * Math.atan(y / x) + 0.5 * y * y * Math.atan(x / y);
}

function F(x: number, y: number): number {
  x = Math.abs(x);
  y = Math.abs(y);
  if (x === 0 && y === 0) return 0;
  const x2 = x * x;
  const y2 = y * y;
  const L = Math.log(x2 + y2);
  let s = (x2 * y2 / 4 - (x2 * x2) / 24 - (y2 * y2) / 24) * L - (25 / 24) * x2 * y2;
  if (x > 0 && y > 0) s += ((x2 * x) * y / 3) * Math.atan(y / x) + (x * (y2 * y) / 3) * Math.atan(x / y);
  return 0.5 * s;
}

/** ln of the GMD of a point from a rectangle's area. */
export function pointRectLogGmd(px: number, py: number, r: Rect): number {
  const a = r.x1 - px;
  const b = r.x2 - px;
  const c = r.y1 - py;
  const d = r.y2 - py;
  const I = H(b, d) - H(a, d) - H(b, c) + H(a, c);
  return I / ((r.x2 - r.x1) * (r.y2 - r.y1));
}

/** ln of the GMD between the areas of two rectangles (the same rectangle: its GMD from itself). */
export function rectRectLogGmd(p: Rect, q: Rect): number {
  const us = [p.x2 - q.x1, p.x1 - q.x2, p.x1 - q.x1, p.x2 - q.x2];
  const vs = [p.y2 - q.y1, p.y1 - q.y2, p.y1 - q.y1, p.y2 - q.y2];
  const sg = [1, 1, -1, -1];
  let I = 0;
  for (let i = 0; i < 4; i++) {
    let row = 0;
    for (let j = 0; j < 4; j++) row += sg[j] * F(us[i], vs[j]);
    I += sg[i] * row;
  }
  return I / ((p.x2 - p.x1) * (p.y2 - p.y1) * (q.x2 - q.x1) * (q.y2 - q.y1));
}

function size(r: Rect): number {
  return Math.max(r.x2 - r.x1, r.y2 - r.y1);
}

/** GMD between two rectangles, m; the centre distance when they are far apart (see header). */
export function rectRectGmd(p: Rect, q: Rect): number {
  const dx = (p.x1 + p.x2 - q.x1 - q.x2) / 2;
  const dy = (p.y1 + p.y2 - q.y1 - q.y2) / 2;
  const rho = Math.hypot(dx, dy);
  if (rho > 30 * Math.max(size(p), size(q))) return rho;
  return Math.exp(rectRectLogGmd(p, q));
}

/** GMD of a point from a rectangle, m; the centre distance when far apart. */
export function pointRectGmd(px: number, py: number, r: Rect): number {
  const rho = Math.hypot((r.x1 + r.x2) / 2 - px, (r.y1 + r.y2) / 2 - py);
  if (rho > 30 * size(r)) return rho;
  return Math.exp(pointRectLogGmd(px, py, r));
}
