import { ReadingFormat } from './pace-session';

/**
 * A reading pace in the natural unit of its format: pages per hour (print), percent of the
 * book per hour (ebook), or listened minutes per real minute (audiobook; 1.5 at 1.5× speed).
 */
export interface Pace {
  readonly format: ReadingFormat;
  readonly rate: number;
}
