import type {} from 'pdfkit';
import { SHEET_STYLE } from './sheet-style';

/** One column: its heading (with unit), width in pt and alignment. */
export interface SheetColumn {
  heading: string;
  unit?: string;
  width: number;
  align?: 'left' | 'right' | 'center';
}

const CELL_PADDING = 3;

function headerHeight(doc: PDFKit.PDFDocument, columns: SheetColumn[]): number {
  doc.font(SHEET_STYLE.fonts.medium).fontSize(SHEET_STYLE.sizes.table);
  const lines = Math.max(...columns.map((c) => (c.unit ? 2 : 1)));
  return lines * doc.currentLineHeight(true) + 2 * CELL_PADDING;
}

function drawHeader(doc: PDFKit.PDFDocument, columns: SheetColumn[], x: number, y: number): number {
  const height = headerHeight(doc, columns);
  const width = columns.reduce((sum, c) => sum + c.width, 0);
  doc.save().rect(x, y, width, height).fill(SHEET_STYLE.colours.tableHead).restore();
  let left = x;
  doc.fillColor(SHEET_STYLE.colours.text).font(SHEET_STYLE.fonts.medium).fontSize(SHEET_STYLE.sizes.table);
  for (const c of columns) {
    const text = c.unit ? `${c.heading}\n${c.unit}` : c.heading;
    doc.text(text, left + CELL_PADDING, y + CELL_PADDING, { width: c.width - 2 * CELL_PADDING, align: c.align ?? 'right', lineBreak: true });
    left += c.width;
  }
  doc.moveTo(x, y + height).lineTo(x + width, y + height).lineWidth(0.6).strokeColor(SHEET_STYLE.colours.rule).stroke();
  return y + height;
}

/**
 * Draws a table from the current position, starting a new page (and repeating the heading row) when a row would
 * run into the footer. Leaves the cursor under the table.
 */
export function drawTable(doc: PDFKit.PDFDocument, columns: SheetColumn[], rows: string[][], bottomLimit: number): void {
  const x = doc.page.margins.left;
  const width = columns.reduce((sum, c) => sum + c.width, 0);
  doc.font(SHEET_STYLE.fonts.regular).fontSize(SHEET_STYLE.sizes.table);
  const rowHeight = doc.currentLineHeight(true) + 2 * CELL_PADDING;
  if (doc.y + headerHeight(doc, columns) + rowHeight > bottomLimit) doc.addPage();
  let y = drawHeader(doc, columns, x, doc.y);
  rows.forEach((row, r) => {
    if (y + rowHeight > bottomLimit) {
      doc.addPage();
      y = drawHeader(doc, columns, x, doc.y);
    }
    if (r % 2 === 1) doc.save().rect(x, y, width, rowHeight).fill(SHEET_STYLE.colours.zebra).restore();
    let left = x;
    doc.fillColor(SHEET_STYLE.colours.text).font(SHEET_STYLE.fonts.regular).fontSize(SHEET_STYLE.sizes.table);
    row.forEach((cell, i) => {
      const c = columns[i];
      doc.text(cell, left + CELL_PADDING, y + CELL_PADDING, { width: c.width - 2 * CELL_PADDING, align: c.align ?? 'right', lineBreak: false });
      left += c.width;
    });
    y += rowHeight;
  });
  doc.moveTo(x, y).lineTo(x + width, y).lineWidth(0.6).strokeColor(SHEET_STYLE.colours.rule).stroke();
  doc.x = x;
  doc.y = y + 6;
}
