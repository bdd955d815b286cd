import type {} from 'pdfkit';
import type { ResultSheetData } from './result-sheet-data';
import { SHEET_STYLE } from './sheet-style';

const { page, band, footer, fonts, sizes, colours } = SHEET_STYLE;

/** "Page 3 of 8", as stamped on every page. */
export function pageLabel(index: number, count: number): string {
  return `Page ${index + 1} of ${count}`;
}

/**
 * Stamps every buffered page with the header band (laboratory, report number and revision, a superseded mark when
 * there is a successor) and the footer (report number, page x of y, verification QR code and address).
 * Call once, after the last page is laid out and before `end()`.
 */
export function stampPageFurniture(doc: PDFKit.PDFDocument, data: ResultSheetData, qrPng: Buffer): void {
  const { start, count } = doc.bufferedPageRange();
  const right = page.width - page.marginRight;
  const width = right - page.marginLeft;
  const reportLabel = `Report ${data.report.number} · Revision ${data.report.revision}`;
  const successor = data.report.supersededBy;
  for (let i = start; i < start + count; i++) {
    doc.switchToPage(i);
    // Writing in the margins must not start a new page.
    const margins = { ...doc.page.margins };
    doc.page.margins = { top: 0, bottom: 0, left: 0, right: 0 };

    doc.save().rect(0, 0, page.width, band.height).fill(colours.band).restore();
    doc.save().rect(0, band.height, page.width, 2).fill(colours.accent).restore();
    doc.font(fonts.bold).fontSize(sizes.band).fillColor(colours.bandText).text(data.laboratory.name, page.marginLeft, 16, { width: width / 2, lineBreak: false });
    doc.font(fonts.regular).fontSize(sizes.small).fillColor(colours.muted).text('Certified result sheet · prepared with Tunnelwright', page.marginLeft, 34, { width: width / 2, lineBreak: false });
    doc.font(fonts.bold).fontSize(sizes.body + 1).fillColor(colours.bandText).text(reportLabel, page.marginLeft + width / 2, 16, { width: width / 2, align: 'right', lineBreak: false });
    if (successor) {
      doc
        .font(fonts.bold)
        .fontSize(sizes.small + 0.5)
        .fillColor(colours.warning)
        .text(`SUPERSEDED by ${successor.number} revision ${successor.revision}`, page.marginLeft + width / 2, 34, { width: width / 2, align: 'right', lineBreak: false });
    } else {
      doc.font(fonts.regular).fontSize(sizes.small).fillColor(colours.muted).text(`Issued ${data.dates.issue}`, page.marginLeft + width / 2, 34, { width: width / 2, align: 'right', lineBreak: false });
    }

    const top = footer.top;
    doc.moveTo(page.marginLeft, top).lineTo(right, top).lineWidth(0.5).strokeColor(colours.rule).stroke();
    const textWidth = width - footer.qrSize - 12;
    doc.font(fonts.bold).fontSize(sizes.body).fillColor(colours.text).text(`${data.report.number} · Rev. ${data.report.revision}`, page.marginLeft, top + 8, { width: textWidth / 2, lineBreak: false });
    doc.font(fonts.bold).fontSize(sizes.body).text(pageLabel(i - start, count), page.marginLeft + textWidth / 2, top + 8, { width: textWidth / 2, align: 'right', lineBreak: false });
    doc.font(fonts.regular).fontSize(sizes.small).fillColor(colours.muted);
    doc.text(`Check this sheet is genuine and current: ${data.verificationUrl}`, page.marginLeft, top + 22, { width: textWidth, lineBreak: false });
    doc.text('Not to be reproduced except in full without the written approval of the laboratory.', page.marginLeft, top + 33, { width: textWidth, lineBreak: false });
    doc.image(qrPng, right - footer.qrSize, top + 4, { width: footer.qrSize, height: footer.qrSize });
    doc.fillColor(colours.text);
    doc.page.margins = margins;
  }
}
