/**
 * Hemispherical (diffuse) average of an angular property, by Gauss–Legendre quadrature.
 */

const { cos, sin, PI } = Math;

/** Gauss–Legendre points per panel. */
export const GAUSS_POINTS = 10;

/** Nodes and weights of n-point Gauss–Legendre quadrature on [−1, 1], by Newton's method on Pₙ. */
export function gaussLegendre(n: number): { nodes: Float64Array; weights: Float64Array } {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let z = cos((PI * (i + 0.75)) / (n + 0.5)); // Abramowitz & Stegun 22.16.6 first guess
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = z;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * z * p1 - (k - 1) * p0) / k; // Bonnet's recursion
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (z * p1 - p0)) / (z * z - 1);
      const dz = p1 / dp;
      z -= dz;
      if (Math.abs(dz) < 1e-15) break;
    }
    nodes[i] = z;
    weights[i] = 2 / ((1 - z * z) * dp * dp);
  }
  return { nodes, weights };
}

const GL = gaussLegendre(GAUSS_POINTS);

/**
 * The hemispherical average of an angular property X(θ) for isotropic (diffuse) irradiance.
 *
 * @param property - X(θ) for the incidence angle θ [°], 0…90
 * @param breakpoints - angles [°] inside (0, 90) where X has a kink or a knot; the integral is split
 * there so each panel is smooth. Without them, 9 equal panels of 10°.
 * @returns 2 ∫₀^{π/2} X(θ) cos θ sin θ dθ [same unit as X]
 * @remarks The cos θ sin θ weight is the projected solid angle of isotropic radiance (Duffie &
 * Beckman, Solar Engineering of Thermal Processes, 4th ed., §5.4). Composite Gauss–Legendre, 10
 * points per panel: exact for polynomials to degree 19 on each panel.
 */
export function hemisphericalAverage(property: (incidence: number) => number, breakpoints: readonly number[] = []): number {
  const edges = [0, ...breakpoints.filter((b) => b > 0 && b < 90), 90].sort((a, b) => a - b);
  if (breakpoints.length === 0) {
    edges.length = 0;
    for (let k = 0; k <= 9; k++) edges.push(10 * k);
  }
  const rad = PI / 180;
  let sum = 0;
  for (let p = 0; p < edges.length - 1; p++) {
    const a = edges[p];
    const b = edges[p + 1];
    if (b <= a) continue;
    const half = (b - a) / 2;
    const mid = (a + b) / 2;
    for (let i = 0; i < GAUSS_POINTS; i++) {
      const thetaDeg = mid + half * GL.nodes[i];
      const thetaRad = thetaDeg * rad;
      sum += GL.weights[i] * half * rad * property(thetaDeg) * cos(thetaRad) * sin(thetaRad);
    }
  }
  return 2 * sum;
}
