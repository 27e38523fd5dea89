/** The progress bar draws only on a terminal. */
import { ProgressBar } from '../../src/cli/progress';

function stream(isTTY: boolean) {
  const writes: string[] = [];
  return { isTTY, writes, write: (t: string) => writes.push(t) };
}

describe('progress bar', () => {
  it('stays silent when stderr is not a terminal', () => {
    const s = stream(false);
    const bar = new ProgressBar('hourly year', 10, s);
    for (let i = 0; i < 10; i++) bar.tick();
    bar.finish();
    expect(s.writes).toEqual([]);
  });

  it('draws on a terminal, always showing completion, and clears its line at the end', () => {
    const s = stream(true);
    const bar = new ProgressBar('windows', 4, s);
    for (let i = 0; i < 4; i++) bar.tick();
    bar.finish();
    expect(s.writes.length).toBeGreaterThanOrEqual(3);
    expect(s.writes).toContain('\rwindows [########################] 100% (4/4)');
    expect(s.writes[s.writes.length - 1]).toMatch(/^\r +\r$/);
  });

  it('renders the share done as a bar of the given width', () => {
    const bar = new ProgressBar('x', 4, stream(false));
    bar.tick();
    expect(bar.render(8)).toBe('x [##------]  25% (1/4)');
  });
});
