import QRCode from 'qrcode';

/**
 * Draws a QR code as vector squares (crisp at any printer resolution) with its top-left corner
 * at (x, y) and an overall side of `size` points, quiet zone included.
 */
export function drawQrCode(doc: PDFKit.PDFDocument, text: string, x: number, y: number, size: number): void {
  // Level M survives a smudged or creased shop print better than L, and the URL stays short.
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const count = qr.modules.size;
  const quiet = 2; // modules; the title block's white cell adds more around it
  const cell = size / (count + 2 * quiet);
  doc.save();
  doc.rect(x, y, size, size).fill('#ffffff');
  doc.fillColor('#000000');
  for (let row = 0; row < count; row += 1) {
    // Merge horizontal runs of dark modules into one rectangle: fewer path operators, smaller PDF.
    let col = 0;
    while (col < count) {
      if (!qr.modules.get(row, col)) {
        col += 1;
        continue;
      }
      const start = col;
      while (col < count && qr.modules.get(row, col)) col += 1;
      doc.rect(x + (quiet + start) * cell, y + (quiet + row) * cell, (col - start) * cell, cell);
    }
  }
  doc.fill();
  doc.restore();
}
