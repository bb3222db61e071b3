import type { DataSource } from 'typeorm';

import { hashSecretToken, newSecretToken } from '../domain/secret-tokens';
import { buildFeed } from './build-feed';
import type { CalendarEventSource } from './calendar-event';

/** What the settings page shows: whether a feed is on, since when (never the secret again). */
export interface CalendarFeedStatus {
  readonly active: boolean;
  readonly createdAt: string | null;
}

/**
 * A reader's private calendar feed. The secret (256 random bits) is shown once when made; only
 * its SHA-256 is kept, so a leaked table opens no feed. Making a new one replaces the old (the
 * old URL stops at once); revoking removes it.
 */
export class CalendarFeeds {
  constructor(
    private readonly dataSource: DataSource,
    private readonly sources: readonly CalendarEventSource[],
  ) {}

  async status(userId: string): Promise<CalendarFeedStatus> {
    const [row]: { created_at: Date }[] = await this.dataSource.query('SELECT created_at FROM calendar_feeds WHERE user_id = $1', [userId]);
    return { active: row !== undefined, createdAt: row ? row.created_at.toISOString() : null };
  }

  /** A new secret for the reader, replacing any before. */
  async regenerate(userId: string): Promise<string> {
    const secret = newSecretToken();
    await this.dataSource.query(
      `INSERT INTO calendar_feeds (user_id, secret_hash) VALUES ($1, $2)
       ON CONFLICT (user_id) DO UPDATE SET secret_hash = EXCLUDED.secret_hash, created_at = now()`,
      [userId, hashSecretToken(secret)],
    );
    return secret;
  }

  async revoke(userId: string): Promise<void> {
    await this.dataSource.query('DELETE FROM calendar_feeds WHERE user_id = $1', [userId]);
  }

  /** The feed's iCalendar text, or null for a secret that opens none (never issued, replaced or revoked). */
  async feed(secret: string): Promise<string | null> {
    // Looked up by its hash through the index: no comparison of the secret itself that could leak by timing.
    const [row]: { user_id: string }[] = await this.dataSource.query('SELECT user_id FROM calendar_feeds WHERE secret_hash = $1', [hashSecretToken(secret)]);
    if (!row) return null;
    const events = await this.dataSource.transaction('REPEATABLE READ', async (manager) =>
      (await Promise.all(this.sources.map((source) => source(row.user_id, manager)))).flat(),
    );
    return buildFeed(events);
  }
}
