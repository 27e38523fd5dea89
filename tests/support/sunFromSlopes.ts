/**
 * The sun position that gives chosen shadow slopes on a wall facing 180° (south): a = tan γ, the
 * shadow's sideways shift per unit depth (γ the horizontal shadow angle, positive with the sun to the
 * right seen from outside), and b = tan Ω, its drop per unit depth (Ω the profile angle). Inverts
 * tan Ω = tan β / cos γ (Duffie & Beckman, Solar Engineering of Thermal Processes, Eq. 1.9.1a), so that
 * hand-worked shadow cases can be stated in the slopes their geometry uses.
 */
const DEG = 180 / Math.PI;

export function sunFromSlopes(a: number, b: number): { altitude: number; azimuth: number } {
  const gamma = Math.atan(a);
  return { altitude: Math.atan(b * Math.cos(gamma)) * DEG, azimuth: 180 - gamma * DEG };
}
