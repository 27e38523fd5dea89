/**
 * Shading options compared: the form's window with up to ten sets of outside shading, each run for
 * the year, against the same window with no overhang, fins or set-back (the skyline, being the
 * surroundings, stays). Figures per option: annual gain, peak gain, the cut in annual gain against
 * the unshaded window, and the mean shaded share of the glass over the hours the sun is in front
 * of the wall (1 − mean sunlit fraction, from the core's annual summary), and how much of the
 * beam and — beside it — of the sky-diffuse and ground-reflected light the option takes away.
 */
import { SunpaneError } from '../core/common';
import type { Shading } from '../core/shading';
import type { WindowSpec } from '../core/gain';
import { withoutPath } from './messages';
import { inGlossaryWords } from '../registry/windowRange';
import { LOAD_WORDS } from '../registry/glossary';
import { readNumberText } from './spec';

/** Most options compared at once (ten shading schemes and the unshaded window: eleven years worked out). */
export const MAX_OPTIONS = 10;

/** One shading option as edited in the pane (texts as typed; blank = 0). */
export interface ShadingOption {
  label: string;
  overhangDepth: string;
  overhangGap: string;
  overhangReach: string;
  leftFinDepth: string;
  rightFinDepth: string;
  finGap: string;
  setBack: string;
}

/** The option boxes, in table order, with our column titles. */
export const OPTION_FIELDS: readonly { key: keyof ShadingOption; title: string; short: string }[] = [
  { key: 'label', title: 'Option', short: 'Name' },
  { key: 'overhangDepth', title: 'Overhang projection (m)', short: 'Overhang (m)' },
  { key: 'overhangGap', title: 'Overhang gap (m)', short: 'Gap above (m)' },
  { key: 'overhangReach', title: 'Overhang extension (m)', short: 'Extension (m)' },
  { key: 'setBack', title: 'Reveal depth (m)', short: 'Reveal (m)' },
  { key: 'leftFinDepth', title: 'Left fin projection (m)', short: 'Left fin (m)' },
  { key: 'rightFinDepth', title: 'Right fin projection (m)', short: 'Right fin (m)' },
  { key: 'finGap', title: 'Fin gap (m)', short: 'Fin gap (m)' },
];

/** Starting options for a new workbook (edit freely). */
export function starterOptions(): ShadingOption[] {
  return [
    { label: 'Short overhang', overhangDepth: '0.5', overhangGap: '0.2', overhangReach: '0.3', leftFinDepth: '0', rightFinDepth: '0', finGap: '0', setBack: '0' },
    { label: 'Deep overhang', overhangDepth: '1.0', overhangGap: '0.2', overhangReach: '0.5', leftFinDepth: '0', rightFinDepth: '0', finGap: '0', setBack: '0' },
    { label: 'Overhang and fins', overhangDepth: '0.6', overhangGap: '0.2', overhangReach: '0.3', leftFinDepth: '0.4', rightFinDepth: '0.4', finGap: '0.1', setBack: '0' },
  ];
}

function n(text: string): number {
  return (text ?? '').trim() === '' ? 0 : (readNumberText(text) as number);
}

/** The shading set of an option (devices of depth 0 left out), keeping the base window's skyline. */
export function optionShading(option: ShadingOption, skyline?: number[]): Shading {
  const s: Shading = {};
  if (n(option.overhangDepth) !== 0) s.overhang = { projection: n(option.overhangDepth), gap: n(option.overhangGap), extensionLeft: n(option.overhangReach), extensionRight: n(option.overhangReach) };
  if (n(option.leftFinDepth) !== 0) s.leftFin = { projection: n(option.leftFinDepth), gap: n(option.finGap), extensionAbove: 0, extensionBelow: 0 };
  if (n(option.rightFinDepth) !== 0) s.rightFin = { projection: n(option.rightFinDepth), gap: n(option.finGap), extensionAbove: 0, extensionBelow: 0 };
  if (n(option.setBack) !== 0) s.revealDepth = n(option.setBack);
  if (skyline) s.skyline = skyline;
  return s;
}

/** The column title an option's validation message belongs to (the message names the glossary field). */
export function optionColumnFor(argument: string): string | undefined {
  if (argument.startsWith('overhangProjection')) return 'Overhang projection (m)';
  if (argument.startsWith('overhangGap')) return 'Overhang gap (m)';
  if (argument.startsWith('overhangExtension')) return 'Overhang extension (m)';
  if (argument.startsWith('leftFinProjection')) return 'Left fin projection (m)';
  if (argument.startsWith('rightFinProjection')) return 'Right fin projection (m)';
  if (/^(left|right)Fin/.test(argument)) return 'Fin gap (m)';
  if (argument.startsWith('revealDepth')) return 'Reveal depth (m)';
  return undefined;
}

/**
 * A refused option value, with the message in the user's words too: the option by its number and
 * label, the box by its column title (`Option 2 "Deep overhang", Overhang gap m: "high" is not allowed: …`).
 */
export class OptionProblem extends SunpaneError {
  readonly inUserWords: string;
  constructor(err: SunpaneError, option: number, label: string, column: string | undefined) {
    super(err.argument, err.value, err.allowed, `option ${option} "${label}"${column ? `, column "${column}"` : ''}`);
    this.inUserWords = `Option ${option} "${label}"${column ? `, ${column}` : ''}: ${withoutPath(err.message)}`;
  }
}

/** The specs to run: the unshaded window first, then each option. Throws naming the option. */
export function optionSpecs(base: WindowSpec, options: readonly ShadingOption[], validate: (s: WindowSpec) => void): { label: string; spec: WindowSpec }[] {
  if (options.length > MAX_OPTIONS) throw new SunpaneError('options', options.length, `must be at most ${MAX_OPTIONS} shading options`);
  const skyline = base.shading.skyline;
  const out = [{ label: 'No outside shading', spec: { ...base, shading: skyline ? { skyline } : {} } }];
  options.forEach((o, i) => {
    const label = o.label.trim() || `Option ${i + 1}`;
    out.push({ label, spec: { ...base, name: `${base.name} – ${label}`, shading: optionShading(o, skyline) } });
  });
  out.forEach((o, i) => {
    try {
      validate(o.spec);
    } catch (caught) {
      const err = inGlossaryWords(caught);
      if (!(err instanceof SunpaneError) || i === 0) throw err;
      const column = optionColumnFor(err.argument);
      throw new OptionProblem(err, i, o.label, column);
    }
  });
  return out;
}

/** Figures of one option. */
export interface OptionFigures {
  annualKWh: number;
  peakW: number;
  meanSunlitFraction: number;
  /** Share of the year's beam the option's shading takes away, 0…1 (the core's annual summary). */
  beamCut: number;
  /** Share of the year's sky-diffuse and ground-reflected light it takes away, 0…1. */
  diffuseCut: number;
  /** The year's largest cooling load [W] and its stamp, when the window has a room. */
  peakLoadW?: number;
  peakLoadStamp?: number;
}

/** Header of the comparison table (our own wording): the diffuse cut stands beside the beam cut. */
export const COMPARE_HEADER = ['Shading option', 'Solar gain (kWh/yr)', 'Peak gain (W)', 'Cut vs no shading (%)', 'Beam cut by shading (%)', 'Diffuse cut by shading (%)', 'Shaded share, sun on the wall (0-1)'] as const;

/** The cooling-load columns that follow when the window has a room (the glossary's words). */
export const COMPARE_LOAD_HEADER = [LOAD_WORDS.peakLoad, LOAD_WORDS.peakLoadAtHourEnding, LOAD_WORDS.peakLoadCut] as const;

/** The comparison's header: the cooling-load columns at the end when the window has a room. */
export function compareHeader(withLoad = false): string[] {
  return [...COMPARE_HEADER, ...(withLoad ? COMPARE_LOAD_HEADER : [])];
}

/** Index of the peak cooling load column in a comparison row with the load columns (for its chart). */
export const PEAK_LOAD_COLUMN = COMPARE_HEADER.length;

/**
 * The comparison rows: reference first. Cut = 1 − annual / annual of the unshaded window; beam and
 * diffuse cuts = the share of the year's beam and of its sky and ground light that the option's
 * shading (devices and skyline) takes away from the glass. With `withLoad` (the window has a room,
 * so every option has one), the year's peak cooling load, its hour and the peak load cut
 * = 1 − peak load / peak load of the unshaded window, in %.
 */
export function comparisonRows(results: readonly { label: string; figures: OptionFigures }[], withLoad = false): (number | string)[][] {
  const ref = results[0]?.figures.annualKWh ?? 0;
  const refLoad = results[0]?.figures.peakLoadW ?? 0;
  const round = (x: number, d: number) => Math.round(x * 10 ** d) / 10 ** d;
  return results.map((r) => {
    const f = r.figures;
    const load = !withLoad
      ? []
      : f.peakLoadW === undefined
        ? [LOAD_WORDS.noRoom, '', '']
        : [round(f.peakLoadW, 1), f.peakLoadStamp === undefined ? '' : round(f.peakLoadStamp, 6), round(refLoad > 0 ? (1 - f.peakLoadW / refLoad) * 100 : 0, 1)];
    return [
      r.label,
      round(f.annualKWh, 1),
      round(f.peakW, 1),
      round(ref > 0 ? (1 - f.annualKWh / ref) * 100 : 0, 1),
      round(f.beamCut * 100, 1),
      round(f.diffuseCut * 100, 1),
      round(1 - f.meanSunlitFraction, 3),
      ...load,
    ];
  });
}

export const COMPARE_FORMATS = ['@', '0.0', '0.0', '0.0', '0.0', '0.0', '0.000'];

/** Number formats of a comparison row with or without the cooling-load columns. */
export function compareFormats(withLoad = false): string[] {
  return [...COMPARE_FORMATS, ...(withLoad ? ['0.0', 'yyyy-mm-dd hh:mm', '0.0'] : [])];
}
