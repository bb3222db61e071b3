import { CoverError } from './cover-error';
import { sha256Hex } from './sha256-hex';

/** Covers are shown at most this tall, so they are stored no taller. */
export const COVER_MAX_HEIGHT = 600;
/** Lossy quality for WebP and JPEG: small files, no visible blocks at cover size. */
export const COVER_QUALITY = 0.82;
/** Files larger than this are refused before decoding: a phone could run out of memory. */
export const COVER_MAX_FILE_BYTES = 40 * 1024 * 1024;

/** A cover ready to store and upload. */
export interface PreparedCover {
  /** The encoded image, WebP where the browser can encode it, else JPEG. */
  readonly blob: Blob;
  readonly mediaType: 'image/webp' | 'image/jpeg';
  /** The hex SHA-256 of `blob`'s bytes: the server's id for the same upload. */
  readonly id: string;
  readonly width: number;
  readonly height: number;
}

/**
 * Turns any image file the browser can decode into a cover: at most {@link COVER_MAX_HEIGHT}
 * pixels tall (never enlarged, aspect kept), re-encoded as WebP or else JPEG, and named by its
 * SHA-256. Re-encoding also drops whatever else the file carried (EXIF, location).
 *
 * @throws CoverError with a message for the reader when the file is not a readable image.
 */
export async function prepareCover(file: Blob): Promise<PreparedCover> {
  if (file.size > COVER_MAX_FILE_BYTES) {
    throw new CoverError('too-large', 'This image is too large to read on this device. Try one under 40 MB.');
  }
  const bitmap = await decode(file);
  try {
    const scale = Math.min(1, COVER_MAX_HEIGHT / bitmap.height);
    const width = Math.max(1, Math.round(bitmap.width * scale));
    const height = Math.max(1, Math.round(bitmap.height * scale));
    const canvas = drawScaled(bitmap, width, height);
    // Browsers answer an encoding they lack with a PNG, so the type says what we got.
    let blob = await encode(canvas, 'image/webp');
    if (blob?.type !== 'image/webp') blob = await encode(canvas, 'image/jpeg');
    if (blob?.type !== 'image/jpeg' && blob?.type !== 'image/webp') {
      throw new CoverError('cannot-encode', 'This device could not make a cover from that image.');
    }
    return { blob, mediaType: blob.type, id: await sha256Hex(blob), width, height };
  } finally {
    bitmap.close();
  }
}

async function decode(file: Blob): Promise<ImageBitmap> {
  try {
    // Phone photos are often stored sideways with an EXIF orientation: turn them upright.
    return await createImageBitmap(file, { imageOrientation: 'from-image' });
  } catch {
    throw new CoverError('unreadable', 'This file is not an image Lamplight can read. Try a JPEG, PNG or WebP picture.');
  }
}

type Canvas = OffscreenCanvas | HTMLCanvasElement;

function drawScaled(bitmap: ImageBitmap, width: number, height: number): Canvas {
  const canvas: Canvas =
    typeof OffscreenCanvas === 'function' ? new OffscreenCanvas(width, height) : Object.assign(document.createElement('canvas'), { width, height });
  const context = canvas.getContext('2d') as CanvasRenderingContext2D | OffscreenCanvasRenderingContext2D | null;
  if (!context) throw new CoverError('cannot-encode', 'This device could not make a cover from that image.');
  // JPEG has no transparency: see-through parts become white, as on paper, not black.
  context.fillStyle = '#fff';
  context.fillRect(0, 0, width, height);
  context.imageSmoothingQuality = 'high';
  context.drawImage(bitmap, 0, 0, width, height);
  return canvas;
}

function encode(canvas: Canvas, type: string): Promise<Blob | null> {
  if ('convertToBlob' in canvas) return canvas.convertToBlob({ type, quality: COVER_QUALITY }).catch(() => null);
  return new Promise((resolve) => canvas.toBlob(resolve, type, COVER_QUALITY));
}
