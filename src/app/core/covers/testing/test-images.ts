/**
 * Images for specs, drawn here in the browser rather than kept as binary fixtures: a light
 * background with a dark band, so scaling and encoding have something to keep.
 */
export async function drawnImage(width: number, height: number, type = 'image/png'): Promise<Blob> {
  const canvas = new OffscreenCanvas(width, height);
  const context = canvas.getContext('2d')!;
  context.fillStyle = '#e8d9b5';
  context.fillRect(0, 0, width, height);
  context.fillStyle = '#5b2a1a';
  context.fillRect(0, Math.floor(height / 3), width, Math.ceil(height / 3));
  return canvas.convertToBlob({ type });
}

/** A fully transparent PNG. */
export function transparentImage(width: number, height: number): Promise<Blob> {
  const canvas = new OffscreenCanvas(width, height);
  canvas.getContext('2d'); // a canvas with no context cannot be exported
  return canvas.convertToBlob({ type: 'image/png' });
}

/** The first bytes of a Blob, as numbers. */
export async function firstBytes(blob: Blob, count: number): Promise<number[]> {
  return Array.from(new Uint8Array(await blob.slice(0, count).arrayBuffer()));
}

/** The RGBA of one pixel of a decoded image. */
export async function pixelAt(blob: Blob, x: number, y: number): Promise<number[]> {
  const bitmap = await createImageBitmap(blob);
  const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
  const context = canvas.getContext('2d')!;
  context.drawImage(bitmap, 0, 0);
  bitmap.close();
  return Array.from(context.getImageData(x, y, 1, 1).data);
}
