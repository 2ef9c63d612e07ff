/** Batch number as a Code 128 barcode and a QR code (PNG, through bwip-js). */
import bwipjs from 'bwip-js/node';

export async function code128Png(text: string): Promise<Buffer> {
  return bwipjs.toBuffer({ bcid: 'code128', text, scale: 3, height: 12, includetext: false, paddingwidth: 4 });
}

export async function qrPng(text: string): Promise<Buffer> {
  // eclevel (error correction M, ~15 %) is a BWIPP option the typings omit.
  return bwipjs.toBuffer({ bcid: 'qrcode', text, scale: 4, eclevel: 'M' } as bwipjs.RenderOptions);
}
