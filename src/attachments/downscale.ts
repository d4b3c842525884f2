/**
 * A photo from the tablet's camera or files, downscaled so its longer side is at most 1600 px and re-encoded
 * as JPEG in a canvas: a 12-megapixel photo of several MB becomes a few hundred kB, enough to read a tag plate.
 */
export const MAX_SIDE_PX = 1600;
const JPEG_QUALITY = 0.82;

/** The size a w × h image is drawn at: unchanged when it fits, else scaled down keeping its shape. */
export function fitWithin(w: number, h: number, max = MAX_SIDE_PX): { w: number; h: number } {
  const s = Math.min(1, max / Math.max(w, h));
  return { w: Math.max(1, Math.round(w * s)), h: Math.max(1, Math.round(h * s)) };
}

export async function downscalePhoto(file: Blob): Promise<{ dataUrl: string; widthPx: number; heightPx: number }> {
  const bitmap = await createImageBitmap(file);
  const { w, h } = fitWithin(bitmap.width, bitmap.height);
  const canvas = document.createElement('canvas');
  canvas.width = w;
  canvas.height = h;
  const ctx = canvas.getContext('2d');
  if (!ctx) throw new Error('this browser cannot draw the photo');
  ctx.drawImage(bitmap, 0, 0, w, h);
  bitmap.close();
  return { dataUrl: canvas.toDataURL('image/jpeg', JPEG_QUALITY), widthPx: w, heightPx: h };
}
