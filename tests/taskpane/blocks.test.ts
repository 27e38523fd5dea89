/** Row blocks, A1 addresses and rounding used to write large tables in pieces. */
import { columnLetters, rangeAddress, roundForSheet, rowBlocks } from '../../src/taskpane/blocks';

describe('row blocks and addresses', () => {
  test('8760 rows in blocks of 1500 make six blocks of 1500 and one of 1260, covering every row once', () => {
    const blocks = rowBlocks(8760, 1500);
    expect(blocks.map((b) => b.end - b.start)).toEqual([1500, 1500, 1500, 1500, 1500, 1260]);
    expect(blocks[0].start).toBe(0);
    for (let i = 1; i < blocks.length; i++) expect(blocks[i].start).toBe(blocks[i - 1].end);
    expect(blocks[blocks.length - 1].end).toBe(8760);
  });

  test('no rows make no blocks, and a bad block size is refused', () => {
    expect(rowBlocks(0, 1000)).toEqual([]);
    expect(() => rowBlocks(10, 0)).toThrow(RangeError);
    expect(() => rowBlocks(-1, 10)).toThrow(RangeError);
  });

  test('column letters run A…Z, AA…AZ, BA…', () => {
    expect([0, 25, 26, 27, 51, 52, 701, 702].map(columnLetters)).toEqual(['A', 'Z', 'AA', 'AB', 'AZ', 'BA', 'ZZ', 'AAA']);
  });

  test('a range address spans its rows and columns from a 0-based corner', () => {
    expect(rangeAddress(4, 0, 8761, 14)).toBe('A5:N8765');
    expect(rangeAddress(0, 0, 1, 1)).toBe('A1');
    expect(() => rangeAddress(0, 0, 0, 1)).toThrow(RangeError);
  });

  test('rounding keeps numbers numbers, turns −0 into 0 and non-finite values into blank cells', () => {
    expect(roundForSheet(12.34567, 2)).toBe(12.35);
    expect(Object.is(roundForSheet(-0.0001, 2), 0)).toBe(true);
    expect(roundForSheet(NaN, 2)).toBe('');
    expect(roundForSheet(Infinity, 1)).toBe('');
  });
});
