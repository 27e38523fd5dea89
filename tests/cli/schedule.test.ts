/**
 * The command line's schedule reader on the shared columns (src/schedule/columns.ts): the three
 * header styles read alike, unknown and repeated headers are named, row errors name the line and
 * the column as the file writes it. Test data: tests/schedule/styles.ts (invented windows).
 */
import { scheduleFromCsv, windowFromRow } from '../../src/cli/schedule';
import { scheduleCsv } from '../schedule/styles';

const specs = (text: string) => scheduleFromCsv(text, 'w.csv').map((r) => windowFromRow(r).spec);
const HEAD = 'Window,Year,Faces [°],Width [m],Height [m],SHGC,Latitude,Longitude,UTC offset,Linke turbidity';

describe('sunpane schedule reads the shared columns', () => {
  test('the pane\'s former words and the window file\'s names read like the shared headers', () => {
    expect(specs(scheduleCsv('paneWords'))).toEqual(specs(scheduleCsv('shared')));
    expect(specs(scheduleCsv('fileNames'))).toEqual(specs(scheduleCsv('shared')));
  });

  test('every unknown header is named, and a column named twice is refused', () => {
    expect(() => scheduleFromCsv('Window,Bearing,Wide\nA,1,2\n', 'w.csv')).toThrow('w.csv line 1: unknown columns "Bearing", "Wide" (see `sunpane schedule --help` for the columns)');
    expect(() => scheduleFromCsv('name,Faces,surfaceAzimuth\nA,1,2\n', 'w.csv')).toThrow('w.csv line 1: columns "Faces" and "surfaceAzimuth" are the same column; keep one');
    expect(() => scheduleFromCsv('Faces\n1\n', 'w.csv')).toThrow('w.csv line 1: the header row has no "Name" column');
  });

  test('a fin gap applies to the fins that have a depth; with no fin at all it asks for the fin depth', () => {
    const [one] = specs(`${HEAD},Right fin depth,Fin gap\nA,2026,180,1,1,0.4,50,5,1,3,0.3,0.1\n`);
    expect(one.shading).toEqual({ rightFin: { projection: 0.3, gap: 0.1, extensionAbove: 0, extensionBelow: 0 } });
    expect(() => specs(`${HEAD},Fin depth,Fin gap\nA,2026,180,1,1,0.4,50,5,1,3,,0.1\n`)).toThrow('w.csv line 2 ("A"), column "Fin depth" = blank is not allowed: needed because column "Fin gap" is given for the fins (0 for no fins)');
    expect(() => specs(`${HEAD},Fin gap\nA,2026,180,1,1,0.4,50,5,1,3,0.1\n`)).toThrow('w.csv line 2 ("A"), column "Fin projection [m]" = blank is not allowed: needed because column "Fin gap" is given for the fins (0 for no fins)');
  });

  test('a site beside its own coordinates is refused; a bad list entry names the column', () => {
    expect(() => specs('Window,Year,Faces,Width,Height,SHGC,Site,Latitude\nA,2026,180,1,1,0.4,brackwater,40\n')).toThrow(
      'w.csv line 2 ("A"), column "Latitude" = 40 is not allowed: cannot be given with column "Site": give either an example site or your own latitude, longitude, UTC offset and elevation',
    );
    expect(() => specs(`${HEAD},Skyline\nA,2026,180,1,1,0.4,50,5,1,3,0 x 5\n`)).toThrow('w.csv line 2 ("A"), column "Skyline" (value 2) = "x" is not allowed: must be a number from 0 to 90 °');
  });
});
