/** The pane's state saved with the workbook. */
import { PaneStore, SETTINGS_KEY, restoreState } from '../../src/taskpane/persist';

function memoryStore(initial?: unknown) {
  const data: Record<string, unknown> = initial === undefined ? {} : { [SETTINGS_KEY]: initial };
  let saves = 0;
  return {
    data,
    saves: () => saves,
    get: (k: string) => data[k] ?? null,
    set: (k: string, v: unknown) => (data[k] = v),
    saveAsync: (cb?: (r: { status: string }) => void) => {
      saves++;
      cb?.({ status: 'succeeded' });
    },
  };
}

describe('saved pane state', () => {
  test('damaged or foreign entries fall back to defaults; known strings are kept', () => {
    const s = restoreState({ form: { latitude: '10', width: 3, nonsense: 'x' }, options: [{ label: 'A', overhangDepth: 2 }], resultSheets: ['R', 5] });
    expect(s.form.latitude).toBe('10');
    expect(s.form.width).toBe('1.8');
    expect(s.form).not.toHaveProperty('nonsense');
    expect(s.options[0].label).toBe('A');
    expect(typeof s.options[0].overhangDepth).toBe('string');
    expect(s.resultSheets).toEqual(['R']);
    expect(restoreState('garbage').scheduleTable).toBe('WindowList');
  });

  test('the store remembers result sheets without regard to case and saves them with the workbook', async () => {
    const mem = memoryStore();
    const store = new PaneStore(mem);
    store.remember('Window A hourly');
    expect(store.isOurs('WINDOW A HOURLY')).toBe(true);
    expect(store.isOurs('Other')).toBe(false);
    await store.save();
    expect((mem.data[SETTINGS_KEY] as { resultSheets: string[] }).resultSheets).toEqual(['Window A hourly']);
    expect(mem.saves()).toBeGreaterThanOrEqual(1);
    expect(new PaneStore(mem).isOurs('window a hourly')).toBe(true);
  });
});
