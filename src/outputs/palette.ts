/**
 * Sunpane's own colour tokens for what it writes into workbooks (sheet headings, table headers,
 * colour scales, chart series), as six-digit hex RGB. The pane's own controls follow the Office
 * theme (Fluent design tokens); the data colours are these, everywhere.
 */
export const PALETTE = Object.freeze({
  /** Body text and chart axes. */
  ink: '1D2A33',
  /** Notes and the caution line. */
  note: '5A6470',
  /** Table header fill (deep teal) and its text. */
  headerFill: '1F5C66',
  headerText: 'FFFFFF',
  /** Three-stop colour scale of gain blocks: pale sand → amber → brick. */
  heatLow: 'F7F3E8',
  heatMid: 'F2B441',
  heatHigh: 'A63A1E',
  /** Chart series, in order (apart from the header fill and the colour scale, so a chart's bars are its own). */
  series: Object.freeze(['2E6DA4', 'D9822B', '5B7F2A', '7A4E9C'] as const),
});

/** `#RRGGBB`, as the Excel JavaScript API takes colours. */
export function hexColour(token: string): string {
  return `#${token}`;
}

/** `FFRRGGBB` (opaque ARGB), as the xlsx writer takes colours. */
export function argbColour(token: string): string {
  return `FF${token}`;
}
