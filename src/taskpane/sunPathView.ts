/**
 * The sun-path tab: draws the diagram for the window on the Window tab, with the shading mask of
 * the whole glass or of one chosen point of it.
 */
import { SunpaneError } from '../core/common';
import type { WindowSpec } from '../core/gain';
import { type DateSystem, utcOffsetText } from '../core/time';
import { byId, h } from './dom';
import { clockAheadOn, shadingMask, sunTracks } from './engine';
import type { FormValues } from './fields';
import type { RunBatch } from './resultSheets';
import { readSheetData } from './sheetData';
import { type SpecValidator, buildWindowSpec, findProblems, isClean, readNumberText } from './spec';
import { inUserWords } from './messages';
import { sunPathLegend, sunPathSvg } from './sunPathSvg';

/** Days whose tracks are drawn: the 21st of June, March (≈ September) and December. */
export const TRACK_DAYS: readonly (readonly [number, number])[] = [
  [6, 21],
  [3, 21],
  [12, 21],
];
const TRACK_LABELS = ['21 Jun', '21 Mar ≈ 23 Sep', '21 Dec'];
/** The days each track stands for: the middle one both equinoxes, whose paths nearly coincide. */
const TRACK_DATES: readonly (readonly (readonly [number, number])[])[] = [[[6, 21]], [[3, 21], [9, 23]], [[12, 21]]];
const MONTH_SHORT = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/** What the drawing says about its hours. */
export interface SunPathTime {
  /** The lines lettered on the picture, under the sky. */
  onPicture: string[];
  /** The sentence under the picture. */
  sentence: string;
  /** The tracks' labels in the key, each with the clock beside it where a daylight-saving rule puts it ahead. */
  trackLabels: string[];
}

/**
 * The hours of the sun path in words. The tracks and their hour dots are in local standard time
 * always, never on the daylight-saving clock: the middle track stands for 21 March and 23 September,
 * which most rules put on different clocks, and a sun-path diagram serves the whole year. Under a
 * rule the picture says so in two lines, the key gives the clock beside each track the rule puts
 * ahead, and the sentence says how to read a dot's hour on the hourly sheet's clock.
 */
export function sunPathTime(spec: WindowSpec): SunPathTime {
  const standard = `local standard time (${utcOffsetText(spec.site.utcOffset)})`;
  const rule = spec.site.daylightSaving;
  if (rule === undefined) {
    return { onPicture: [`Hour dots: ${standard}`], sentence: `Hour dots are ${standard}, as the hourly sheet's stamps.`, trackLabels: [...TRACK_LABELS] };
  }
  const dayText = ([m, d]: readonly [number, number]) => `${d} ${MONTH_SHORT[m - 1]}`;
  const ahead: string[] = [];
  const trackLabels = TRACK_DATES.map((dates, i) => {
    const on = dates.filter(([m, d]) => clockAheadOn(spec, m, d) > 0);
    ahead.push(...on.map(dayText));
    if (on.length === 0) return `${TRACK_LABELS[i]} (clock on standard time)`;
    return on.length === dates.length ? `${TRACK_LABELS[i]} (clock +${rule.shift} h)` : `${TRACK_LABELS[i]} (clock +${rule.shift} h on ${on.map(dayText).join(', ')})`;
  });
  const days = ahead.length <= 1 ? ahead.join('') : `${ahead.slice(0, -1).join(', ')} and ${ahead[ahead.length - 1]}`;
  const sentence =
    ahead.length > 0
      ? `Hour dots are ${standard}, not the clock the hourly sheet is stamped on: the daylight-saving rule puts the clock ${rule.shift} h ahead on ${days}, so on those days a dot's hour reads ${rule.shift} h later on the sheet.`
      : `Hour dots are ${standard}; the daylight-saving rule leaves the clock on standard time on the days drawn.`;
  return { onPicture: [`Hour dots: ${standard},`, 'not the daylight-saving clock'], sentence, trackLabels };
}
const POINT_X = 'From left jamb (m, blank = middle)';
const POINT_Y = 'Above sill (m, blank = middle)';

/** Builds the tab into `panel`; returns the function that (re)draws it and its draw button (for the pane's footer). */
/**
 * @param askDateSystem - the workbook's date system, in which a serial in a daylight-saving box
 *   counts (1900 without it)
 */
export function drawSunPath(doc: Document, panel: HTMLElement, getForm: () => FormValues, validate: SpecValidator, run?: RunBatch, askDateSystem?: () => Promise<DateSystem>): { redraw: () => Promise<void>; drawButton: HTMLButtonElement } {
  const whole = h(doc, 'input', { type: 'radio', name: 'mask-of', id: 'mask-whole', value: 'whole', checked: true });
  const point = h(doc, 'input', { type: 'radio', name: 'mask-of', id: 'mask-point', value: 'point' });
  const px = h(doc, 'input', { type: 'text', id: 'mask-x', autocomplete: 'off', inputmode: 'decimal', 'aria-describedby': 'mask-x-msg' });
  const py = h(doc, 'input', { type: 'text', id: 'mask-y', autocomplete: 'off', inputmode: 'decimal', 'aria-describedby': 'mask-y-msg' });
  const drawButton = h(doc, 'button', { type: 'button', id: 'draw-sun-path', className: 'primary' }, 'Draw the sun path');
  const figure = h(doc, 'div', { id: 'sun-path', className: 'sun-path-box' });
  const caption = h(doc, 'p', { id: 'sun-path-caption', className: 'sun-path-caption' });
  const legend = h(doc, 'ul', { id: 'sun-path-legend', className: 'sun-path-legend', 'aria-label': 'Key to the sun path' });
  /** The key, its track labels as the drawing's hours make them. */
  function renderLegend(trackLabels: readonly string[]): void {
    legend.textContent = '';
    for (const item of sunPathLegend(trackLabels)) {
      const mark = h(doc, 'span', { className: item.kind === 'line' ? 'line' : `swatch${item.band ? ` ${item.band}` : ''}`, 'aria-hidden': 'true' });
      // Colours through the CSS object model: the page's Content-Security-Policy allows no style attributes.
      if (item.kind === 'line') mark.style.borderTopColor = item.colour;
      else if (!item.band) mark.style.backgroundColor = item.colour;
      legend.append(h(doc, 'li', {}, mark, item.label));
    }
  }
  renderLegend(TRACK_LABELS);
  const msg = h(doc, 'div', { id: 'sun-path-msg', className: 'msg general', role: 'alert' });
  panel.append(
    h(doc, 'fieldset', { className: 'inline' },
      h(doc, 'legend', {}, 'Shading mask of'),
      h(doc, 'div', { className: 'radio' }, whole, h(doc, 'label', { for: 'mask-whole' }, 'the whole glass')),
      h(doc, 'div', { className: 'radio' }, point, h(doc, 'label', { for: 'mask-point' }, 'one point of the glass')),
      h(doc, 'div', { className: 'field small' }, h(doc, 'label', { for: 'mask-x' }, POINT_X), px, h(doc, 'div', { className: 'msg', id: 'mask-x-msg' })),
      h(doc, 'div', { className: 'field small' }, h(doc, 'label', { for: 'mask-y' }, POINT_Y), py, h(doc, 'div', { className: 'msg', id: 'mask-y-msg' }))),
    figure,
    caption,
    legend,
    msg,
    h(doc, 'p', { className: 'help' }, 'Centre = sun overhead, rim = horizon, north up. Dots mark whole hours of local standard time, never the daylight-saving clock: under a rule the key gives the clock beside each track it puts ahead. The mask shows, for the sun in each part of the sky, how much of the glass (or the chosen point) is shaded by the overhang, fins and set-back; the skyline is drawn in green.'),
  );

  async function redraw(): Promise<void> {
    const values = getForm();
    msg.textContent = '';
    byId(doc, 'mask-x-msg').textContent = '';
    byId(doc, 'mask-y-msg').textContent = '';
    // The drawing needs the window and the skyline, not the weather or glass tables.
    const geometryOnly: FormValues = { ...values, weatherSource: 'ineichenClearSky', linkeTurbidity: '3', glassModel: 'physical' };
    const dateSystem = askDateSystem ? await askDateSystem() : 1900;
    if (!isClean(findProblems(geometryOnly, validate, undefined, dateSystem))) {
      msg.textContent = 'Fix the marked boxes on the Window tab to draw the sun path.';
      figure.textContent = '';
      return;
    }
    let data = {};
    if (run && (values.skylineAddress ?? '').trim() !== '') {
      try {
        data = await readSheetData(run, geometryOnly);
      } catch (err) {
        msg.textContent = err instanceof SunpaneError ? err.message : String(err);
      }
    }
    const spec = buildWindowSpec(geometryOnly, data, dateSystem);
    let at: { x: number; y: number } | undefined;
    if (point.checked) {
      const x = (px.value ?? '').trim() === '' ? spec.width / 2 : (readNumberText(px.value) as number);
      const y = (py.value ?? '').trim() === '' ? spec.height / 2 : (readNumberText(py.value) as number);
      at = { x, y };
    }
    try {
      const mask = shadingMask(spec, at);
      const tracks = sunTracks(spec, TRACK_DAYS);
      const where = at ? `point ${at.x} m from the left jamb, ${at.y} m above the sill` : 'whole glass';
      const time = sunPathTime(spec);
      const captionText = `${spec.name}, facing ${spec.surfaceAzimuth}°, latitude ${spec.site.latitude}°, ${spec.year}; mask of the ${where}. ${time.sentence}`;
      caption.textContent = captionText;
      renderLegend(time.trackLabels);
      figure.innerHTML = sunPathSvg({
        tracks,
        mask,
        surfaceAzimuth: spec.surfaceAzimuth,
        skyline: spec.shading.skyline,
        caption: captionText,
        timeNote: time.onPicture,
      });
    } catch (err) {
      if (!(err instanceof SunpaneError)) throw err;
      const box = err.argument === 'x' ? 'mask-x-msg' : err.argument === 'y' ? 'mask-y-msg' : undefined;
      if (box) byId(doc, box).textContent = inUserWords(err.message, err.argument === 'x' ? POINT_X : POINT_Y);
      else msg.textContent = err.message;
    }
  }
  drawButton.addEventListener('click', () => void redraw());
  whole.addEventListener('change', () => void redraw());
  point.addEventListener('change', () => void redraw());
  return { redraw, drawButton };
}
