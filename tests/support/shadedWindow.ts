/**
 * The shaded window the tests (and the benchmark, which keeps its own copy) use when they need every
 * kind of device at once: an overhang, two fins, a reveal and a skyline on a 2 × 1.5 window. The
 * numbers are invented test inputs, not reference values.
 */
import type { Shading } from '../../src/core/shading/types';

export const EVERY_DEVICE_WINDOW = Object.freeze({ width: 2, height: 1.5 });

/** Frozen to the last array, so that no test can change it for the next one (copy it to vary it). */
export const EVERY_DEVICE_SHADING: Shading = Object.freeze({
  overhang: Object.freeze({ projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 }),
  leftFin: Object.freeze({ projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 }),
  rightFin: Object.freeze({ projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 }),
  revealDepth: 0.1,
  skyline: Object.freeze([5, 10, 20, 15, 0, 0, 5, 30]) as number[],
});
