/**
 * Reads a site plan picture into a data URL. A large raster is scaled down to at most
 * `MAX_SIDE` pixels on its long side (JPEG for photos and scans), so the project file stays a
 * size that saves and opens quickly; SVG is kept as drawn.
 */
import { MAX_PLAN_IMAGE_CHARS } from '../../model/schema.ts';

const MAX_SIDE = 2400;

function asDataUrl(file: Blob): Promise<string> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(String(reader.result));
    reader.onerror = () =>
      reject(new Error('The picture could not be read; try saving it again as PNG or JPEG.'));
    reader.readAsDataURL(file);
  });
}

/**
 * The picture at `url` drawn on white on a canvas with its long side `maxSide` pixels (made
 * smaller only, unless `grow`); `scale` is what it was drawn at.
 */
export async function drawPicture(
  url: string,
  maxSide: number,
  grow: boolean,
): Promise<{ canvas: HTMLCanvasElement; scale: number }> {
  const img = new Image();
  img.src = url;
  await img.decode();
  const w0 = img.naturalWidth || 1200;
  const h0 = img.naturalHeight || 800;
  const fit = maxSide / Math.max(w0, h0);
  const scale = grow ? fit : Math.min(1, fit);
  const canvas = document.createElement('canvas');
  canvas.width = Math.max(1, Math.round(w0 * scale));
  canvas.height = Math.max(1, Math.round(h0 * scale));
  const g = canvas.getContext('2d');
  if (!g) throw new Error('The picture could not be drawn in this browser.');
  g.fillStyle = '#ffffff';
  g.fillRect(0, 0, canvas.width, canvas.height);
  g.drawImage(img, 0, 0, canvas.width, canvas.height);
  return { canvas, scale };
}

export async function readPlanPicture(file: File): Promise<string> {
  if (!/^image\/(png|jpeg|svg\+xml)$/.test(file.type))
    throw new Error(
      `The site plan must be a PNG, JPEG or SVG picture; ${file.name} is ${file.type || 'of an unknown type'}.`,
    );
  const url = await asDataUrl(file);
  if (file.type === 'image/svg+xml') {
    if (url.length > MAX_PLAN_IMAGE_CHARS)
      throw new Error(
        `${file.name} is too large for a site plan; export it as a PNG of about 2000 pixels across.`,
      );
    return url;
  }
  const { canvas, scale } = await drawPicture(url, MAX_SIDE, false);
  if (scale === 1 && url.length <= MAX_PLAN_IMAGE_CHARS) return url;
  const out = canvas.toDataURL(file.type === 'image/png' ? 'image/png' : 'image/jpeg', 0.85);
  if (out.length > MAX_PLAN_IMAGE_CHARS) return canvas.toDataURL('image/jpeg', 0.7);
  return out;
}
