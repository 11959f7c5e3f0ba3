/**
 * Saving the plot as a file, with the browser's own means only (no remote service): the SVG
 * text as it is, and a PNG drawn from it onto a canvas.
 */

/** The SVG text as a standalone file (with the XML declaration). */
export function svgFile(svg: string): Blob {
  return new Blob([`<?xml version="1.0" encoding="UTF-8"?>\n${svg}\n`], { type: 'image/svg+xml' });
}

/** Draws the SVG onto a canvas `scale` times its own size and returns the PNG. */
export async function pngFile(doc: Document, svg: string, width: number, height: number, scale = 2): Promise<Blob> {
  const url = URL.createObjectURL(svgFile(svg));
  try {
    const img = doc.createElement('img');
    img.width = width;
    img.height = height;
    await new Promise<void>((resolve, reject) => {
      img.onload = () => resolve();
      img.onerror = () => reject(new Error('the browser could not draw the SVG'));
      img.src = url;
    });
    const canvas = doc.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('this browser offers no 2-D canvas');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.drawImage(img, 0, 0, canvas.width, canvas.height);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('the canvas gave no PNG'))), 'image/png'),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Offers `blob` as a download named `name`. */
export function download(doc: Document, blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const a = doc.createElement('a');
  a.href = url;
  a.download = name;
  a.hidden = true;
  doc.body.append(a);
  a.click();
  a.remove();
  // Give the browser time to start the download before the address goes.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** A file name from the plotted range: `phasors-Sub-board-A21-D22`. */
export function fileStem(source: string): string {
  const stem = source.replace(/[!:]/g, '-').replace(/[^\p{L}\p{N}._-]+/gu, '-').replace(/-+/g, '-').replace(/^-|-$/g, '');
  return `phasors-${stem || 'plot'}`;
}
