/**
 * Charts in the workbooks the command line writes. The workbook writer (ExcelJS 4.4) writes no
 * charts, and no maintained npm library adds them to an existing xlsx package, so this module
 * writes the DrawingML parts of ECMA-376 (Office Open XML, Part 1: §21.2 DrawingML charts, §20.5
 * spreadsheet drawing, §18.3.1.36 the sheet's `drawing` element) into the package ExcelJS made:
 * one chart part per chart (xl/charts/chartN.xml), one drawing part per sheet anchoring its charts
 * between cells (xl/drawings/drawingN.xml), and the relationships and content types that tie them
 * in. Each series refers to its cells by formula and carries their values as a cache, so a
 * program that does not recalculate still draws it.
 */
import JSZip from 'jszip';

/** One series of a bar or column chart. */
export interface ChartSeries {
  /** Reference of the cell holding the series name, e.g. `'Year BW-S1'!$B$4`, and its text. */
  nameRef: string;
  name: string;
  /** References of the category labels and of the values (same length), and their contents. */
  categoriesRef: string;
  categories: readonly string[];
  valuesRef: string;
  values: readonly number[];
  /** Fill colour, six-digit hex RGB. */
  colour: string;
}

/** One chart on a sheet. */
export interface SheetChart {
  sheet: string;
  /** `column`: vertical bars over categories; `bar`: horizontal bars. */
  kind: 'column' | 'bar';
  title: string;
  series: readonly ChartSeries[];
  /** Title of the value axis, e.g. `Solar gain (kWh)`. */
  valueAxisTitle: string;
  /** Number format of the value axis labels. */
  valueFormat: string;
  /** Cells (0-based column and row) of the chart's top-left and bottom-right corners. */
  from: { col: number; row: number };
  to: { col: number; row: number };
}

const NS = {
  c: 'http://schemas.openxmlformats.org/drawingml/2006/chart',
  a: 'http://schemas.openxmlformats.org/drawingml/2006/main',
  r: 'http://schemas.openxmlformats.org/officeDocument/2006/relationships',
  xdr: 'http://schemas.openxmlformats.org/drawingml/2006/spreadsheetDrawing',
  rel: 'http://schemas.openxmlformats.org/package/2006/relationships',
};
const REL_TYPE = {
  drawing: 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/drawing',
  chart: 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/chart',
};
const CONTENT_TYPE = {
  drawing: 'application/vnd.openxmlformats-officedocument.drawing+xml',
  chart: 'application/vnd.openxmlformats-officedocument.drawingml.chart+xml',
};

/** A reference to a block of one column, rows `first`…`last` (1-based), as a chart formula names it. */
export function columnRef(sheet: string, column: string, first: number, last: number): string {
  return `'${sheet.replace(/'/g, "''")}'!$${column}$${first}:$${column}$${last}`;
}

/** A reference to one cell (1-based row). */
export function cellRef(sheet: string, column: string, row: number): string {
  return `'${sheet.replace(/'/g, "''")}'!$${column}$${row}`;
}

/** Text for XML content and attribute values. */
export function xmlText(text: string): string {
  return text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
}

function unescapeXml(text: string): string {
  return text.replace(/&quot;/g, '"').replace(/&apos;/g, "'").replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&amp;/g, '&');
}

function richText(text: string, size: number, bold: boolean): string {
  return `<c:tx><c:rich><a:bodyPr/><a:lstStyle/><a:p><a:pPr><a:defRPr sz="${size}" b="${bold ? 1 : 0}"/></a:pPr><a:r><a:rPr lang="en-GB" sz="${size}" b="${bold ? 1 : 0}"/><a:t>${xmlText(text)}</a:t></a:r></a:p></c:rich></c:tx>`;
}

function strCache(values: readonly string[]): string {
  return `<c:strCache><c:ptCount val="${values.length}"/>${values.map((v, i) => `<c:pt idx="${i}"><c:v>${xmlText(v)}</c:v></c:pt>`).join('')}</c:strCache>`;
}

function numCache(values: readonly number[], format: string): string {
  return `<c:numCache><c:formatCode>${xmlText(format)}</c:formatCode><c:ptCount val="${values.length}"/>${values
    .map((v, i) => (Number.isFinite(v) ? `<c:pt idx="${i}"><c:v>${v}</c:v></c:pt>` : ''))
    .join('')}</c:numCache>`;
}

/** The chart part (a `c:chartSpace`, ECMA-376 Part 1 §21.2.2.29) of one bar or column chart. */
export function chartXml(chart: SheetChart): string {
  if (chart.series.length === 0) throw new Error(`chart "${chart.title}" has no series`);
  for (const s of chart.series) {
    if (s.categories.length !== s.values.length) throw new Error(`chart "${chart.title}", series "${s.name}": ${s.categories.length} categories but ${s.values.length} values`);
  }
  const series = chart.series
    .map(
      (s, i) =>
        `<c:ser><c:idx val="${i}"/><c:order val="${i}"/>` +
        `<c:tx><c:strRef><c:f>${xmlText(s.nameRef)}</c:f>${strCache([s.name])}</c:strRef></c:tx>` +
        `<c:spPr><a:solidFill><a:srgbClr val="${s.colour}"/></a:solidFill></c:spPr>` +
        '<c:invertIfNegative val="0"/>' +
        `<c:cat><c:strRef><c:f>${xmlText(s.categoriesRef)}</c:f>${strCache(s.categories)}</c:strRef></c:cat>` +
        `<c:val><c:numRef><c:f>${xmlText(s.valuesRef)}</c:f>${numCache(s.values, chart.valueFormat)}</c:numRef></c:val>` +
        '</c:ser>',
    )
    .join('');
  const categoryPosition = chart.kind === 'column' ? 'b' : 'l';
  const valuePosition = chart.kind === 'column' ? 'l' : 'b';
  const axisText = '<c:txPr><a:bodyPr/><a:lstStyle/><a:p><a:pPr><a:defRPr sz="900"/></a:pPr><a:endParaRPr lang="en-GB"/></a:p></c:txPr>';
  return (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
    `<c:chartSpace xmlns:c="${NS.c}" xmlns:a="${NS.a}" xmlns:r="${NS.r}">` +
    '<c:roundedCorners val="0"/>' +
    '<c:chart>' +
    `<c:title>${richText(chart.title, 1200, true)}<c:overlay val="0"/></c:title>` +
    '<c:autoTitleDeleted val="0"/>' +
    '<c:plotArea><c:layout/>' +
    `<c:barChart><c:barDir val="${chart.kind === 'column' ? 'col' : 'bar'}"/><c:grouping val="clustered"/><c:varyColors val="0"/>` +
    series +
    '<c:gapWidth val="60"/><c:axId val="50010"/><c:axId val="50020"/></c:barChart>' +
    `<c:catAx><c:axId val="50010"/><c:scaling><c:orientation val="${chart.kind === 'bar' ? 'maxMin' : 'minMax'}"/></c:scaling><c:delete val="0"/><c:axPos val="${categoryPosition}"/>` +
    `<c:numFmt formatCode="General" sourceLinked="0"/><c:majorTickMark val="out"/><c:minorTickMark val="none"/><c:tickLblPos val="nextTo"/>${axisText}` +
    '<c:crossAx val="50020"/><c:crosses val="autoZero"/><c:auto val="1"/><c:lblAlgn val="ctr"/><c:lblOffset val="100"/><c:noMultiLvlLbl val="0"/></c:catAx>' +
    `<c:valAx><c:axId val="50020"/><c:scaling><c:orientation val="minMax"/></c:scaling><c:delete val="0"/><c:axPos val="${valuePosition}"/>` +
    '<c:majorGridlines><c:spPr><a:ln w="6350"><a:solidFill><a:srgbClr val="D9D9D9"/></a:solidFill></a:ln></c:spPr></c:majorGridlines>' +
    `<c:title>${richText(chart.valueAxisTitle, 900, false)}<c:overlay val="0"/></c:title>` +
    `<c:numFmt formatCode="${xmlText(chart.valueFormat)}" sourceLinked="0"/><c:majorTickMark val="out"/><c:minorTickMark val="none"/><c:tickLblPos val="nextTo"/>${axisText}` +
    // Bars run top to bottom in table order (category axis max→min), so the value axis crosses at the last category: the bottom.
    `<c:crossAx val="50010"/><c:crosses val="${chart.kind === 'bar' ? 'max' : 'autoZero'}"/><c:crossBetween val="between"/></c:valAx>` +
    '</c:plotArea>' +
    `<c:legend><c:legendPos val="b"/><c:overlay val="0"/></c:legend>` +
    '<c:plotVisOnly val="1"/><c:dispBlanksAs val="gap"/>' +
    '</c:chart>' +
    '</c:chartSpace>'
  );
}

/** The drawing part of one sheet: each chart in a two-cell anchor (ECMA-376 Part 1 §20.5.2.33). */
export function drawingXml(charts: readonly { chart: SheetChart; relId: string; id: number }[]): string {
  const anchors = charts
    .map(
      ({ chart, relId, id }) =>
        '<xdr:twoCellAnchor editAs="oneCell">' +
        `<xdr:from><xdr:col>${chart.from.col}</xdr:col><xdr:colOff>0</xdr:colOff><xdr:row>${chart.from.row}</xdr:row><xdr:rowOff>0</xdr:rowOff></xdr:from>` +
        `<xdr:to><xdr:col>${chart.to.col}</xdr:col><xdr:colOff>0</xdr:colOff><xdr:row>${chart.to.row}</xdr:row><xdr:rowOff>0</xdr:rowOff></xdr:to>` +
        `<xdr:graphicFrame macro=""><xdr:nvGraphicFramePr><xdr:cNvPr id="${id + 1}" name="${xmlText(chart.title)}"/><xdr:cNvGraphicFramePr/></xdr:nvGraphicFramePr>` +
        '<xdr:xfrm><a:off x="0" y="0"/><a:ext cx="0" cy="0"/></xdr:xfrm>' +
        `<a:graphic><a:graphicData uri="${NS.c}"><c:chart xmlns:c="${NS.c}" r:id="${relId}"/></a:graphicData></a:graphic>` +
        '</xdr:graphicFrame><xdr:clientData/></xdr:twoCellAnchor>',
    )
    .join('');
  return `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<xdr:wsDr xmlns:xdr="${NS.xdr}" xmlns:a="${NS.a}" xmlns:r="${NS.r}">${anchors}</xdr:wsDr>`;
}

function relationshipsXml(rels: readonly { id: string; type: string; target: string }[]): string {
  return `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<Relationships xmlns="${NS.rel}">${rels.map((r) => `<Relationship Id="${r.id}" Type="${r.type}" Target="${r.target}"/>`).join('')}</Relationships>`;
}

/** Adds relationships to a .rels part (made when missing); returns the ids given. */
async function addRelationships(zip: JSZip, part: string, rels: readonly { type: string; target: string }[]): Promise<string[]> {
  const existing = await zip.file(part)?.async('string');
  const used = new Set([...(existing ?? '').matchAll(/\bId="([^"]+)"/g)].map((m) => m[1]));
  const added = rels.map((r) => {
    let k = 1;
    while (used.has(`rIdChart${k}`)) k++;
    const id = `rIdChart${k}`;
    used.add(id);
    return { id, ...r };
  });
  const entries = added.map((r) => `<Relationship Id="${r.id}" Type="${r.type}" Target="${r.target}"/>`).join('');
  zip.file(part, existing ? existing.replace('</Relationships>', `${entries}</Relationships>`) : relationshipsXml(added));
  return added.map((r) => r.id);
}

/** Worksheet part of each sheet, by name, from the workbook part and its relationships. */
async function sheetParts(zip: JSZip): Promise<Map<string, string>> {
  const workbook = await zip.file('xl/workbook.xml')!.async('string');
  const rels = await zip.file('xl/_rels/workbook.xml.rels')!.async('string');
  const targets = new Map([...rels.matchAll(/<Relationship\b[^>]*\bId="([^"]+)"[^>]*\bTarget="([^"]+)"/g)].map((m) => [m[1], m[2]]));
  for (const m of rels.matchAll(/<Relationship\b[^>]*\bTarget="([^"]+)"[^>]*\bId="([^"]+)"/g)) targets.set(m[2], m[1]);
  const out = new Map<string, string>();
  for (const m of workbook.matchAll(/<sheet\b([^>]*)\/>/g)) {
    const name = /\bname="([^"]*)"/.exec(m[1])?.[1];
    const rid = /\br:id="([^"]*)"/.exec(m[1])?.[1];
    const target = rid ? targets.get(rid) : undefined;
    if (name !== undefined && target) out.set(unescapeXml(name), `xl/${target.replace(/^\/?xl\//, '').replace(/^\//, '')}`);
  }
  return out;
}

/** Elements that follow `drawing` in a worksheet (ECMA-376 Part 1 §18.3.1.99, CT_Worksheet). */
const AFTER_DRAWING = ['<legacyDrawing', '<legacyDrawingHF', '<drawingHF', '<picture', '<oleObjects', '<controls', '<webPublishItems', '<tableParts', '<extLst', '</worksheet>'];

/**
 * Adds `charts` to the xlsx package `xlsx` (as written by ExcelJS) and returns the new package.
 * @throws Error when a chart names a sheet the workbook does not have, or a sheet already has a drawing
 */
export async function addChartsToXlsx(xlsx: Uint8Array, charts: readonly SheetChart[]): Promise<Uint8Array> {
  if (charts.length === 0) return xlsx;
  const zip = await JSZip.loadAsync(xlsx);
  const parts = await sheetParts(zip);
  const bySheet = new Map<string, SheetChart[]>();
  for (const c of charts) {
    if (!parts.has(c.sheet)) throw new Error(`chart "${c.title}": the workbook has no sheet "${c.sheet}"`);
    bySheet.set(c.sheet, [...(bySheet.get(c.sheet) ?? []), c]);
  }
  let contentTypes = await zip.file('[Content_Types].xml')!.async('string');
  const overrides: string[] = [];
  let chartNo = 0;
  let drawingNo = 0;
  const freeNumber = (folder: string, stem: string, from: number) => {
    let n = from + 1;
    while (zip.file(`xl/${folder}/${stem}${n}.xml`)) n++;
    return n;
  };
  for (const [sheet, list] of bySheet) {
    const sheetPart = parts.get(sheet)!;
    let sheetXml = await zip.file(sheetPart)!.async('string');
    if (sheetXml.includes('<drawing ')) throw new Error(`sheet "${sheet}" already has a drawing`);
    drawingNo = freeNumber('drawings', 'drawing', drawingNo);
    const drawingPart = `xl/drawings/drawing${drawingNo}.xml`;
    const placed: { chart: SheetChart; relId: string; id: number }[] = [];
    const chartTargets: string[] = [];
    for (const chart of list) {
      chartNo = freeNumber('charts', 'chart', chartNo);
      zip.file(`xl/charts/chart${chartNo}.xml`, chartXml(chart));
      overrides.push(`<Override PartName="/xl/charts/chart${chartNo}.xml" ContentType="${CONTENT_TYPE.chart}"/>`);
      chartTargets.push(`../charts/chart${chartNo}.xml`);
    }
    const chartRelIds = await addRelationships(zip, `xl/drawings/_rels/drawing${drawingNo}.xml.rels`, chartTargets.map((target) => ({ type: REL_TYPE.chart, target })));
    list.forEach((chart, i) => placed.push({ chart, relId: chartRelIds[i], id: i + 1 }));
    zip.file(drawingPart, drawingXml(placed));
    overrides.push(`<Override PartName="/${drawingPart}" ContentType="${CONTENT_TYPE.drawing}"/>`);

    const sheetFile = sheetPart.split('/').pop()!;
    const sheetRels = `${sheetPart.slice(0, -sheetFile.length)}_rels/${sheetFile}.rels`;
    const [drawingRelId] = await addRelationships(zip, sheetRels, [{ type: REL_TYPE.drawing, target: `../drawings/drawing${drawingNo}.xml` }]);
    if (!/<worksheet\b[^>]*\bxmlns:r=/.test(sheetXml)) sheetXml = sheetXml.replace(/<worksheet\b/, `<worksheet xmlns:r="${NS.r}"`);
    const at = Math.min(...AFTER_DRAWING.map((tag) => sheetXml.indexOf(tag)).filter((i) => i >= 0));
    sheetXml = `${sheetXml.slice(0, at)}<drawing r:id="${drawingRelId}"/>${sheetXml.slice(at)}`;
    zip.file(sheetPart, sheetXml);
  }
  contentTypes = contentTypes.replace('</Types>', `${overrides.join('')}</Types>`);
  zip.file('[Content_Types].xml', contentTypes);
  return zip.generateAsync({ type: 'uint8array', compression: 'DEFLATE' });
}
