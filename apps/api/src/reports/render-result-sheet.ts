import PDFDocument from 'pdfkit';
import { DESIGN_CAUTION } from '@tunnelwright/aero';
import { reportFontBytes } from './report-fonts';
import { CHART_HEIGHT_PT, CHART_WIDTH_PT, renderResultCharts } from './result-charts';
import type { ResultConfiguration, ResultSheetData } from './result-sheet-data';
import { formatDate, formatMeasured, formatNumber, formatRange } from './sheet-format';
import { stampPageFurniture } from './sheet-page-furniture';
import { SHEET_STYLE } from './sheet-style';
import { drawTable, type SheetColumn } from './sheet-table';
import { verificationQrPng } from './verification-qr';

/** The two fixed statements every certified sheet carries. */
export const ITEMS_TESTED_STATEMENT = 'Results relate only to the item(s) tested, as received.';
export const REPRODUCTION_STATEMENT = 'Not to be reproduced except in full without the written approval of the laboratory.';
export const END_OF_REPORT_MARK = 'END OF REPORT';

const { page, fonts, sizes, colours } = SHEET_STYLE;
const CONTENT_WIDTH = page.width - page.marginLeft - page.marginRight;
const BOTTOM_LIMIT = page.height - page.marginBottom;

const AREA_KIND: Record<ResultSheetData['article']['referenceAreaKind'], string> = {
  frontal: 'frontal area',
  planform: 'planform area',
  wetted: 'wetted area',
  other: 'stated reference area',
};

function ensureSpace(doc: PDFKit.PDFDocument, height: number): void {
  if (doc.y + height > BOTTOM_LIMIT) doc.addPage();
}

/** A numbered section heading, kept on one page with at least `keepWith` pt of what follows it. */
function section(doc: PDFKit.PDFDocument, number: number, title: string, keepWith = 60): void {
  ensureSpace(doc, 24 + keepWith);
  doc.moveDown(0.6);
  const y = doc.y;
  doc.font(fonts.bold).fontSize(sizes.section).fillColor(colours.accent).text(`${number}  ${title}`, page.marginLeft, y);
  doc
    .moveTo(page.marginLeft, doc.y + 1)
    .lineTo(page.marginLeft + CONTENT_WIDTH, doc.y + 1)
    .lineWidth(0.5)
    .strokeColor(colours.rule)
    .stroke();
  doc.y += 5;
  doc.fillColor(colours.text);
}

/** A label in the left column and its text in the right, as one block. */
function field(doc: PDFKit.PDFDocument, label: string, value: string | string[]): void {
  const text = Array.isArray(value) ? value.join('\n') : value;
  const labelWidth = 128;
  doc.font(fonts.regular).fontSize(sizes.body);
  const height = Math.max(doc.heightOfString(text, { width: CONTENT_WIDTH - labelWidth }), doc.currentLineHeight(true));
  ensureSpace(doc, height + 2);
  const y = doc.y;
  doc.font(fonts.medium).fillColor(colours.muted).text(label, page.marginLeft, y, { width: labelWidth - 8 });
  doc.font(fonts.regular).fillColor(colours.text).text(text, page.marginLeft + labelWidth, y, { width: CONTENT_WIDTH - labelWidth });
  doc.x = page.marginLeft;
  doc.y = y + height + 2.5;
}

function paragraph(doc: PDFKit.PDFDocument, text: string, options: { size?: number; font?: string; colour?: string } = {}): void {
  doc.font(options.font ?? fonts.regular).fontSize(options.size ?? sizes.body);
  ensureSpace(doc, doc.heightOfString(text, { width: CONTENT_WIDTH }));
  doc.fillColor(options.colour ?? colours.text).text(text, page.marginLeft, doc.y, { width: CONTENT_WIDTH });
  doc.moveDown(0.3);
}

/** A framed box of lines, e.g. the statements or the design caution. */
function box(doc: PDFKit.PDFDocument, lines: { text: string; bold?: boolean }[], style: { fill: string; rule: string; text?: string }): void {
  const pad = 7;
  const width = CONTENT_WIDTH - 2 * pad;
  doc.fontSize(sizes.body);
  const heights = lines.map((l) => doc.font(l.bold ? fonts.bold : fonts.regular).heightOfString(l.text, { width }) + 2);
  const height = heights.reduce((a, b) => a + b, 0) + 2 * pad;
  ensureSpace(doc, height + 4);
  const top = doc.y;
  doc.save().rect(page.marginLeft, top, CONTENT_WIDTH, height).fillAndStroke(style.fill, style.rule).restore();
  let y = top + pad;
  lines.forEach((l, i) => {
    doc
      .font(l.bold ? fonts.bold : fonts.regular)
      .fontSize(sizes.body)
      .fillColor(style.text ?? colours.text)
      .text(l.text, page.marginLeft + pad, y, { width });
    y += heights[i];
  });
  doc.fillColor(colours.text);
  doc.x = page.marginLeft;
  doc.y = top + height + 6;
}

function titleBlock(doc: PDFKit.PDFDocument, data: ResultSheetData): void {
  doc.font(fonts.medium).fontSize(sizes.small).fillColor(colours.accent).text('CERTIFIED RESULT SHEET', page.marginLeft, page.marginTop);
  doc.moveDown(0.2);
  doc.font(fonts.bold).fontSize(sizes.title).fillColor(colours.text).text(data.report.title, { width: CONTENT_WIDTH });
  doc.moveDown(0.3);
  const rev = data.report.replaces
    ? `revision ${data.report.revision}, replacing revision ${data.report.replaces.revision} (${data.report.replaces.reason})`
    : `revision ${data.report.revision}`;
  doc
    .font(fonts.medium)
    .fontSize(sizes.body + 1)
    .fillColor(colours.text)
    .text(`Report number ${data.report.number}, ${rev}. Issued ${formatDate(data.dates.issue)}.`);
  doc.moveDown(0.5);
  const successor = data.report.supersededBy;
  if (successor) {
    box(
      doc,
      [
        { text: `SUPERSEDED: this revision is no longer valid.`, bold: true },
        {
          text:
            `It is replaced by report ${successor.number} revision ${successor.revision}, issued ${formatDate(successor.issueDate)} (${successor.reason}). ` +
            `Use the successor; check the current revision at ${data.verificationUrl}.`,
        },
      ],
      { fill: '#fbeceb', rule: colours.warning, text: colours.warning },
    );
  }
}

function range(config: ResultConfiguration, pick: (p: ResultConfiguration['points'][number]) => number, decimals: number): string {
  return formatRange(config.points.map(pick), decimals);
}

function testConditions(doc: PDFKit.PDFDocument, data: ResultSheetData): void {
  const columns: SheetColumn[] = [
    { heading: 'Config.', width: 40, align: 'left' },
    { heading: 'Run', width: 32, align: 'left' },
    { heading: 'Points', width: 32 },
    { heading: 'Barometric p', unit: '[hPa]', width: 64 },
    { heading: 'Air temp.', unit: '[°C]', width: 52 },
    { heading: 'Humidity', unit: '[% RH]', width: 52 },
    { heading: 'Air density', unit: '[kg/m³]', width: 64 },
    { heading: 'Speed V', unit: '[m/s]', width: 58 },
    { heading: 'Dyn. pressure q', unit: '[Pa]', width: 64 },
    { heading: 'Re', unit: '[×10^6]', width: 57 },
  ];
  const rows = data.configurations.map((c) => [
    c.code,
    c.runNumber,
    String(c.points.length),
    range(c, (p) => p.conditions.barometricPressure / 100, 1),
    range(c, (p) => p.conditions.temperature, 1),
    range(c, (p) => p.conditions.relativeHumidity, 0),
    range(c, (p) => p.conditions.density, 4),
    range(c, (p) => p.conditions.speed, 1),
    range(c, (p) => p.conditions.dynamicPressure, 0),
    range(c, (p) => p.conditions.reynoldsNumber / 1e6, 2),
  ]);
  drawTable(doc, columns, rows, BOTTOM_LIMIT);
  paragraph(
    doc,
    'Ranges over the reported points of each configuration. Speed, q and Re are corrected for blockage; Re is based on the reference length. ' +
      'Air state measured in the settling chamber at each point.',
    { size: sizes.small, colour: colours.muted },
  );
}

const SETPOINT_COLUMNS: SheetColumn[] = [
  { heading: 'Point', width: 40, align: 'left' },
  { heading: 'Yaw', unit: '[deg]', width: 55 },
  { heading: 'Speed V', unit: '[m/s]', width: 60 },
  { heading: 'q', unit: '[Pa]', width: 60 },
  { heading: 'Re', unit: '[×10^6]', width: 60 },
  { heading: 'Air density', unit: '[kg/m³]', width: 62 },
  { heading: 'Barometric p', unit: '[hPa]', width: 62 },
  { heading: 'Air temp.', unit: '[°C]', width: 58 },
  { heading: 'Humidity', unit: '[% RH]', width: 58 },
];

const COEFFICIENT_COLUMNS: SheetColumn[] = [
  { heading: 'Point', width: 31, align: 'left' },
  { heading: 'C_D ± U', unit: '[-]', width: 69 },
  { heading: 'C_L ± U', unit: '[-]', width: 69 },
  { heading: 'C_Y ± U', unit: '[-]', width: 69 },
  { heading: 'C_l (roll) ± U', unit: '[-]', width: 69 },
  { heading: 'C_m (pitch) ± U', unit: '[-]', width: 69 },
  { heading: 'C_n (yaw) ± U', unit: '[-]', width: 69 },
  { heading: 'C_D·S ± U', unit: '[m²]', width: 70 },
];

/** Room for a configuration's heading and both its tables, so they stay on one page when they fit on one. */
function configurationHeight(doc: PDFKit.PDFDocument, config: ResultConfiguration): number {
  doc.font(fonts.regular).fontSize(sizes.table);
  const row = doc.currentLineHeight(true) + 6;
  return 30 + 2 * (2 * row + 6) + 2 * config.points.length * row;
}

function configurationResults(doc: PDFKit.PDFDocument, data: ResultSheetData, config: ResultConfiguration): void {
  ensureSpace(doc, Math.min(configurationHeight(doc, config), BOTTOM_LIMIT - page.marginTop));
  doc.moveDown(0.4);
  doc
    .font(fonts.bold)
    .fontSize(sizes.body + 0.8)
    .fillColor(colours.text)
    .text(`Configuration ${config.code}: ${config.label} (run ${config.runNumber}, ${config.sweep === 'yaw' ? 'yaw sweep' : 'speed sweep'})`, page.marginLeft, doc.y);
  paragraph(doc, config.description, { colour: colours.muted });
  const points = [...config.points].sort((a, b) => a.point - b.point);
  drawTable(
    doc,
    SETPOINT_COLUMNS,
    points.map((p) => [
      String(p.point),
      formatNumber(p.yaw, 1),
      formatNumber(p.conditions.speed, 2),
      formatNumber(p.conditions.dynamicPressure, 1),
      formatNumber(p.conditions.reynoldsNumber / 1e6, 3),
      formatNumber(p.conditions.density, 4),
      formatNumber(p.conditions.barometricPressure / 100, 1),
      formatNumber(p.conditions.temperature, 1),
      formatNumber(p.conditions.relativeHumidity, 1),
    ]),
    BOTTOM_LIMIT,
  );
  drawTable(
    doc,
    COEFFICIENT_COLUMNS,
    points.map((p) => [
      String(p.point),
      formatMeasured(p.dragCoefficient, 4),
      formatMeasured(p.liftCoefficient, 4),
      formatMeasured(p.sideForceCoefficient, 4),
      formatMeasured(p.rollingMomentCoefficient, 4),
      formatMeasured(p.pitchingMomentCoefficient, 4),
      formatMeasured(p.yawingMomentCoefficient, 4),
      formatMeasured(p.dragArea, 5),
    ]),
    BOTTOM_LIMIT,
  );
  const excluded = data.exclusions.filter((e) => e.configurationCode === config.code);
  if (excluded.length > 0) {
    paragraph(doc, `Excluded from this table: ${excluded.map((e) => `point ${e.point}`).join(', ')} (see section 8).`, { size: sizes.small, colour: colours.muted });
  }
}

function charts(doc: PDFKit.PDFDocument, data: ResultSheetData): void {
  const images = renderResultCharts(data);
  const list = [images.dragVersusYaw, images.liftVersusYaw, images.sideForceVersusYaw, images.dragVersusReynolds];
  list.forEach((png, i) => {
    ensureSpace(doc, CHART_HEIGHT_PT + 24);
    const y = doc.y;
    doc.image(png, page.marginLeft, y, { width: CHART_WIDTH_PT, height: CHART_HEIGHT_PT });
    doc.y = y + CHART_HEIGHT_PT + 4;
    doc
      .font(fonts.regular)
      .fontSize(sizes.small)
      .fillColor(colours.muted)
      .text(`Figure ${i + 1}. Corrected coefficients at model scale; bars show the expanded uncertainty U (k = 2).`, page.marginLeft, doc.y);
    doc.moveDown(0.8);
  });
  doc.fillColor(colours.text);
}

function statements(doc: PDFKit.PDFDocument): void {
  box(
    doc,
    [
      { text: ITEMS_TESTED_STATEMENT, bold: true },
      { text: REPRODUCTION_STATEMENT, bold: true },
      { text: 'No statement of conformity to a specification was requested, and none is made. No opinions or interpretations are given.' },
    ],
    { fill: '#f3f6f8', rule: colours.rule },
  );
  box(
    doc,
    [
      { text: 'Caution: tunnel results are not design loads.', bold: true },
      {
        text:
          `${DESIGN_CAUTION} The coefficients in this sheet describe the model tested in this tunnel, at model scale and under the ` +
          'stated conditions only.',
      },
    ],
    { fill: colours.cautionFill, rule: colours.cautionRule },
  );
}

function authorisation(doc: PDFKit.PDFDocument, data: ResultSheetData): void {
  ensureSpace(doc, 110);
  const top = doc.y + 4;
  doc.font(fonts.regular).fontSize(sizes.body).fillColor(colours.muted).text('Authorised for issue by', page.marginLeft, top);
  doc.font(fonts.bold).fontSize(sizes.body + 1.5).fillColor(colours.text).text(data.authorisation.name);
  doc.font(fonts.regular).fontSize(sizes.body).text(data.authorisation.role);
  doc.text(`Date of authorisation: ${formatDate(data.authorisation.date)}`);
  doc.text('Authorised electronically in Tunnelwright; the QR code at the foot of each page leads to the record of this authorisation and of the issued file.');
  doc.moveDown(1.2);
  const y = doc.y;
  doc.save().rect(page.marginLeft, y, CONTENT_WIDTH, 22).fill(colours.bandText).restore();
  doc
    .font(fonts.bold)
    .fontSize(sizes.section)
    .fillColor('#ffffff')
    .text(`${END_OF_REPORT_MARK} ${data.report.number}`, page.marginLeft, y + 6, { width: CONTENT_WIDTH, align: 'center' });
  doc.fillColor(colours.text);
  doc.x = page.marginLeft;
  doc.y = y + 28;
}

/**
 * Renders a certified result sheet as an A4 PDF: our own layout with a header band, the report number, "page x of y"
 * and a verification QR code on every page, tables with units and U (k = 2), four charts and a marked end of report.
 * Equal input gives equal bytes: the PDF dates come from the issue date.
 */
export async function renderResultSheet(data: ResultSheetData): Promise<Buffer> {
  const issued = new Date(`${data.dates.issue}T12:00:00Z`);
  const doc = new PDFDocument({
    size: page.size,
    bufferPages: true,
    autoFirstPage: true,
    margins: { top: page.marginTop, bottom: page.marginBottom, left: page.marginLeft, right: page.marginRight },
    info: {
      Title: `${data.report.number} rev. ${data.report.revision}: ${data.report.title}`,
      Author: data.laboratory.name,
      Subject: 'Certified result sheet',
      Creator: 'Tunnelwright',
      Producer: 'Tunnelwright',
      CreationDate: issued,
      ModDate: issued,
    },
    lang: 'en-GB',
    displayTitle: true,
  });
  const fontBytes = reportFontBytes();
  doc.registerFont(fonts.regular, fontBytes.regular);
  doc.registerFont(fonts.medium, fontBytes.medium);
  doc.registerFont(fonts.bold, fontBytes.bold);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const qr = verificationQrPng(data.verificationUrl);

  titleBlock(doc, data);

  section(doc, 1, 'Laboratory and customer');
  field(doc, 'Laboratory', [data.laboratory.name, ...data.laboratory.addressLines, `${data.laboratory.phone} · ${data.laboratory.email}`]);
  field(doc, 'Tests carried out at', data.laboratory.testLocation);
  field(doc, 'Customer', [data.customer.name, ...data.customer.addressLines]);
  field(doc, 'Customer contact', `${data.customer.contactName} · ${data.customer.contactEmail}`);
  field(doc, 'Customer reference', data.customer.orderReference);

  section(doc, 2, 'Item tested');
  field(doc, 'Description', data.article.description);
  field(doc, 'Identification', data.article.identification);
  field(doc, 'Condition on receipt', data.article.conditionOnReceipt);
  field(doc, 'Model scale', `1:${formatNumber(data.article.scale, data.article.scale % 1 === 0 ? 0 : 2)} (results at model scale)`);
  field(
    doc,
    'Reference quantities',
    `Reference area S = ${formatNumber(data.article.referenceArea, 4)} m² (${AREA_KIND[data.article.referenceAreaKind]}); reference length = ${formatNumber(data.article.referenceLength, 3)} m`,
  );

  section(doc, 3, 'Dates');
  field(doc, 'Item received', data.dates.receipt === null ? 'Date of receipt not recorded' : formatDate(data.dates.receipt));
  field(doc, 'Tests performed', data.dates.testDates.map(formatDate).join(', '));
  field(doc, 'Sheet issued', formatDate(data.dates.issue));

  section(doc, 4, 'Method');
  field(doc, 'Documented method', data.method.documentedMethod);
  field(doc, 'Standards followed', data.method.standardsFollowed);
  field(doc, 'Facility', data.method.facility);
  field(doc, 'Balance', data.method.balance);
  field(doc, 'Corrections applied', data.method.correctionMethods);
  field(doc, 'Air density model', data.method.densityModel);
  field(doc, 'Data reduction', data.method.engineVersion);
  field(doc, 'Uncertainty', data.method.uncertaintyMethod);

  section(doc, 5, 'Test conditions', 70 + 16 * data.configurations.length);
  testConditions(doc, data);

  section(doc, 6, 'Results', 200);
  paragraph(
    doc,
    `Corrected coefficients on the reference area S = ${formatNumber(data.article.referenceArea, 4)} m² (${AREA_KIND[data.article.referenceAreaKind]}) and, for moments, ` +
      `the reference length ${formatNumber(data.article.referenceLength, 3)} m. C_D, C_L and C_Y in wind axes; C_l, C_m and C_n in body axes about the moment ` +
      'reference centre. Each value is followed by its expanded uncertainty U (coverage factor k = 2, about 95 %), in the unit of the value. ' +
      'U(C_D·S) is taken as S·U(C_D).',
  );
  for (const config of data.configurations) configurationResults(doc, data, config);

  section(doc, 7, 'Charts');
  charts(doc, data);

  section(doc, 8, 'Deviations, additions and exclusions');
  if (data.deviations.length === 0) field(doc, 'From the method', 'None.');
  for (const d of data.deviations) field(doc, d.kind === 'deviation' ? 'Deviation' : d.kind === 'addition' ? 'Addition' : 'Exclusion', `${d.description}. Reason: ${d.reason}.`);
  field(
    doc,
    'Excluded points',
    data.exclusions.length === 0
      ? 'None: every measured point is reported.'
      : data.exclusions.map((e) => `Configuration ${e.configurationCode}, run ${e.runNumber}, point ${e.point}: ${e.reason}.`),
  );

  section(doc, 9, 'Sampling and external providers');
  field(
    doc,
    'Sampling',
    data.sampling.applicable
      ? `Sampling plan: ${data.sampling.plan}. Method: ${data.sampling.method}. Sampled ${formatDate(data.sampling.date)}.`
      : `Not applicable. ${data.sampling.reason}`,
  );
  field(
    doc,
    'External providers',
    data.externalProviders.length === 0
      ? 'None: all results in this sheet were produced by the laboratory.'
      : data.externalProviders.map((p) => `${p.name}: ${p.activity}. Results from this provider: ${p.affectedResults}.`),
  );

  // Statements and signature stay together on the page that is signed.
  ensureSpace(doc, 280);
  section(doc, 10, 'Statements');
  statements(doc);

  section(doc, 11, 'Authorisation');
  authorisation(doc, data);

  stampPageFurniture(doc, data, qr);
  doc.end();
  return finished;
}
