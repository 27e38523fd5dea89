/**
 * A progress bar on stderr for long work, drawn only when stderr is a terminal (quiet in pipes,
 * logs and tests) and at most ten times a second.
 */

/** Where a progress bar draws; defaults to the process's stderr. */
export interface ProgressStream {
  isTTY?: boolean;
  columns?: number;
  write(text: string): unknown;
}

/** A progress bar for `total` steps of work. */
export class ProgressBar {
  private done = 0;
  private lastDraw = 0;
  private readonly active: boolean;

  /**
   * @param label - what is being done, e.g. `hourly year`
   * @param total - number of steps, > 0
   * @param stream - where to draw; drawn only when `stream.isTTY` is true
   */
  constructor(
    private readonly label: string,
    private readonly total: number,
    private readonly stream: ProgressStream = process.stderr,
  ) {
    this.active = stream.isTTY === true && total > 0;
  }

  /** Advances by `steps` (default 1) and redraws if enough time has passed. */
  tick(steps = 1): void {
    this.done = Math.min(this.total, this.done + steps);
    if (!this.active) return;
    const now = Date.now();
    if (now - this.lastDraw < 100 && this.done < this.total) return;
    this.lastDraw = now;
    this.stream.write(`\r${this.render()}`);
  }

  /** The bar as text, e.g. `hourly year [#########-----------]  45% (9/20)`. */
  render(width = 24): string {
    const share = this.total > 0 ? this.done / this.total : 1;
    const filled = Math.round(share * width);
    return `${this.label} [${'#'.repeat(filled)}${'-'.repeat(width - filled)}] ${String(Math.round(share * 100)).padStart(3)}% (${this.done}/${this.total})`;
  }

  /** Ends the bar: clears its line so that later messages start clean. */
  finish(): void {
    if (!this.active) return;
    const width = Math.max(40, this.render().length);
    this.stream.write(`\r${' '.repeat(width)}\r`);
  }
}
