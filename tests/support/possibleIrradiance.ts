/**
 * Random irradiance drawn over the whole accepted range, then brought within the physically possible
 * limits at the sun it goes with (Long & Shi 2008, as src/core/sky/qualityLimits.ts has them): the
 * engine refuses anything past them, so a property over "valid inputs" draws from inside them.
 */
import { RAD } from '../../src/core/common';
import { extraterrestrialSpencer, physicalIrradianceLimits } from '../../src/core/sky';

/** DNI and DHI held within the limits at `sunAltitude` [°] on `dayOfYear` (the global too). */
export function withinLimits<T extends { dni: number; dhi: number; sunAltitude: number; dayOfYear: number }>(input: T): T {
  const mu = Math.sin(input.sunAltitude * RAD);
  const l = physicalIrradianceLimits(Math.max(-1, Math.min(1, mu)), extraterrestrialSpencer(input.dayOfYear));
  const dhi = Math.min(input.dhi, l.dhi);
  const dni = Math.min(input.dni, l.dni, mu > 0 ? Math.max(0, (l.ghi - dhi) / mu) : l.dni);
  return { ...input, dni, dhi };
}

/** A global horizontal irradiance held within its limit at `sunZenith` [°] on `dayOfYear`. */
export function globalWithinLimit(ghi: number, sunZenith: number, dayOfYear: number): number {
  const mu = Math.cos(sunZenith * RAD);
  return Math.min(ghi, physicalIrradianceLimits(Math.max(-1, Math.min(1, mu)), extraterrestrialSpencer(dayOfYear)).ghi);
}
