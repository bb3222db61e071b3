import { crc32, deflateSync } from 'node:zlib';

/**
 * Encodes 8-bit RGB pixels (row by row, 3 bytes a pixel) as a PNG, by the W3C PNG
 * Specification (Third Edition): §5.2 signature; §5.3 chunks with a CRC-32 over type and data
 * (node:zlib's `crc32` is that ISO 3309 CRC); §11.2 IHDR, IDAT and IEND; §7.3 and §9 filtering,
 * each row with the filter type that gives the smallest sum of absolute values (the heuristic of
 * §12.8), which keeps flat colour and gradients small. (Section numbers as in spec/support/images.ts;
 * those of filtering from memory.)
 */
export function encodePng(width: number, height: number, rgb: Uint8Array): Buffer {
  if (rgb.length !== width * height * 3) throw new RangeError(`expected ${width * height * 3} bytes of RGB, got ${rgb.length}`);
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header[8] = 8; // bit depth
  header[9] = 2; // colour type: truecolour; compression, filter method and interlace stay 0
  return Buffer.concat([SIGNATURE, chunk('IHDR', header), chunk('IDAT', deflateSync(filterRows(width, height, rgb), { level: 9 })), chunk('IEND', Buffer.alloc(0))]);
}

const SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const BYTES_PER_PIXEL = 3;

function chunk(type: string, data: Buffer): Buffer {
  const typeAndData = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typeAndData));
  return Buffer.concat([length, typeAndData, crc]);
}

/** Each row prefixed with its filter type byte (§7.3), filtered as §9.2 defines. */
function filterRows(width: number, height: number, rgb: Uint8Array): Buffer {
  const stride = width * BYTES_PER_PIXEL;
  const out = Buffer.alloc(height * (stride + 1));
  const candidate = Buffer.alloc(stride);
  const zeros = new Uint8Array(stride);
  for (let y = 0; y < height; y++) {
    const row = rgb.subarray(y * stride, (y + 1) * stride);
    const above = y === 0 ? zeros : rgb.subarray((y - 1) * stride, y * stride);
    let bestType = 0;
    let bestCost = Infinity;
    for (let type = 0; type <= 4; type++) {
      filterRow(type, row, above, candidate);
      // Bytes as signed values: the §12.8 "minimum sum of absolute differences" heuristic.
      let cost = 0;
      for (let i = 0; i < stride; i++) cost += candidate[i]! < 128 ? candidate[i]! : 256 - candidate[i]!;
      if (cost < bestCost) {
        bestCost = cost;
        bestType = type;
      }
    }
    const at = y * (stride + 1);
    out[at] = bestType;
    filterRow(bestType, row, above, out.subarray(at + 1, at + 1 + stride));
  }
  return out;
}

/** §9.2 filter types: 0 None, 1 Sub, 2 Up, 3 Average, 4 Paeth (§9.4), bytes modulo 256. */
function filterRow(type: number, row: Uint8Array, above: Uint8Array, into: Uint8Array): void {
  for (let i = 0; i < row.length; i++) {
    const a = i >= BYTES_PER_PIXEL ? row[i - BYTES_PER_PIXEL]! : 0;
    const b = above[i]!;
    const c = i >= BYTES_PER_PIXEL ? above[i - BYTES_PER_PIXEL]! : 0;
    const predictor = type === 0 ? 0 : type === 1 ? a : type === 2 ? b : type === 3 ? (a + b) >> 1 : paeth(a, b, c);
    into[i] = (row[i]! - predictor) & 0xff;
  }
}

function paeth(a: number, b: number, c: number): number {
  const p = a + b - c;
  const pa = Math.abs(p - a);
  const pb = Math.abs(p - b);
  const pc = Math.abs(p - c);
  if (pa <= pb && pa <= pc) return a;
  return pb <= pc ? b : c;
}
