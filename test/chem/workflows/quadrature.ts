/** Composite 5-point Gauss–Legendre quadrature (nodes and weights: Abramowitz & Stegun, Table 25.4). */
const NODES = [-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664];
const WEIGHTS = [0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891];

/** ∫ g over [a, b] in `panels` equal panels (a > b gives the negative of the integral over [b, a]). */
export function integrate(g: (x: number) => number, a: number, b: number, panels: number): number {
  let sum = 0;
  const h = (b - a) / panels;
  for (let i = 0; i < panels; i++) {
    const mid = a + (i + 0.5) * h;
    for (let k = 0; k < NODES.length; k++) sum += WEIGHTS[k] * g(mid + 0.5 * h * NODES[k]);
  }
  return 0.5 * h * sum;
}
