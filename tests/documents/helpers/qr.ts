// Reads a shelf label's QR code back from a page rasterised by pdftoppm, with jsQR, a decoder
// independent of the `qrcode` package that drew it (ISO/IEC 18004).
import jsQR from 'jsqr';
import sharp from 'sharp';

import { labelSheet } from '@/documents/labels';

/** The resolution the label pages are rasterised at for reading. */
export const qrReadingDpi = 200;
const px = (points: number) => Math.round((points * qrReadingDpi) / 72);

/** What a phone's reader would find in the QR code of one label on a page at `qrReadingDpi`. */
export async function readQrCode(page: Buffer, slot: number): Promise<string | undefined> {
  const { x, y } = labelSheet.origin(slot);
  const { dx, dy, size } = labelSheet.qrBox;
  const margin = 6;
  const { data, info } = await sharp(page)
    .extract({
      left: px(x + dx) - margin,
      top: px(y + dy) - margin,
      width: px(size) + 2 * margin,
      height: px(size) + 2 * margin,
    })
    .ensureAlpha()
    .raw()
    .toBuffer({ resolveWithObject: true });
  return jsQR(new Uint8ClampedArray(data), info.width, info.height)?.data;
}
