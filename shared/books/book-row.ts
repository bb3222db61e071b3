/**
 * A `books` row as the pure computations read it (a `books` row fits): every field but the id
 * may be missing or null, as in rows synced from older versions. Each computation picks the
 * fields it reads, so what it needs stays visible at its signature.
 */
export interface LooseBookRow {
  readonly id: string;
  readonly title?: string | null;
  readonly authors?: readonly string[] | null;
  readonly isbn?: string | null;
  readonly format?: string | null;
  readonly pageCount?: number | null;
  readonly audioMinutes?: number | null;
  readonly genres?: readonly string[] | null;
  readonly rating?: number | null;
  readonly status?: string | null;
  /** An instant with 'Z' or an offset, as stored. */
  readonly statusChangedAt?: string | null;
  readonly deleted?: boolean | null;
}
