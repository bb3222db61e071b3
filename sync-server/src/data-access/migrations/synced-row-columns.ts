/**
 * The columns every synced table has besides its fields, as CreateSync1764806400000 made them for
 * `books`. Migrations from Library1764979200000 on share this text. Never change it: a migration
 * that already ran must keep meaning what it meant; new columns get a migration of their own.
 */
export const SYNCED_ROW_COLUMNS = `
  user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
  id uuid NOT NULL,
  deleted boolean,
  clocks jsonb NOT NULL DEFAULT '{}',
  seq bigint NOT NULL,
  PRIMARY KEY (user_id, id)`;
