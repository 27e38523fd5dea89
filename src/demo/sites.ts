/**
 * Example sites for the demo, the task pane's site picker and the CLI examples.
 *
 * These are EXAMPLES of our own choosing, not a climate database. The coordinates are rounded real
 * locations (to 0.1°), chosen as example locations to cover a spread of climates: temperate north,
 * hot and dry, near-equatorial, southern temperate, beyond the Arctic Circle. The place names are
 * invented and name none of those places; the turbidity and ground reflectance values are invented,
 * typical-looking numbers for a clear-sky demonstration only. Do not use them for design.
 */
import type { Site } from '../core/sun';

/** One invented example site. */
export interface ExampleSite {
  /** Stable key (camelCase) used by the CLI and the pane. */
  id: string;
  /** Fictional place name shown in pickers, always with "(example)". */
  label: string;
  /** One line describing the climate band it stands for. */
  description: string;
  /** The site itself: latitude/longitude [°], utcOffset [h], elevation [m]. */
  site: Site;
  /** Invented Linke turbidity per month (12 values, January first) for a clear-sky demonstration. */
  linkeTurbidity: readonly number[];
  /** Invented ground reflectance 0…1 for the demonstration. */
  groundAlbedo: number;
}

function site(latitude: number, longitude: number, utcOffset: number, elevation: number): Site {
  return Object.freeze({ latitude, longitude, utcOffset, elevation });
}

/** The example sites, northern hemisphere first. */
export const EXAMPLE_SITES: readonly ExampleSite[] = Object.freeze([
  {
    id: 'brackwater',
    label: 'Brackwater (example)',
    description: 'temperate north, mid latitude, mild summers',
    site: site(52.2, 4.9, 1, 5),
    linkeTurbidity: [2.8, 3.0, 3.2, 3.4, 3.6, 3.7, 3.8, 3.7, 3.4, 3.2, 3.0, 2.8],
    groundAlbedo: 0.2,
  },
  {
    id: 'saltReach',
    label: 'Salt Reach (example)',
    description: 'hot and dry, subtropical north, high sun',
    site: site(24.6, 54.6, 4, 20),
    linkeTurbidity: [4.0, 4.2, 4.5, 4.8, 5.0, 5.2, 5.4, 5.3, 5.0, 4.6, 4.2, 4.0],
    groundAlbedo: 0.3,
  },
  {
    id: 'paluMerah',
    label: 'Palu Merah (example)',
    description: 'near the equator, humid, sun overhead twice a year',
    site: site(1.4, 103.9, 8, 15),
    linkeTurbidity: [4.2, 4.2, 4.3, 4.4, 4.5, 4.5, 4.5, 4.6, 4.6, 4.5, 4.4, 4.3],
    groundAlbedo: 0.18,
  },
  {
    id: 'kestrelHeads',
    label: 'Kestrel Heads (example)',
    description: 'southern temperate, the sun in the north at noon',
    site: site(-37.9, 145.0, 10, 40),
    linkeTurbidity: [3.4, 3.3, 3.1, 2.9, 2.7, 2.6, 2.6, 2.7, 2.9, 3.1, 3.3, 3.4],
    groundAlbedo: 0.2,
  },
  {
    id: 'northFell',
    label: 'North Fell (example)',
    description: 'beyond the Arctic Circle: midnight sun in June, polar night in December',
    site: site(69.6, 18.9, 1, 10),
    linkeTurbidity: [2.2, 2.3, 2.4, 2.6, 2.8, 3.0, 3.0, 2.9, 2.7, 2.5, 2.3, 2.2],
    groundAlbedo: 0.5,
  },
].map((s) => Object.freeze({ ...s, linkeTurbidity: Object.freeze(s.linkeTurbidity) })));

/** Looks an example site up by its id (case-insensitive); undefined when there is none. */
export function findExampleSite(id: string): ExampleSite | undefined {
  const key = id.trim().toLowerCase();
  return EXAMPLE_SITES.find((s) => s.id.toLowerCase() === key);
}
