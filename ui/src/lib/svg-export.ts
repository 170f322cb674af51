/**
 * Client-side export of a rendered chart: the SVG serialised with its computed styles inlined
 * (so the file looks the same outside the app), and a PNG drawn from that SVG onto a canvas.
 */

const STYLE_PROPS = [
  'fill',
  'fill-opacity',
  'stroke',
  'stroke-width',
  'stroke-opacity',
  'stroke-dasharray',
  'opacity',
  'font-family',
  'font-size',
  'font-weight',
  'font-style',
  'text-anchor',
  'dominant-baseline',
  'shape-rendering',
  'visibility',
  'display',
] as const;

/**
 * A standalone SVG document for `svg`: a deep clone whose elements carry their computed styles
 * as attributes (CSS variables resolved), with the xmlns and size set.
 */
export function serializeSvg(svg: SVGSVGElement): string {
  const clone = svg.cloneNode(true) as SVGSVGElement;
  const source = [svg, ...Array.from(svg.querySelectorAll('*'))];
  const target = [clone, ...Array.from(clone.querySelectorAll('*'))];
  const view = svg.ownerDocument.defaultView;
  if (view) {
    source.forEach((el, i) => {
      const style = view.getComputedStyle(el);
      const out = target[i] as SVGElement;
      for (const prop of STYLE_PROPS) {
        const value = style.getPropertyValue(prop);
        if (value && value !== 'auto' && value !== 'normal') out.style.setProperty(prop, value);
      }
      // A resolved text colour, so `fill: currentColor` survives outside the page.
      if (el instanceof SVGTextElement && style.color) out.style.setProperty('color', style.color);
    });
  }
  const width = svg.getAttribute('width') ?? String(svg.clientWidth);
  const height = svg.getAttribute('height') ?? String(svg.clientHeight);
  clone.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  clone.setAttribute('xmlns:xlink', 'http://www.w3.org/1999/xlink');
  clone.setAttribute('width', width);
  clone.setAttribute('height', height);
  clone.removeAttribute('tabindex');
  const background = svg.ownerDocument.createElementNS('http://www.w3.org/2000/svg', 'rect');
  background.setAttribute('width', '100%');
  background.setAttribute('height', '100%');
  background.setAttribute('fill', '#ffffff');
  clone.insertBefore(background, clone.firstChild);
  return '<?xml version="1.0" encoding="UTF-8"?>\n' + new XMLSerializer().serializeToString(clone);
}

/** Offers `blob` as a download named `fileName`. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

/** Downloads the SVG as a standalone .svg file. */
export function exportSvg(svg: SVGSVGElement, fileName: string): void {
  downloadBlob(new Blob([serializeSvg(svg)], { type: 'image/svg+xml' }), fileName);
}

/**
 * Draws the serialised SVG onto a canvas at `scale` times its size and returns the PNG bytes.
 * Throws Error('svgToPng: ...') when the browser cannot draw or encode it.
 */
export async function svgToPng(svg: SVGSVGElement, scale = 2): Promise<Blob> {
  const text = serializeSvg(svg);
  const width = Number(svg.getAttribute('width') ?? svg.clientWidth);
  const height = Number(svg.getAttribute('height') ?? svg.clientHeight);
  if (!(width > 0 && height > 0)) throw new Error('svgToPng: the SVG has no size');
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
  try {
    const image = new Image();
    image.decoding = 'sync';
    await new Promise<void>((resolve, reject) => {
      image.onload = () => resolve();
      image.onerror = () => reject(new Error('svgToPng: the SVG could not be drawn as an image'));
      image.src = url;
    });
    const canvas = document.createElement('canvas');
    canvas.width = Math.round(width * scale);
    canvas.height = Math.round(height * scale);
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('svgToPng: no 2D canvas context');
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, canvas.width, canvas.height);
    ctx.scale(scale, scale);
    ctx.drawImage(image, 0, 0, width, height);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((blob) => (blob ? resolve(blob) : reject(new Error('svgToPng: the canvas could not be encoded as PNG'))), 'image/png'),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}

/** Downloads the SVG drawn as a PNG (twice its on-screen size). */
export async function exportPng(svg: SVGSVGElement, fileName: string, scale = 2): Promise<void> {
  downloadBlob(await svgToPng(svg, scale), fileName);
}

/** A file-name-safe stem: letters, digits, dot, dash and underscore kept, the rest dashed. */
export function fileStem(text: string): string {
  return text.trim().replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'poreline';
}
