import { randomUUID } from 'node:crypto';
import { crc32, deflateSync } from 'node:zlib';

/**
 * Real image bytes for upload specs, made here rather than kept as binary fixtures.
 *
 * PNGs are built by the book: W3C PNG Specification (Third Edition) §5.2 signature, §5.3 chunk
 * layout with a CRC-32 over type and data (node:zlib's `crc32`, the same ISO 3309 CRC), §11.2
 * IHDR/IDAT/IEND and §11.3.3.3 tEXt; the image data is zlib-deflated rows, each with filter
 * type 0. When this helper was written, Chromium 156 decoded what `png()` and `uniquePng()`
 * build to images of the asked size and colour.
 */
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

function chunk(type: string, data: Buffer): Buffer {
  const typeAndData = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/** A width × height truecolour PNG of one colour, with an optional tEXt comment. */
export function png(options: { width?: number; height?: number; rgb?: readonly [number, number, number]; comment?: string } = {}): Buffer {
  const { width = 3, height = 4, rgb = [0x7a, 0x3b, 0x1f], comment } = options;
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: truecolour; compression, filter and interlace bytes stay 0
  const row = Buffer.from([0, ...Array.from({ length: width }, () => rgb).flat()]);
  const chunks = [chunk('IHDR', header)];
  if (comment !== undefined) chunks.push(chunk('tEXt', Buffer.from(`Comment\0${comment}`, 'latin1')));
  chunks.push(chunk('IDAT', deflateSync(Buffer.concat(Array.from({ length: height }, () => row)))), chunk('IEND', Buffer.alloc(0)));
  return Buffer.concat([PNG_SIGNATURE, ...chunks]);
}

/** A PNG no other spec has uploaded (its comment is a fresh UUID), so its id is new too. */
export function uniquePng(options: { padding?: number } = {}): Buffer {
  return png({ comment: `${randomUUID()}${' '.repeat(options.padding ?? 0)}` });
}

/**
 * A 4 × 6 JPEG (784 bytes) as a browser uploads one: drawn on a canvas in Chromium 156 and
 * exported with `canvas.toDataURL('image/jpeg', 0.8)`, ICC profile included, then decoded back
 * to 4 × 6 by the same browser. Its SHA-256, by GNU coreutils' `sha256sum`, is JPEG_SHA256.
 */
export const JPEG = Buffer.from(
  '/9j/4AAQSkZJRgABAQAAAQABAAD/4gHYSUNDX1BST0ZJTEUAAQEAAAHIAAAAAAQwAABtbnRyUkdCIFhZWiAH4AABAAEAAAAAAABhY3NwAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAQAA9tYAAQAAAADTLQAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAlkZXNjAAAA8AAAACRyWFlaAAABFAAAABRnWFlaAAABKAAAABRiWFlaAAABPAAAABR3dHB0AAABUAAAABRyVFJDAAABZAAAAChnVFJDAAABZAAAAChiVFJDAAABZAAAAChjcHJ0AAABjAAAADxtbHVjAAAAAAAAAAEAAAAMZW5VUwAAAAgAAAAcAHMAUgBHAEJYWVogAAAAAAAAb6IAADj1AAADkFhZWiAAAAAAAABimQAAt4UAABjaWFlaIAAAAAAAACSgAAAPhAAAts9YWVogAAAAAAAA9tYAAQAAAADTLXBhcmEAAAAAAAQAAAACZmYAAPKnAAANWQAAE9AAAApbAAAAAAAAAABtbHVjAAAAAAAAAAEAAAAMZW5VUwAAACAAAAAcAEcAbwBvAGcAbABlACAASQBuAGMALgAgADIAMAAxADb/2wBDAAYEBQYFBAYGBQYHBwYIChAKCgkJChQODwwQFxQYGBcUFhYaHSUfGhsjHBYWICwgIyYnKSopGR8tMC0oMCUoKSj/2wBDAQcHBwoIChMKChMoGhYaKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCj/wAARCAAGAAQDASIAAhEBAxEB/8QAFQABAQAAAAAAAAAAAAAAAAAAAAX/xAAaEAEAAQUAAAAAAAAAAAAAAAAAAwYWVqXR/8QAFQEBAQAAAAAAAAAAAAAAAAAABQb/xAAaEQACAgMAAAAAAAAAAAAAAAAAARETYZHR/9oADAMBAAIRAxEAPwCZcNH4Pt5uABJKOtZ2+n//2Q==',
  'base64',
);
export const JPEG_SHA256 = '86a4325beef409c62b670ea9ee1c850230b4a2daa5a300bc8a259ef7ad2e30fd';

/** The same 4 × 6 picture as a lossy WebP (568 bytes), from `canvas.toDataURL('image/webp', 0.8)` in Chromium 156. */
export const WEBP = Buffer.from(
  'UklGRjACAABXRUJQVlA4WAoAAAAgAAAAAwAABQAASUNDUMgBAAAAAAHIAAAAAAQwAABtbnRyUkdCIFhZWiAH4AABAAEAAAAAAABhY3NwAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAQAA9tYAAQAAAADTLQAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAlkZXNjAAAA8AAAACRyWFlaAAABFAAAABRnWFlaAAABKAAAABRiWFlaAAABPAAAABR3dHB0AAABUAAAABRyVFJDAAABZAAAAChnVFJDAAABZAAAAChiVFJDAAABZAAAAChjcHJ0AAABjAAAADxtbHVjAAAAAAAAAAEAAAAMZW5VUwAAAAgAAAAcAHMAUgBHAEJYWVogAAAAAAAAb6IAADj1AAADkFhZWiAAAAAAAABimQAAt4UAABjaWFlaIAAAAAAAACSgAAAPhAAAts9YWVogAAAAAAAA9tYAAQAAAADTLXBhcmEAAAAAAAQAAAACZmYAAPKnAAANWQAAE9AAAApbAAAAAAAAAABtbHVjAAAAAAAAAAEAAAAMZW5VUwAAACAAAAAcAEcAbwBvAGcAbABlACAASQBuAGMALgAgADIAMAAxADZWUDggQgAAADACAJ0BKgQABgABQCYlqAJ0ugDK/wPQBW1AAP6yP//JBG/+pUn/hf4r8cEk1uNbhaWH+wfzpRtyE25eqPkux0AAAA==',
  'base64',
);

/**
 * A PNG whose header claims width × height while its image data is a few bytes: the chunk
 * structure is whole (every CRC right, IEND last), so only the dimensions can refuse it. This is
 * how a 30000 × 30000 "decompression bomb" stays small on disk.
 */
export function pngClaiming(width: number, height: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8;
  header[9] = 2;
  return Buffer.concat([PNG_SIGNATURE, chunk('IHDR', header), chunk('IDAT', deflateSync(Buffer.alloc(64))), chunk('IEND', Buffer.alloc(0))]);
}

/** A PNG with a text chunk of our choosing (W3C PNG §11.3.3.3 tEXt), every CRC right. */
export function pngWithText(text: string): Buffer {
  const plain = png();
  const iend = plain.length - 12;
  return Buffer.concat([plain.subarray(0, iend), chunk('tEXt', Buffer.from(`Comment\0${text}`, 'latin1')), plain.subarray(iend)]);
}
