import type { DataSource } from 'typeorm';

import type { CatalogueAnswer, CatalogueBook } from '../../../shared/api/catalogue';

/** Catalogue answers in PostgreSQL, so every server instance shares them (table `catalogue_cache`). */
export class CatalogueCache {
  constructor(private readonly dataSource: DataSource) {}

  /** The stored answer for `key`, while it has not expired. */
  async get(key: string): Promise<CatalogueAnswer | null> {
    const rows: { books: CatalogueBook[]; source: string }[] = await this.dataSource.query(
      'SELECT books, source FROM catalogue_cache WHERE key = $1 AND expires_at > now()',
      [key],
    );
    return rows[0] ? { books: rows[0].books, source: rows[0].source } : null;
  }

  /** Keeps an answer for `days`; expired rows are cleared as new ones arrive. */
  async put(key: string, answer: CatalogueAnswer, days: number): Promise<void> {
    await this.dataSource.query(
      `WITH expired AS (DELETE FROM catalogue_cache WHERE expires_at <= now() AND key <> $1)
       INSERT INTO catalogue_cache (key, books, source, fetched_at, expires_at)
       VALUES ($1, $2::jsonb, $3, now(), now() + make_interval(days => $4))
       ON CONFLICT (key) DO UPDATE SET books = excluded.books, source = excluded.source,
         fetched_at = excluded.fetched_at, expires_at = excluded.expires_at`,
      [key, JSON.stringify(answer.books), answer.source, days],
    );
  }
}
