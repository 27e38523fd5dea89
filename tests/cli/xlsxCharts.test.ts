/**
 * Charts written into an xlsx package as DrawingML parts (ECMA-376 Part 1 §21.2, §20.5): the parts,
 * relationships and content types are where the standard puts them, every part is well-formed XML,
 * the sheet names its drawing in the right place, and the series refer to their cells with the
 * values cached. (LibreOffice drawing them: tests/libreoffice/print.test.ts.)
 */
import JSZip from 'jszip';
import ExcelJS from 'exceljs';
import { newWorkbook, workbookBytes } from '../../src/cli/workbook';
import { type SheetChart, addChartsToXlsx, cellRef, chartXml, columnRef } from '../../src/cli/xlsxCharts';
import { allElements, localName, parseXml } from '../manifest-xml';

function chartOn(sheet: string): SheetChart {
  return {
    sheet,
    kind: 'column',
    title: 'Gain & loss <by month>',
    valueAxisTitle: 'Solar gain (kWh)',
    valueFormat: '#,##0',
    series: [{ name: 'Gain', nameRef: cellRef(sheet, 'B', 1), categories: ['Jan', 'Feb'], categoriesRef: columnRef(sheet, 'A', 2, 3), values: [12.5, 30], valuesRef: columnRef(sheet, 'B', 2, 3), colour: '2E6DA4' }],
    from: { col: 3, row: 1 },
    to: { col: 9, row: 15 },
  };
}

async function twoSheetBook(): Promise<ExcelJS.Workbook> {
  const wb = newWorkbook('t');
  for (const name of ['First', 'Second sheet']) {
    const ws = wb.addWorksheet(name);
    ws.addTable({ name: name.replace(/\W/g, '_'), ref: 'A1', headerRow: true, columns: [{ name: 'Month' }, { name: 'Gain' }], rows: [['Jan', 12.5], ['Feb', 30]] });
  }
  return wb;
}

describe('charts in the xlsx package', () => {
  test('the chart, drawing, relationships and content types are written and well-formed', async () => {
    const wb = await twoSheetBook();
    const zip = await JSZip.loadAsync(await workbookBytes(wb, [chartOn('Second sheet')]));
    const names = Object.keys(zip.files);
    expect(names).toEqual(expect.arrayContaining(['xl/charts/chart1.xml', 'xl/drawings/drawing1.xml', 'xl/drawings/_rels/drawing1.xml.rels']));
    for (const part of names.filter((n) => n.endsWith('.xml') || n.endsWith('.rels'))) parseXml((await zip.file(part)!.async('string')).replace(/^<\?xml[^>]*\?>\s*/, ''));

    const types = await zip.file('[Content_Types].xml')!.async('string');
    expect(types).toContain('<Override PartName="/xl/charts/chart1.xml" ContentType="application/vnd.openxmlformats-officedocument.drawingml.chart+xml"/>');
    expect(types).toContain('<Override PartName="/xl/drawings/drawing1.xml" ContentType="application/vnd.openxmlformats-officedocument.drawing+xml"/>');

    // The second sheet (sheet2.xml) names the drawing by a relationship of its own, before its table parts.
    const sheet = await zip.file('xl/worksheets/sheet2.xml')!.async('string');
    const id = /<drawing r:id="([^"]+)"\/>/.exec(sheet)![1];
    expect(sheet.indexOf('<drawing ')).toBeLessThan(sheet.indexOf('<tableParts'));
    const rels = await zip.file('xl/worksheets/_rels/sheet2.xml.rels')!.async('string');
    expect(rels).toContain(`Id="${id}" Type="http://schemas.openxmlformats.org/officeDocument/2006/relationships/drawing" Target="../drawings/drawing1.xml"`);
    expect(rels).toMatch(/relationships\/table/); // the table's relationship is kept
    expect(await zip.file('xl/worksheets/sheet1.xml')!.async('string')).not.toContain('<drawing ');

    const drawing = parseXml((await zip.file('xl/drawings/drawing1.xml')!.async('string')).replace(/^<\?xml[^>]*\?>\s*/, ''));
    const from = allElements(drawing).find((e) => localName(e) === 'from')!;
    expect(from.children.map((c) => [localName(c), c.text])).toEqual([['col', '3'], ['colOff', '0'], ['row', '1'], ['rowOff', '0']]);
  });

  test('each series refers to its cells and caches their values; text is escaped', () => {
    const xml = chartXml(chartOn("Bob's sheet"));
    const root = parseXml(xml.replace(/^<\?xml[^>]*\?>\s*/, ''));
    const refs = allElements(root).filter((e) => localName(e) === 'f').map((e) => e.text);
    expect(refs).toEqual(["'Bob''s sheet'!$B$1", "'Bob''s sheet'!$A$2:$A$3", "'Bob''s sheet'!$B$2:$B$3"]);
    const values = allElements(root).filter((e) => localName(e) === 'v').map((e) => e.text);
    expect(values).toEqual(['Gain', 'Jan', 'Feb', '12.5', '30']);
    expect(xml).toContain('Gain &amp; loss &lt;by month&gt;');
    expect(allElements(root).find((e) => localName(e) === 'barDir')!.attributes.val).toBe('col');
  });

  test('a chart on a sheet that is not there, or with values missing, is refused', async () => {
    const wb = await twoSheetBook();
    const bytes = new Uint8Array((await wb.xlsx.writeBuffer()) as ArrayBuffer);
    await expect(addChartsToXlsx(bytes, [chartOn('Nowhere')])).rejects.toThrow('the workbook has no sheet "Nowhere"');
    const short = chartOn('First');
    expect(() => chartXml({ ...short, series: [{ ...short.series[0], values: [1] }] })).toThrow('2 categories but 1 values');
  });

  test('ExcelJS still reads the workbook with its charts', async () => {
    const wb = await twoSheetBook();
    const back = new ExcelJS.Workbook();
    await back.xlsx.load((await workbookBytes(wb, [chartOn('First')])) as unknown as ArrayBuffer);
    expect(back.worksheets.map((w) => w.name)).toEqual(['First', 'Second sheet']);
    // The print area comes back as the absolute block written.
    // The chart spans from cell D2 to the top-left corner of J16: the area ends at I15.
    expect(back.getWorksheet('First')!.pageSetup.printArea).toBe('A1:I15');
  });
});
