import { encodePng } from './encode-png';

/** The kinds of abstract cover the demo library uses; each title varies its own. */
export const COVER_STYLES = ['bands', 'sun', 'stripes', 'orbits', 'arches', 'tiles'] as const;
export type CoverStyle = (typeof COVER_STYLES)[number];

/** Demo covers are 2:3, like most paperbacks, and within the 600 px devices resize covers to. */
export const COVER_WIDTH = 400;
export const COVER_HEIGHT = 600;

type Rgb = readonly [number, number, number];

/** Palettes to draw from: background first, then inks. Chosen by hand, nothing copied. */
const PALETTES: readonly (readonly Rgb[])[] = [
  [
    [0x1f, 0x3a, 0x4d],
    [0xe9, 0xb8, 0x5c],
    [0xf4, 0xe9, 0xd8],
    [0x7f, 0xa9, 0xb3],
    [0xc4, 0x5c, 0x3b],
  ],
  [
    [0xf2, 0xe6, 0xcf],
    [0x2e, 0x4a, 0x3f],
    [0xd9, 0x82, 0x4b],
    [0x8c, 0xa5, 0x7a],
    [0x3b, 0x2a, 0x24],
  ],
  [
    [0x3d, 0x24, 0x3f],
    [0xf0, 0xa2, 0x8a],
    [0xfb, 0xe7, 0xc6],
    [0x6c, 0x9a, 0x8b],
    [0xd4, 0x4d, 0x5c],
  ],
  [
    [0xe7, 0xee, 0xe9],
    [0x24, 0x3b, 0x6b],
    [0xe0, 0x6c, 0x4f],
    [0xf2, 0xc1, 0x4e],
    [0x5a, 0x8f, 0x7b],
  ],
  [
    [0x12, 0x2b, 0x2a],
    [0xc9, 0xd6, 0xb8],
    [0xe2, 0x8f, 0x3c],
    [0x4f, 0x86, 0x7c],
    [0xf6, 0xef, 0xe0],
  ],
  [
    [0x8e, 0x3b, 0x2f],
    [0xf7, 0xd9, 0xa8],
    [0x2b, 0x2d, 0x42],
    [0xe8, 0x99, 0x4a],
    [0xf3, 0xf0, 0xea],
  ],
  [
    [0xdc, 0xe4, 0xec],
    [0x4a, 0x3f, 0x6b],
    [0xb5, 0x6d, 0x9a],
    [0x2f, 0x6f, 0x8f],
    [0xf0, 0xc0, 0x7a],
  ],
  [
    [0x26, 0x26, 0x2e],
    [0xd6, 0xa2, 0x4e],
    [0x9b, 0xc1, 0xbc],
    [0xe5, 0x5e, 0x4b],
    [0xee, 0xe5, 0xd3],
  ],
];

/**
 * A simple, distinctive abstract cover for a title, as PNG bytes: a background from one of our
 * palettes and shapes placed by a generator seeded from the title, so the same title always
 * gives the same bytes (and so the same content-addressed upload id). No text, no images from
 * anywhere else.
 */
export function demoCover(title: string, style: CoverStyle): Buffer {
  const random = seededRandom(title);
  const palette = PALETTES[Math.floor(random() * PALETTES.length)]!;
  const canvas = new Canvas(COVER_WIDTH, COVER_HEIGHT, palette[0]!);
  const inks = palette.slice(1);
  const ink = (i: number) => inks[i % inks.length]!;
  const offset = Math.floor(random() * inks.length);
  DRAW[style](canvas, random, (i) => ink(i + offset));
  return encodePng(COVER_WIDTH, COVER_HEIGHT, canvas.pixels);
}

type Draw = (canvas: Canvas, random: () => number, ink: (i: number) => Rgb) => void;

const DRAW: Record<CoverStyle, Draw> = {
  /** Horizontal bands of varied height, a rule across one of them and a disc on an edge. */
  bands(canvas, random, ink) {
    let y = Math.round(canvas.height * (0.15 + random() * 0.2));
    const edges: number[] = [];
    for (let i = 0; y < canvas.height; i++) {
      const height = Math.round(canvas.height * (0.06 + random() * 0.16));
      canvas.fillRect(0, y, canvas.width, y + height, ink(i));
      if (i === 1) canvas.fillRect(canvas.width * 0.1, y + height / 2 - 3, canvas.width * 0.9, y + height / 2 + 3, ink(i + 2));
      edges.push(y);
      y += height + Math.round(canvas.height * random() * 0.05);
    }
    const edge = edges[Math.floor(random() * Math.min(edges.length, 3))]!;
    canvas.fillCircle(canvas.width * (0.2 + random() * 0.6), edge, canvas.width * (0.08 + random() * 0.08), ink(edges.length + 1));
  },
  /** A low sun or moon over layered hills, on a sky that darkens upwards. */
  sun(canvas, random, ink) {
    canvas.verticalGradient(canvas.background, mix(canvas.background, ink(3), 0.35));
    const horizon = canvas.height * (0.55 + random() * 0.15);
    canvas.fillCircle(canvas.width * (0.3 + random() * 0.4), horizon - canvas.height * 0.08, canvas.width * (0.18 + random() * 0.1), ink(0));
    for (let i = 0; i < 3; i++) {
      const base = horizon + i * canvas.height * 0.1;
      const amplitude = 12 + random() * 30;
      const wavelength = canvas.width * (0.5 + random() * 0.8);
      const phase = random() * Math.PI * 2;
      canvas.fillBelow((x) => base + amplitude * Math.sin((x / wavelength) * Math.PI * 2 + phase), ink(i + 1));
    }
  },
  /** Diagonal stripes in two inks across a panel, with one solid circle on top. */
  stripes(canvas, random, ink) {
    const angle = (Math.PI / 180) * (25 + random() * 40) * (random() < 0.5 ? 1 : -1);
    const period = 28 + random() * 40;
    canvas.fillStripes(angle, period, 0.5, ink(0), { x0: 0, y0: canvas.height * 0.1, x1: canvas.width, y1: canvas.height * 0.72 });
    canvas.fillRect(0, canvas.height * 0.72, canvas.width, canvas.height, ink(1));
    canvas.fillCircle(canvas.width * (0.25 + random() * 0.5), canvas.height * 0.72, canvas.width * (0.12 + random() * 0.08), ink(2));
  },
  /** Concentric rings around a point off the centre, crossed by one bar. */
  orbits(canvas, random, ink) {
    const cx = canvas.width * (0.2 + random() * 0.6);
    const cy = canvas.height * (0.25 + random() * 0.35);
    const rings = 4 + Math.floor(random() * 4);
    const gap = 22 + random() * 18;
    for (let i = rings; i >= 1; i--) canvas.fillCircle(cx, cy, i * gap, ink(i));
    canvas.fillRect(0, canvas.height * (0.78 + random() * 0.08), canvas.width, canvas.height, ink(0));
  },
  /** A row of arched windows, each a rectangle with a half circle on top. */
  arches(canvas, random, ink) {
    const count = 2 + Math.floor(random() * 3);
    const margin = canvas.width * 0.1;
    const width = (canvas.width - 2 * margin) / count;
    const top = canvas.height * (0.3 + random() * 0.15);
    canvas.fillRect(0, canvas.height * 0.82, canvas.width, canvas.height, ink(count));
    for (let i = 0; i < count; i++) {
      const x0 = margin + i * width + width * 0.12;
      const x1 = margin + (i + 1) * width - width * 0.12;
      const radius = (x1 - x0) / 2;
      canvas.fillCircle(x0 + radius, top, radius, ink(i));
      canvas.fillRect(x0, top, x1, canvas.height * 0.82, ink(i));
    }
  },
  /** A grid of tiles, some with a circle or a half tile in another ink. */
  tiles(canvas, random, ink) {
    const columns = 3 + Math.floor(random() * 2);
    const size = canvas.width / columns;
    const rows = Math.ceil(canvas.height / size);
    for (let row = 0; row < rows; row++) {
      for (let column = 0; column < columns; column++) {
        // Whole-pixel edges, so neighbouring tiles meet without a seam of background.
        const [x0, x1] = [Math.round(column * size), Math.round((column + 1) * size)];
        const [y0, y1] = [Math.round(row * size), Math.round((row + 1) * size)];
        const pick = Math.floor(random() * 4);
        canvas.fillRect(x0, y0, x1, y1, ink(pick));
        const motif = random();
        if (motif < 0.4) canvas.fillCircle((x0 + x1) / 2, (y0 + y1) / 2, size * 0.36, ink(pick + 1));
        else if (motif < 0.65) canvas.fillRect(x0, Math.round((y0 + y1) / 2), x1, y1, ink(pick + 2));
      }
    }
  },
};

/** An RGB raster with anti-aliased edges (coverage per pixel), enough for flat shapes. */
class Canvas {
  readonly pixels: Uint8Array;

  constructor(
    readonly width: number,
    readonly height: number,
    readonly background: Rgb,
  ) {
    this.pixels = new Uint8Array(width * height * 3);
    this.fillRect(0, 0, width, height, background);
  }

  fillRect(x0: number, y0: number, x1: number, y1: number, colour: Rgb): void {
    for (let y = Math.max(0, Math.floor(y0)); y < Math.min(this.height, Math.ceil(y1)); y++) {
      const vertical = overlap(y, y0, y1);
      for (let x = Math.max(0, Math.floor(x0)); x < Math.min(this.width, Math.ceil(x1)); x++) {
        this.blend(x, y, colour, vertical * overlap(x, x0, x1));
      }
    }
  }

  fillCircle(cx: number, cy: number, radius: number, colour: Rgb): void {
    const [x0, x1] = [Math.max(0, Math.floor(cx - radius - 1)), Math.min(this.width, Math.ceil(cx + radius + 1))];
    const [y0, y1] = [Math.max(0, Math.floor(cy - radius - 1)), Math.min(this.height, Math.ceil(cy + radius + 1))];
    for (let y = y0; y < y1; y++) {
      for (let x = x0; x < x1; x++) {
        // Distance from the pixel centre to the edge, as coverage over about one pixel.
        const distance = Math.hypot(x + 0.5 - cx, y + 0.5 - cy);
        this.blend(x, y, colour, clamp01(radius - distance + 0.5));
      }
    }
  }

  /** Fills everything below the curve y = edge(x). */
  fillBelow(edge: (x: number) => number, colour: Rgb): void {
    for (let x = 0; x < this.width; x++) {
      const top = edge(x + 0.5);
      for (let y = Math.max(0, Math.floor(top)); y < this.height; y++) this.blend(x, y, colour, clamp01(y + 1 - top));
    }
  }

  /** Parallel stripes at `angle`, `duty` of each period inked, within a rectangle. */
  fillStripes(angle: number, period: number, duty: number, colour: Rgb, box: { x0: number; y0: number; x1: number; y1: number }): void {
    const [nx, ny] = [Math.cos(angle), Math.sin(angle)];
    for (let y = Math.floor(box.y0); y < Math.ceil(box.y1); y++) {
      for (let x = Math.floor(box.x0); x < Math.ceil(box.x1); x++) {
        const along = ((((x + 0.5) * nx + (y + 0.5) * ny) % period) + period) % period;
        // Coverage falls off over one pixel at both edges of the inked part.
        const coverage = clamp01(Math.min(along, period * duty - along) + 0.5);
        this.blend(x, y, colour, coverage * overlap(y, box.y0, box.y1));
      }
    }
  }

  verticalGradient(top: Rgb, bottom: Rgb): void {
    for (let y = 0; y < this.height; y++) this.fillRect(0, y, this.width, y + 1, mix(bottom, top, y / (this.height - 1)));
  }

  private blend(x: number, y: number, colour: Rgb, alpha: number): void {
    if (alpha <= 0) return;
    const at = (y * this.width + x) * 3;
    for (let channel = 0; channel < 3; channel++) {
      this.pixels[at + channel] = Math.round(this.pixels[at + channel]! * (1 - alpha) + colour[channel]! * alpha);
    }
  }
}

/** How much of the pixel [i, i + 1) lies within [from, to). */
function overlap(i: number, from: number, to: number): number {
  return clamp01(Math.min(i + 1, to) - Math.max(i, from));
}

function clamp01(value: number): number {
  return Math.min(1, Math.max(0, value));
}

function mix(a: Rgb, b: Rgb, t: number): Rgb {
  return [0, 1, 2].map((i) => a[i]! + (b[i]! - a[i]!) * t) as unknown as Rgb;
}

/** A small deterministic generator (mulberry32) seeded by the FNV-1a hash of the text. */
function seededRandom(text: string): () => number {
  let state = 0x811c9dc5;
  for (const char of text) state = Math.imul(state ^ char.codePointAt(0)!, 0x01000193);
  return () => {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
