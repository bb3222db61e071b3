import { crc32 } from 'node:zlib';

import type { UploadMediaType } from '../../../shared/api/upload';

/**
 * Walks an image's container from its first byte to its last and answers what is wrong, or
 * null. The point is that nothing hides in or after the image: every PNG chunk has its CRC and
 * the file ends at IEND; a JPEG's segments are whole and the file ends at EOI; a WebP's RIFF
 * size is the file's and its chunks fill it exactly. A file built to be both an image and an
 * HTML page (a polyglot) needs bytes outside that structure or markup inside a metadata chunk
 * (a PNG text chunk, a JPEG comment, a WebP XMP chunk); the walkers refuse both. Compressed pixel
 * data is not searched: it is never read as text, and random bytes would sometimes match.
 */
export function structureProblem(mediaType: UploadMediaType, bytes: Buffer): string | null {
  if (mediaType === 'image/png') return pngProblem(bytes);
  if (mediaType === 'image/jpeg') return jpegProblem(bytes);
  return webpProblem(bytes);
}

/** HTML that a browser would act on (XMP metadata's own tags, such as `<x:xmpmeta`, do not match). */
const MARKUP = /<(?:script|html|head|body|iframe|frame|svg|object|embed|img|style|meta|link|form|title|!doctype)[\s>/]/i;
export const MARKUP_PROBLEM = 'it holds web-page markup';
const hasMarkup = (bytes: Buffer) => MARKUP.test(bytes.toString('latin1'));

/** W3C PNG Specification (Third Edition) §5.2–5.6: signature, then length/type/data/CRC chunks, IHDR first, IEND last. */
function pngProblem(bytes: Buffer): string | null {
  let offset = 8;
  let first = true;
  let sawImageData = false;
  while (offset + 12 <= bytes.length) {
    const length = bytes.readUInt32BE(offset);
    const type = bytes.toString('latin1', offset + 4, offset + 8);
    const end = offset + 12 + length;
    if (length > 0x7fffffff || end > bytes.length) return `the PNG chunk ${JSON.stringify(type)} runs past the end of the file`;
    if (crc32(bytes.subarray(offset + 4, offset + 8 + length)) !== bytes.readUInt32BE(offset + 8 + length)) {
      return `the PNG chunk ${JSON.stringify(type)} is damaged (its CRC does not match)`;
    }
    if (first && (type !== 'IHDR' || length !== 13)) return 'the PNG does not start with its header chunk';
    first = false;
    if (type === 'IDAT') sawImageData = true;
    else if (hasMarkup(bytes.subarray(offset + 8, offset + 8 + length))) return MARKUP_PROBLEM;
    offset = end;
    if (type === 'IEND') {
      if (!sawImageData) return 'the PNG has no image data';
      return offset === bytes.length ? null : 'there are bytes after the end of the PNG';
    }
  }
  return 'the PNG ends before its end chunk';
}

/** ITU-T T.81 Annex B: SOI, marker segments with lengths, entropy-coded scans, EOI at the very end. */
function jpegProblem(bytes: Buffer): string | null {
  let offset = 2; // after SOI (FFD8), which file-type has already seen
  let sawFrame = false;
  let sawScan = false;
  while (offset < bytes.length) {
    if (bytes[offset] !== 0xff) return 'the JPEG has bytes outside its segments';
    while (bytes[offset] === 0xff) offset++; // fill bytes before a marker (T.81 B.1.1.2)
    const marker = bytes[offset++];
    if (marker === undefined) break;
    if (marker === 0xd9) {
      if (!sawFrame || !sawScan) return 'the JPEG ends before its image';
      return offset === bytes.length ? null : 'there are bytes after the end of the JPEG';
    }
    if (marker >= 0xd0 && marker <= 0xd7) continue; // RSTn: no length
    if (offset + 2 > bytes.length) break;
    const length = bytes.readUInt16BE(offset);
    if (length < 2 || offset + length > bytes.length) return 'a JPEG segment runs past the end of the file';
    if (marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc) sawFrame = true;
    if (hasMarkup(bytes.subarray(offset + 2, offset + length))) return MARKUP_PROBLEM;
    offset += length;
    if (marker === 0xda) {
      sawScan = true;
      // Entropy-coded data: FF is followed by 00 (stuffing) or RSTn, else a marker starts.
      while (offset < bytes.length) {
        if (bytes[offset] === 0xff && offset + 1 < bytes.length) {
          const next = bytes[offset + 1]!;
          if (next !== 0x00 && !(next >= 0xd0 && next <= 0xd7)) break;
        }
        offset++;
      }
    }
  }
  return 'the JPEG ends before its end marker';
}

/** RFC 9649 (WebP), §2.5–2.7: RIFF size = file size − 8; chunks (padded to even) fill it; VP8, VP8L or VP8X first. */
function webpProblem(bytes: Buffer): string | null {
  if (bytes.length < 20 || bytes.toString('latin1', 0, 4) !== 'RIFF' || bytes.toString('latin1', 8, 12) !== 'WEBP') return 'the WebP header is damaged';
  if (bytes.readUInt32LE(4) + 8 !== bytes.length) return 'the WebP size does not match the file';
  let offset = 12;
  let first = true;
  let sawImage = false;
  while (offset < bytes.length) {
    if (offset + 8 > bytes.length) return 'a WebP chunk header is cut short';
    const type = bytes.toString('latin1', offset, offset + 4);
    const size = bytes.readUInt32LE(offset + 4);
    const data = offset + 8;
    const end = data + size + (size % 2);
    if (end > bytes.length) return `the WebP chunk ${JSON.stringify(type)} runs past the end of the file`;
    if (first && type !== 'VP8 ' && type !== 'VP8L' && type !== 'VP8X') return 'the WebP does not start with an image chunk';
    first = false;
    if (type === 'VP8 ') {
      // RFC 6386 §9.1: a key frame's start code 9D 01 2A follows the 3-byte frame tag.
      if (size < 10 || bytes[data + 3] !== 0x9d || bytes[data + 4] !== 0x01 || bytes[data + 5] !== 0x2a) return 'the WebP image data is damaged';
      sawImage = true;
    }
    if (type === 'VP8L') {
      if (size < 5 || bytes[data] !== 0x2f) return 'the WebP image data is damaged'; // RFC 9649 §3.2 signature
      sawImage = true;
    }
    if (type === 'ANMF') sawImage = true;
    const pixels = type === 'VP8 ' || type === 'VP8L' || type === 'ALPH' || type === 'ANMF';
    if (!pixels && hasMarkup(bytes.subarray(data, data + size))) return MARKUP_PROBLEM;
    offset = end;
  }
  return sawImage ? null : 'the WebP has no image data';
}
