/**
 * Window descriptions shared by the gain, annual and design-day tests. The numbers are invented
 * test inputs (a plausible window and clear sky), not reference values.
 */
import type { WindowSpec } from '../../../src/core/gain/window';
import { EVERY_DEVICE_SHADING } from '../../support/shadedWindow';

export function baseSpec(overrides: Partial<WindowSpec> = {}): WindowSpec {
  return {
    name: 'test window',
    site: { latitude: 40, longitude: -105, utcOffset: -7, elevation: 1600 },
    surfaceAzimuth: 180,
    surfaceTilt: 90,
    width: 2,
    height: 1.5,
    frameFraction: 0.1,
    glazing: { shgc: 0.6, panes: 2 },
    shading: {},
    groundAlbedo: 0.2,
    skyModel: 'perez1990',
    weather: { kind: 'ashraeClearSky', tauB: [0.4], tauD: [2.3] },
    year: 2026,
    ...overrides,
  };
}

export function shadedSpec(overrides: Partial<WindowSpec> = {}): WindowSpec {
  return baseSpec({
    shading: structuredClone(EVERY_DEVICE_SHADING),
    ...overrides,
  });
}
