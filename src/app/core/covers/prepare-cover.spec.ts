import { CoverError } from './cover-error';
import { COVER_MAX_FILE_BYTES, prepareCover } from './prepare-cover';
import { sha256Hex } from './sha256-hex';
import { drawnImage, firstBytes, pixelAt, transparentImage } from './testing/test-images';

const ascii = (text: string) => Array.from(text, (char) => char.charCodeAt(0));

async function decodedSize(blob: Blob): Promise<{ width: number; height: number }> {
  const bitmap = await createImageBitmap(blob);
  const size = { width: bitmap.width, height: bitmap.height };
  bitmap.close();
  return size;
}

/** Makes the browser answer WebP requests with a PNG, as browsers without a WebP encoder do. */
function withoutWebpEncoder(): void {
  const convert = OffscreenCanvas.prototype.convertToBlob;
  spyOn(OffscreenCanvas.prototype, 'convertToBlob').and.callFake(function (this: OffscreenCanvas, options?: ImageEncodeOptions) {
    return convert.call(this, options?.type === 'image/webp' ? { type: 'image/png' } : options);
  });
}

describe('prepareCover', () => {
  it('scales a large picture down to 600 px tall, keeping its shape, as WebP', async () => {
    const cover = await prepareCover(await drawnImage(1200, 1800));

    expect(cover.mediaType).toBe('image/webp');
    expect(cover.blob.type).toBe('image/webp');
    expect(await decodedSize(cover.blob)).toEqual({ width: 400, height: 600 });
    expect([cover.width, cover.height]).toEqual([400, 600]);
    // A WebP file is a RIFF container of form type "WEBP" (RFC 9649 §2.5).
    const head = await firstBytes(cover.blob, 12);
    expect(head.slice(0, 4)).toEqual(ascii('RIFF'));
    expect(head.slice(8, 12)).toEqual(ascii('WEBP'));
  });

  it('names the cover by the SHA-256 of the bytes it stores', async () => {
    const cover = await prepareCover(await drawnImage(300, 450));
    expect(cover.id).toMatch(/^[0-9a-f]{64}$/);
    expect(cover.id).toBe(await sha256Hex(await cover.blob.arrayBuffer())); // sha256Hex is checked against FIPS 180-4 examples
  });

  it('never enlarges a small picture', async () => {
    const cover = await prepareCover(await drawnImage(100, 150));
    expect(await decodedSize(cover.blob)).toEqual({ width: 100, height: 150 });
  });

  it('keeps a picture exactly 600 px tall as it is, and rounds the width of one just taller', async () => {
    expect(await decodedSize((await prepareCover(await drawnImage(900, 600))).blob)).toEqual({ width: 900, height: 600 });
    expect(await decodedSize((await prepareCover(await drawnImage(401, 601))).blob)).toEqual({ width: 400, height: 600 });
  });

  it('reads JPEG and WebP files as well as PNG', async () => {
    for (const type of ['image/jpeg', 'image/webp']) {
      const cover = await prepareCover(await drawnImage(60, 90, type));
      expect(await decodedSize(cover.blob))
        .withContext(type)
        .toEqual({ width: 60, height: 90 });
    }
  });

  it('falls back to JPEG where the browser cannot encode WebP, with see-through parts white', async () => {
    const picture = await transparentImage(40, 60);
    withoutWebpEncoder();
    const cover = await prepareCover(picture);

    expect(cover.mediaType).toBe('image/jpeg');
    // Every JPEG starts with the SOI marker FF D8 (ITU-T T.81, Table B.1).
    expect(await firstBytes(cover.blob, 2)).toEqual([0xff, 0xd8]);
    const [red, green, blue, alpha] = await pixelAt(cover.blob, 20, 30);
    expect(Math.min(red!, green!, blue!)).toBeGreaterThan(245);
    expect(alpha).toBe(255);
  });

  it('refuses a file that is not an image with a message for the reader', async () => {
    const refusal = prepareCover(new Blob(['Chapter one. It was a quiet morning.'], { type: 'text/plain' }));
    await expectAsync(refusal).toBeRejectedWith(new CoverError('unreadable', 'This file is not an image Lamplight can read. Try a JPEG, PNG or WebP picture.'));
    await expectAsync(refusal).toBeRejectedWithError(CoverError);
  });

  it('refuses a file that only claims to be an image, or is cut short', async () => {
    const png = await drawnImage(30, 30);
    await expectAsync(prepareCover(new Blob(['not really'], { type: 'image/png' }))).toBeRejectedWithError(CoverError, /not an image Lamplight can read/);
    await expectAsync(prepareCover(png.slice(0, 40, 'image/png'))).toBeRejectedWithError(CoverError, /not an image Lamplight can read/);
  });

  it('refuses a file too large to decode safely, without reading it', async () => {
    const huge = { size: COVER_MAX_FILE_BYTES + 1 } as Blob;
    await expectAsync(prepareCover(huge)).toBeRejectedWithError(CoverError, /too large/);
  });
});
