/**
 * The pane's words about the cooling load of a schedule or an options comparison: the sheet's line
 * saying what the load columns hold (or that no window names a room), and the on-screen summary of
 * the run. Figures are the core's (./engine.ts runYear); nothing is worked out here but the largest
 * and the smallest of them.
 */
import type { WindowSpec } from '../core/gain';
import { LOAD_WORDS } from '../registry/glossary';

/** The room a window's cooling load is worked out for, in words. */
export function roomText(spec: WindowSpec): string {
  const room = spec.room;
  if (room === undefined) return LOAD_WORDS.noRoom;
  return room.construction !== undefined ? `${room.construction} room construction, illustrative series` : "the room's own radiant time series";
}

/** A whole number with thousands grouped, as the status line shows figures. */
function whole(x: number): string {
  return Math.round(x).toLocaleString('en-GB');
}

/** A local serial as `yyyy-mm-dd hh:mm` (the status line's hour of a peak). */
function stampText(serial: number): string {
  const d = new Date(Math.round((serial - 25_569) * 86_400_000));
  const p = (n: number) => String(n).padStart(2, '0');
  return `${d.getUTCFullYear()}-${p(d.getUTCMonth() + 1)}-${p(d.getUTCDate())} ${p(d.getUTCHours())}:${p(d.getUTCMinutes())}`;
}

/** The schedule sheet's line about the cooling load: what the load columns hold, or that no window has a room. */
export function scheduleLoadLine(figures: readonly { annualKWh: number; peakLoadW?: number }[]): string {
  const withRoom = figures.filter((f) => f.peakLoadW !== undefined).length;
  if (withRoom === 0) return `Cooling load: ${LOAD_WORDS.noRoom} (choose a room construction on the Window tab, or give one in the table's Room construction column).`;
  const some = withRoom < figures.length ? ` ${withRoom} of ${figures.length} windows have a room; the others say "${LOAD_WORDS.noRoom}".` : '';
  return `${LOAD_WORDS.peakLoad}: the year’s largest hourly cooling load of each window by the radiant time series, for the room it names.${some}`;
}

/** The pane's on-screen summary of a schedule run: the year's gain in all and the largest peak cooling load, or that there is none. */
export function scheduleSummaryText(names: readonly string[], figures: readonly { annualKWh: number; peakLoadW?: number; peakLoadStamp?: number }[]): string {
  const total = figures.reduce((a, f) => a + f.annualKWh, 0);
  let top = -1;
  figures.forEach((f, i) => {
    if (f.peakLoadW !== undefined && (top < 0 || f.peakLoadW > figures[top].peakLoadW!)) top = i;
  });
  const load =
    top < 0
      ? `cooling load: ${LOAD_WORDS.noRoom}`
      : `largest peak cooling load ${whole(figures[top].peakLoadW!)} W (${names[top]}${figures[top].peakLoadStamp !== undefined ? `, ${stampText(figures[top].peakLoadStamp!)}` : ''})`;
  return `${whole(total)} kWh of solar gain in the year in all; ${load}.`;
}

/** The pane's on-screen summary of a comparison: the option with the lowest peak cooling load and its cut, or that there is no room. */
export function compareSummaryText(results: readonly { label: string; figures: { annualKWh: number; peakLoadW?: number } }[]): string {
  const ref = results[0];
  const options = results.slice(1);
  if (ref === undefined || options.length === 0) return '';
  const leastGain = options.reduce((a, b) => (b.figures.annualKWh < a.figures.annualKWh ? b : a));
  const gainCut = ref.figures.annualKWh > 0 ? (1 - leastGain.figures.annualKWh / ref.figures.annualKWh) * 100 : 0;
  const gain = `least solar gain with "${leastGain.label}", ${whole(leastGain.figures.annualKWh)} kWh/yr (${gainCut.toFixed(0)} % below no shading)`;
  if (ref.figures.peakLoadW === undefined) return `${gain}; cooling load: ${LOAD_WORDS.noRoom}.`;
  const least = options.reduce((a, b) => (b.figures.peakLoadW! < a.figures.peakLoadW! ? b : a));
  const cut = ref.figures.peakLoadW > 0 ? (1 - least.figures.peakLoadW! / ref.figures.peakLoadW) * 100 : 0;
  return `${gain}; lowest peak cooling load with "${least.label}", ${whole(least.figures.peakLoadW!)} W against ${whole(ref.figures.peakLoadW)} W with no shading (${cut.toFixed(0)} % lower).`;
}
