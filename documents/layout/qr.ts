import QRCode from 'qrcode';

import { colours } from './style';
import { type Doc } from './text';

/** The light margin a QR symbol needs around it: 4 modules (ISO/IEC 18004:2015, 4.3.8). */
export const quietZoneModules = 4;

/**
 * A QR code drawn as vector squares into a square `size` points wide, quiet zone included, at
 * error correction level M (about 15% of the symbol may be damaged). Each row's run of dark
 * modules is one rectangle, and all are filled as one path, so no seams show between them.
 */
export function drawQrCode(doc: Doc, content: string, x: number, y: number, size: number): void {
  const { modules } = QRCode.create(content, { errorCorrectionLevel: 'M' });
  const count = modules.size;
  const unit = size / (count + 2 * quietZoneModules);
  const left = x + quietZoneModules * unit;
  const top = y + quietZoneModules * unit;
  doc.save();
  for (let row = 0; row < count; row += 1) {
    let col = 0;
    while (col < count) {
      if (!modules.data[row * count + col]) {
        col += 1;
        continue;
      }
      const start = col;
      while (col < count && modules.data[row * count + col]) col += 1;
      doc.rect(left + start * unit, top + row * unit, (col - start) * unit, unit);
    }
  }
  doc.fillColor(colours.ink).fill('nonzero');
  doc.restore();
}
