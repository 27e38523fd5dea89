/**
 * The demo building: an INVENTED two-storey design studio, "Ferngate Studios", placed on two
 * example sites with invented names (rounded real coordinates, src/demo/sites.ts) — Brackwater
 * (temperate north) and Kestrel Heads (southern temperate) — with windows facing all four ways and a
 * few shading choices. Every other number here is made up for the demonstration (typical-looking, not
 * from any real building or product).
 */
import type { Shading } from '../core/shading';
import type { WindowSpec } from '../core/gain';
import { type ExampleSite, findExampleSite } from './sites';

/** Calendar year of the demo's hourly series. */
export const DEMO_YEAR = 2026;

/** The demo building's invented particulars. */
export const DEMO_BUILDING = Object.freeze({
  name: 'Ferngate Studios (fictional)',
  description: 'an invented two-storey design studio with a glazed studio, meeting room, offices and a lounge',
  siteIds: Object.freeze(['brackwater', 'kestrelHeads']),
});

/** One window of the demo schedule, with where it sits. */
export interface DemoWindow {
  /** Short tag used in sheet and table rows, e.g. `BW-S1`. */
  tag: string;
  /** Example site id. */
  siteId: string;
  /** Compass word of the facing direction (N, E, S, W). */
  facing: 'N' | 'E' | 'S' | 'W';
  /** Room it lights. */
  room: string;
  spec: WindowSpec;
}

interface Opening {
  room: string;
  facing: 'N' | 'E' | 'S' | 'W';
  width: number;
  height: number;
  shgc: number;
  shading: Shading;
}

const AZIMUTH = { N: 0, E: 90, S: 180, W: 270 } as const;

/** A neighbouring block to the west-south-west, seen as a skyline of 12 sectors of 30° (invented). */
const NEIGHBOUR_SKYLINE = [0, 0, 0, 0, 0, 0, 0, 8, 14, 6, 0, 0];

/** The openings in the northern-hemisphere layout; on the southern site the plan is mirrored north–south. */
const OPENINGS: readonly Opening[] = [
  { room: 'office', facing: 'S', width: 3.0, height: 1.8, shgc: 0.4, shading: { overhang: { projection: 0.8, gap: 0.3, extensionLeft: 0.4, extensionRight: 0.4 } } },
  { room: 'office', facing: 'S', width: 1.2, height: 1.8, shgc: 0.4, shading: { revealDepth: 0.2 } },
  { room: 'studio', facing: 'N', width: 2.4, height: 2.1, shgc: 0.5, shading: { revealDepth: 0.15 } },
  {
    room: 'meeting room',
    facing: 'E',
    width: 1.8,
    height: 1.6,
    shgc: 0.35,
    shading: {
      leftFin: { projection: 0.5, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      rightFin: { projection: 0.5, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
    },
  },
  {
    room: 'lounge',
    facing: 'W',
    width: 2.0,
    height: 2.0,
    shgc: 0.35,
    shading: {
      overhang: { projection: 0.6, gap: 0.2, extensionLeft: 0.3, extensionRight: 0.3 },
      leftFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      rightFin: { projection: 0.4, gap: 0.1, extensionAbove: 0.2, extensionBelow: 0 },
      skyline: NEIGHBOUR_SKYLINE,
    },
  },
];

function requireSite(id: string): ExampleSite {
  const s = findExampleSite(id);
  if (!s) throw new Error(`internal error: no example site ${id}`);
  return s;
}

const SITE_TAG: Record<string, string> = { brackwater: 'BW', kestrelHeads: 'KH' };
const FLIP = { N: 'S', S: 'N', E: 'E', W: 'W' } as const;

/** A demo window spec on an example site under its invented clear sky. */
export function demoSpec(name: string, site: ExampleSite, facing: keyof typeof AZIMUTH, width: number, height: number, shgc: number, shading: Shading): WindowSpec {
  return {
    name,
    site: { ...site.site },
    surfaceAzimuth: AZIMUTH[facing],
    surfaceTilt: 90,
    width,
    height,
    frameFraction: 0.12,
    glazing: { shgc, panes: 2, interiorAttenuation: 1 },
    shading,
    groundAlbedo: site.groundAlbedo,
    skyModel: 'perez1990',
    weather: { kind: 'ineichenClearSky', linkeTurbidity: [...site.linkeTurbidity] },
    year: DEMO_YEAR,
  };
}

/**
 * The demo window schedule: the same five openings on each site. On the southern site the plan is
 * mirrored so the office still faces the equator (north) and the studio faces the pole (south).
 */
export function demoWindows(): DemoWindow[] {
  const out: DemoWindow[] = [];
  for (const siteId of DEMO_BUILDING.siteIds) {
    const site = requireSite(siteId);
    const south = site.site.latitude < 0;
    for (const o of OPENINGS) {
      const facing = south ? FLIP[o.facing] : o.facing;
      const n = out.filter((w) => w.siteId === siteId && w.facing === facing).length + 1;
      const tag = `${SITE_TAG[siteId]}-${facing}${n}`;
      out.push({ tag, siteId, facing, room: o.room, spec: demoSpec(`${tag} ${o.room}`, site, facing, o.width, o.height, o.shgc, o.shading) });
    }
  }
  return out;
}

/** The window whose hourly year the demo workbook shows in full: the big equator-facing office window on the northern site. */
export const DEMO_HOURLY_TAG = 'BW-S1';

/** One shading option of the comparison. */
export interface ShadingOption {
  option: string;
  shading: Shading;
}

/** The shading options compared on the equator-facing office window (invented sizes). */
export const SHADING_OPTIONS: readonly ShadingOption[] = [
  { option: 'none', shading: {} },
  { option: 'overhang 0.8 m', shading: { overhang: { projection: 0.8, gap: 0.3, extensionLeft: 0.4, extensionRight: 0.4 } } },
  {
    option: 'overhang + fins',
    shading: {
      overhang: { projection: 0.8, gap: 0.3, extensionLeft: 0.4, extensionRight: 0.4 },
      leftFin: { projection: 0.5, gap: 0.1, extensionAbove: 0.3, extensionBelow: 0 },
      rightFin: { projection: 0.5, gap: 0.1, extensionAbove: 0.3, extensionBelow: 0 },
    },
  },
  { option: 'deep reveal 0.4 m', shading: { revealDepth: 0.4 } },
];
