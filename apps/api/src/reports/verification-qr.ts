import QRCode from 'qrcode';
import { encodeOpaquePng } from './opaque-png';

const MODULE_PIXELS = 8;
const QUIET_ZONE_MODULES = 4;

/**
 * PNG of a QR code for the verification URL (error-correction level M, four-module quiet zone), drawn as an opaque
 * RGB image so pdfkit embeds it without decoding.
 */
export function verificationQrPng(url: string): Buffer {
  const { modules } = QRCode.create(url, { errorCorrectionLevel: 'M' });
  const side = (modules.size + 2 * QUIET_ZONE_MODULES) * MODULE_PIXELS;
  const rgba = new Uint8Array(side * side * 4).fill(255);
  for (let row = 0; row < modules.size; row++) {
    for (let col = 0; col < modules.size; col++) {
      if (!modules.get(row, col)) continue;
      for (let dy = 0; dy < MODULE_PIXELS; dy++) {
        const y = (row + QUIET_ZONE_MODULES) * MODULE_PIXELS + dy;
        const start = (y * side + (col + QUIET_ZONE_MODULES) * MODULE_PIXELS) * 4;
        for (let i = 0; i < MODULE_PIXELS * 4; i += 4) {
          rgba[start + i] = 0;
          rgba[start + i + 1] = 0;
          rgba[start + i + 2] = 0;
        }
      }
    }
  }
  return encodeOpaquePng(rgba, side, side);
}
