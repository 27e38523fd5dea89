/**
 * The sun-path diagram: an equidistant polar projection of the sky (zenith at the centre, horizon
 * on the rim, north up, bearings clockwise), with the sun's tracks for chosen days, whole-hour
 * marks, the skyline, and the window's shading mask laid under them in bands: sun fully shaded,
 * partly shaded, not shaded, and behind the wall. Pure text out (an SVG string), so it can be
 * drawn in the pane and checked in node alike. Its lettering is at least 12 units high in a
 * 320-unit-wide picture, so it stays 11 px or more wherever the pane shows the picture 300 px wide
 * or wider; the key to its colours is HTML beside it ({@link sunPathLegend}). The sky disc, grid and
 * rim carry classes the pane's stylesheet colours for the light or dark theme.
 */
import type { MaskGrid, SunTrack } from './engine';

/** Our colours for the diagram. */
export const SUN_PATH_COLOURS = {
  open: '#FFFFFF',
  part: ['#FBE7B5', '#F4C462', '#E08A3C'],
  full: '#B6552F',
  behind: '#D9DDE1',
  grid: '#9AA5AE',
  rim: '#38434C',
  window: '#1F5C66',
  skyline: '#4E5B31',
  tracks: ['#C2410C', '#B08900', '#2563A8'],
};

const SIZE = 320;
/** Height of the picture's lettering in its own units (the picture is 320 units wide). */
export const TEXT_SIZE = 12;
/** Height of one line of lettering under the sky [units]. */
const NOTE_LINE = 15;
const CX = 160;
const CY = 160;
const R = 136;

/** Centre-relative position of a sun direction in the projection [px]. */
export function project(altitude: number, azimuth: number): { x: number; y: number } {
  const r = (R * (90 - Math.max(0, Math.min(90, altitude)))) / 90;
  const a = (azimuth * Math.PI) / 180;
  return { x: CX + r * Math.sin(a), y: CY - r * Math.cos(a) };
}

const f = (n: number) => n.toFixed(1);

function sector(az0: number, az1: number, alt0: number, alt1: number): string {
  const p1 = project(alt0, az0);
  const p2 = project(alt0, az1);
  const p3 = project(alt1, az1);
  const p4 = project(alt1, az0);
  const r0 = (R * (90 - alt0)) / 90;
  const r1 = (R * (90 - alt1)) / 90;
  return `M${f(p1.x)} ${f(p1.y)}A${f(r0)} ${f(r0)} 0 0 1 ${f(p2.x)} ${f(p2.y)}L${f(p3.x)} ${f(p3.y)}A${f(r1)} ${f(r1)} 0 0 0 ${f(p4.x)} ${f(p4.y)}Z`;
}

/** What to draw. */
export interface SunPathDrawing {
  tracks: readonly SunTrack[];
  mask?: MaskGrid;
  /** Direction the glass faces [°]. */
  surfaceAzimuth: number;
  /** Skyline elevations for equal sectors clockwise from north [°]. */
  skyline?: readonly number[];
  /** Text under the title, e.g. which mask is shown. */
  caption: string;
  /** Lines lettered under the sky, e.g. the time the hour dots are in. */
  timeNote?: readonly string[];
}

function escapeXml(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

/** The diagram as an SVG document fragment (`<svg>…</svg>`). */
export function sunPathSvg(d: SunPathDrawing): string {
  const c = SUN_PATH_COLOURS;
  const parts: string[] = [];
  const notes = d.timeNote ?? [];
  // The picture grows downwards by one line of lettering per note line.
  const height = SIZE + notes.length * NOTE_LINE;
  parts.push(`<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${SIZE} ${height}" width="100%" role="img" aria-labelledby="sp-title sp-desc" class="sun-path">`);
  parts.push(`<title id="sp-title">Sun path and shading mask</title><desc id="sp-desc">${escapeXml(d.caption)}</desc>`);
  parts.push(`<circle class="sky" cx="${CX}" cy="${CY}" r="${R}" fill="${c.open}"/>`);

  // Mask bands: partly shaded cells in three steps of shaded share (a third, two thirds).
  if (d.mask) {
    const byBand: Record<string, string[]> = { behind: [], part1: [], part2: [], part3: [], full: [] };
    for (const cell of d.mask.cells) {
      if (cell.kind === 'open') continue;
      const shaded = 1 - cell.sunlit;
      const band = cell.kind === 'part' ? (shaded < 1 / 3 ? 'part1' : shaded < 2 / 3 ? 'part2' : 'part3') : cell.kind;
      byBand[band].push(sector(cell.az0, cell.az1, cell.alt0, cell.alt1));
    }
    for (const band of ['behind', 'part1', 'part2', 'part3', 'full'] as const) {
      const colour = band.startsWith('part') ? c.part[Number(band.slice(4)) - 1] : c[band as 'behind' | 'full'];
      const cls = band.startsWith('part') ? `mask-part ${band}` : `mask-${band}`;
      if (byBand[band].length) parts.push(`<path class="${cls}" d="${byBand[band].join('')}" fill="${colour}" stroke="${colour}" stroke-width="0.4"/>`);
    }
  }

  // Skyline: filled from the horizon up to its elevation in each sector.
  if (d.skyline && d.skyline.length > 0) {
    const n = d.skyline.length;
    const paths: string[] = [];
    d.skyline.forEach((e, k) => {
      if (e > 0) paths.push(sector((k * 360) / n, ((k + 1) * 360) / n, 0, e));
    });
    if (paths.length) parts.push(`<path class="skyline" d="${paths.join('')}" fill="${c.skyline}" fill-opacity="0.45" stroke="${c.skyline}" stroke-width="0.6"/>`);
  }

  // Altitude rings and bearing spokes.
  for (const alt of [15, 30, 45, 60, 75]) {
    const r = (R * (90 - alt)) / 90;
    parts.push(`<circle class="grid" cx="${CX}" cy="${CY}" r="${f(r)}" fill="none" stroke="${c.grid}" stroke-width="0.5" stroke-dasharray="${alt % 30 === 0 ? '' : '2 3'}"/>`);
    if (alt % 30 === 0) parts.push(`<text x="${CX + 2}" y="${f(CY - r - 2)}" font-size="${TEXT_SIZE}" fill="${c.rim}">${alt}°</text>`);
  }
  for (let az = 0; az < 360; az += 30) {
    const p = project(0, az);
    parts.push(`<line class="grid" x1="${CX}" y1="${CY}" x2="${f(p.x)}" y2="${f(p.y)}" stroke="${c.grid}" stroke-width="0.4"/>`);
  }
  parts.push(`<circle class="rim" cx="${CX}" cy="${CY}" r="${R}" fill="none" stroke="${c.rim}" stroke-width="1.2"/>`);
  const compass: [string, number][] = [['N', 0], ['E', 90], ['S', 180], ['W', 270]];
  for (const [label, az] of compass) {
    const a = (az * Math.PI) / 180;
    const x = CX + (R + 11) * Math.sin(a);
    const y = CY - (R + 11) * Math.cos(a) + 4;
    parts.push(`<text x="${f(x)}" y="${f(y)}" font-size="${TEXT_SIZE + 1}" font-weight="600" text-anchor="middle" fill="${c.rim}">${label}</text>`);
  }

  // The window's facing direction.
  const w0 = project(90, d.surfaceAzimuth);
  const w1 = project(0, d.surfaceAzimuth);
  parts.push(`<line class="facing" x1="${f(w0.x)}" y1="${f(w0.y)}" x2="${f(w1.x)}" y2="${f(w1.y)}" stroke="${c.window}" stroke-width="2" stroke-dasharray="6 3"/>`);

  // Tracks with whole-hour marks.
  d.tracks.forEach((t, i) => {
    const colour = c.tracks[i % c.tracks.length];
    const runs: string[][] = [];
    let current: string[] = [];
    for (const p of t.points) {
      if (p.altitude > 0) {
        const q = project(p.altitude, p.azimuth);
        current.push(`${f(q.x)},${f(q.y)}`);
      } else if (current.length) {
        runs.push(current);
        current = [];
      }
    }
    if (current.length) runs.push(current);
    for (const run of runs) if (run.length > 1) parts.push(`<polyline class="track" points="${run.join(' ')}" fill="none" stroke="${colour}" stroke-width="1.8"/>`);
    for (const p of t.points) {
      if (p.altitude <= 0 || Math.abs(p.hour - Math.round(p.hour)) > 1e-9 || p.hour >= 24) continue;
      const q = project(p.altitude, p.azimuth);
      parts.push(`<circle class="hour" cx="${f(q.x)}" cy="${f(q.y)}" r="2.2" fill="${colour}"/>`);
      // Every second hour is lettered on the first track, so the labels do not crowd.
      if (i === 0 && p.hour % 2 === 0) parts.push(`<text x="${f(q.x + 3)}" y="${f(q.y - 3)}" font-size="${TEXT_SIZE}" fill="${c.rim}">${p.hour}</text>`);
    }
  });

  notes.forEach((line, k) => parts.push(`<text class="time-note" x="${CX}" y="${SIZE + (k + 1) * NOTE_LINE - 4}" font-size="${TEXT_SIZE}" text-anchor="middle" fill="${c.rim}">${escapeXml(line)}</text>`));

  parts.push('</svg>');
  return parts.join('');
}

/** One entry of the key to the picture. */
export interface LegendEntry {
  label: string;
  colour: string;
  /** A band whose colour follows the pane's theme (the stylesheet's `.swatch.<band>`), if any. */
  band?: 'open' | 'behind';
  /** `line`: a sun track; `swatch`: a band of the shading mask. */
  kind: 'line' | 'swatch';
}

/** The key to the picture's colours: the tracks, then the bands of the shading mask. */
export function sunPathLegend(trackLabels: readonly string[]): LegendEntry[] {
  const c = SUN_PATH_COLOURS;
  return [
    ...trackLabels.map((label, i) => ({ label, colour: c.tracks[i % c.tracks.length], kind: 'line' as const })),
    ...([
      ['not shaded', c.open, 'open'],
      ['less than ⅓ shaded', c.part[0], undefined],
      ['⅓ to ⅔ shaded', c.part[1], undefined],
      ['more than ⅔ shaded', c.part[2], undefined],
      ['fully shaded', c.full, undefined],
      ['sun behind the wall', c.behind, 'behind'],
    ] as const).map(([label, colour, band]) => ({ label, colour, band, kind: 'swatch' as const })),
  ];
}
