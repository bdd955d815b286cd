import { loadImage, createCanvas } from '@napi-rs/canvas';
import jsQRModule from 'jsqr';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { encodeOpaquePng } from './opaque-png';
import { REPORT_FONT_FILES } from './report-fonts';
import { verificationUrl } from './result-sheet-data';
import { formatDate, formatMeasured, formatNumber, formatRange } from './sheet-format';
import { verificationQrPng } from './verification-qr';
import { woffToSfnt } from './woff-to-sfnt';

const jsQR = (jsQRModule as unknown as { default?: typeof jsQRModule }).default ?? jsQRModule;

async function pixels(png: Buffer): Promise<{ data: Uint8ClampedArray; width: number; height: number }> {
  const image = await loadImage(png);
  const canvas = createCanvas(image.width, image.height);
  const ctx = canvas.getContext('2d');
  ctx.drawImage(image, 0, 0);
  const { data, width, height } = ctx.getImageData(0, 0, image.width, image.height);
  return { data: new Uint8ClampedArray(data.buffer, data.byteOffset, data.byteLength), width, height };
}

describe('sheet number formats (ISO/IEC 17025:2017 §7.8.2.1 (m), §7.8.3.1 (c): values with U in the same unit)', () => {
  it('prints a true minus, no negative zero, and U with the value’s decimals', () => {
    expect(formatNumber(-0.29661, 4)).toBe('−0.2966');
    expect(formatNumber(-0.00001, 4)).toBe('0.0000');
    expect(formatMeasured({ value: 0.37684, expandedUncertainty: 0.00471 }, 4)).toBe('0.3768 ± 0.0047');
  });

  it('prints a range, or one value when the ends agree', () => {
    expect(formatRange([21.31, 21.42, 21.38], 1)).toBe('21.3 – 21.4');
    expect(formatRange([48.1, 48.4], 0)).toBe('48');
  });

  it('prints calendar dates without a time-zone shift and refuses other forms', () => {
    expect(formatDate('2026-11-03')).toBe('3 November 2026');
    expect(() => formatDate('03/11/2026')).toThrow(/YYYY-MM-DD/);
  });
});

describe('verification address and QR code (ISO/IEC 17025:2017 §7.8.2.1 (d): the report identified on every page)', () => {
  it('builds ${PUBLIC_URL}/verify/<report number>', () => {
    expect(verificationUrl('https://results.lab.example/', 'TW-2026-0147')).toBe('https://results.lab.example/verify/TW-2026-0147');
  });

  it('draws a QR code that decodes to the address', async () => {
    const url = 'https://results.lab.example/verify/TW-2026-0147';
    const { data, width, height } = await pixels(verificationQrPng(url));
    expect(jsQR(data, width, height)?.data).toBe(url);
  });
});

describe('image and font preparation', () => {
  it('encodes opaque RGB PNGs that read back pixel for pixel', async () => {
    const width = 3;
    const height = 2;
    const rgba = new Uint8Array([255, 0, 0, 255, 0, 255, 0, 255, 0, 0, 255, 255, 10, 20, 30, 255, 40, 50, 60, 255, 70, 80, 90, 255]);
    const png = encodeOpaquePng(rgba, width, height);
    expect(png[25]).toBe(2); // colour type RGB: pdfkit embeds it without decoding
    const back = await pixels(png);
    expect([...back.data]).toEqual([...rgba]);
  });

  it('unpacks the shipped WOFF fonts into TrueType with every table', () => {
    const woff = readFileSync(REPORT_FONT_FILES.regular);
    const sfnt = woffToSfnt(woff);
    expect(sfnt.readUInt32BE(0)).toBe(woff.readUInt32BE(4));
    expect(sfnt.readUInt16BE(4)).toBe(woff.readUInt16BE(12));
    expect(sfnt.length).toBe(woff.readUInt32BE(16));
    expect(() => woffToSfnt(sfnt)).toThrow(/WOFF/);
  });
});
