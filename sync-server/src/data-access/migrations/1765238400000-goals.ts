import type { MigrationInterface, QueryRunner } from 'typeorm';

import { SYNCED_ROW_COLUMNS } from './synced-row-columns';

/** Plans for years and months, and reading challenges. */
export class Goals1765238400000 implements MigrationInterface {
  name = 'Goals1765238400000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE year_plans (year integer, books_target integer, pages_target integer, minutes_target integer, best_book_id uuid, other_goals jsonb, notes text, ${SYNCED_ROW_COLUMNS})`,
    );
    await queryRunner.query('CREATE INDEX year_plans_user_seq_idx ON year_plans (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(
      `CREATE TABLE month_plans (month text, books_target integer, pages_target integer, minutes_target integer, favourite_book_id uuid, least_favourite_book_id uuid, reflection text, ${SYNCED_ROW_COLUMNS})`,
    );
    await queryRunner.query('CREATE INDEX month_plans_user_seq_idx ON month_plans (user_id, seq) WHERE seq IS NOT NULL');
    await queryRunner.query(
      `CREATE TABLE challenges (name text, kind text, period_start text, period_end text, target integer, alphabet_by text, prompts jsonb, celebrated_at text, ${SYNCED_ROW_COLUMNS})`,
    );
    await queryRunner.query('CREATE INDEX challenges_user_seq_idx ON challenges (user_id, seq) WHERE seq IS NOT NULL');
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TABLE challenges');
    await queryRunner.query('DROP TABLE month_plans');
    await queryRunner.query('DROP TABLE year_plans');
  }
}
