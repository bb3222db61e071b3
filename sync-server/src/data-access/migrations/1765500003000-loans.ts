import type { MigrationInterface, QueryRunner } from 'typeorm';

import { SYNCED_ROW_COLUMNS } from './synced-row-columns';

/**
 * Libraries, loans and holds, the reader's reminder choice (synced collections), plus what only
 * the server keeps: reminders already sent (so two instances never send one twice), unsubscribes,
 * and the calendar feed secret (its SHA-256 only).
 */
export class Loans1765500003000 implements MigrationInterface {
  name = 'Loans1765500003000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const synced = (table: string, columns: string) => [
      `CREATE TABLE ${table} (${columns}, ${SYNCED_ROW_COLUMNS}, sets jsonb NOT NULL DEFAULT '{}')`,
      `CREATE INDEX ${table}_user_seq_idx ON ${table} (user_id, seq) WHERE seq IS NOT NULL`,
    ];
    const statements = [
      ...synced('libraries', 'name text, card_label text, card_number text, loan_days integer, renewals_allowed integer'),
      ...synced(
        'loans',
        'kind text, book_id uuid, library_id uuid, friend_name text, started_on text, due_on text, renewals_used integer, renewals_allowed integer, returned_on text, queue_position integer, ready_on text, pick_up_by text, hold_outcome text, closed_on text',
      ),
      ...synced('loan_reminders', 'email boolean, days_before integer, hold_ready boolean, lent_overdue boolean, digest boolean, time_zone text, email_since text'),
      `CREATE TABLE loan_reminders_sent (
        user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
        reminder_key text NOT NULL,
        sent_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (user_id, reminder_key))`,
      'CREATE INDEX loan_reminders_sent_at_idx ON loan_reminders_sent (sent_at)',
      `CREATE TABLE loan_reminder_stops (
        user_id uuid PRIMARY KEY REFERENCES users (id) ON DELETE CASCADE,
        stopped_at timestamptz NOT NULL)`,
      `CREATE TABLE calendar_feeds (
        user_id uuid PRIMARY KEY REFERENCES users (id) ON DELETE CASCADE,
        secret_hash text NOT NULL UNIQUE,
        created_at timestamptz NOT NULL DEFAULT now())`,
    ];
    for (const statement of statements) await queryRunner.query(statement);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['calendar_feeds', 'loan_reminder_stops', 'loan_reminders_sent', 'loan_reminders', 'loans', 'libraries']) {
      await queryRunner.query(`DROP TABLE ${table}`);
    }
  }
}
