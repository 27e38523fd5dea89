/** Range addresses typed in the pane. */
import { parseRangeAddress } from '../../src/taskpane/addresses';

describe('range addresses', () => {
  test('plain, sheet-qualified and quoted addresses are read; absolute markers are dropped', () => {
    expect(parseRangeAddress('b2:b8761')).toEqual({ sheet: undefined, range: 'B2:B8761' });
    expect(parseRangeAddress('Weather!$C$2:$C$8761')).toEqual({ sheet: 'Weather', range: 'C2:C8761' });
    expect(parseRangeAddress("'My data'!D2:D13")).toEqual({ sheet: 'My data', range: 'D2:D13' });
    expect(parseRangeAddress("'Bob''s'!A1")).toEqual({ sheet: "Bob's", range: 'A1' });
  });

  test('anything else is not an address', () => {
    for (const t of ['', 'B2 to B8761', 'My data!A1', 'A1:B', 'Sheet1!', '1A']) expect(parseRangeAddress(t)).toBeUndefined();
  });
});
