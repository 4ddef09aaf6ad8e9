/** Export the drawing as a standalone SVG file, or as a PNG drawn onto a canvas. */
import { PALETTE } from './palette';

/** Serialise the drawing: inline attributes only, interaction layers (tooltip, focus) dropped, a paper background added. */
export function serializeSvg(svg: SVGSVGElement, widthPx = 1600): { text: string; width: number; height: number } {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  clone.querySelectorAll('[data-export="skip"]').forEach((n) => n.remove());
  const [x, y, w, h] = (clone.getAttribute('viewBox') ?? '0 0 1 1').split(/\s+/).map(Number);
  const width = Math.round(widthPx);
  const height = Math.max(1, Math.round((widthPx * h) / w));
  clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  clone.setAttribute('width', String(width));
  clone.setAttribute('height', String(height));
  clone.removeAttribute('class');
  clone.removeAttribute('style');
  const bg = document.createElementNS('http://www.w3.org/2000/svg', 'rect');
  for (const [k, v] of Object.entries({ x, y, width: w, height: h, fill: PALETTE.paper })) bg.setAttribute(k, String(v));
  clone.insertBefore(bg, clone.firstChild);
  const text = `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(clone)}`;
  return { text, width, height };
}

/** Draw serialised SVG onto a canvas and encode it as PNG. */
export function svgToPng(text: string, width: number, height: number): Promise<Blob> {
  return new Promise((resolve, reject) => {
    const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
    const img = new Image();
    img.onload = () => {
      const canvas = document.createElement('canvas');
      canvas.width = width;
      canvas.height = height;
      const ctx = canvas.getContext('2d');
      if (!ctx) {
        URL.revokeObjectURL(url);
        reject(new Error('This browser cannot draw onto a canvas.'));
        return;
      }
      ctx.drawImage(img, 0, 0, width, height);
      URL.revokeObjectURL(url);
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('The PNG could not be encoded.'))), 'image/png');
    };
    img.onerror = () => {
      URL.revokeObjectURL(url);
      reject(new Error('The drawing could not be rendered to an image.'));
    };
    img.src = url;
  });
}

/** Offer a blob as a file download. */
export function downloadBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** A file name from a model name: lower case, dashes. */
export function fileNameOf(name: string, ext: string): string {
  const base = name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60) || 'truss';
  return `${base}.${ext}`;
}
