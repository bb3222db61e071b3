import type { DataSource } from 'typeorm';

/** What a job's run gets: the server's one DataSource. */
export interface JobContext {
  readonly dataSource: DataSource;
}

/**
 * A background job run by pg-boss (`job-runner.ts`). `cron` (UTC, five fields) schedules it;
 * pg-boss keeps schedules in PostgreSQL and sends each tick once, whichever instance sees it
 * first. The queue has the `singleton` policy: at most one run is active across all instances.
 * A run that throws is retried by pg-boss (`retryLimit`), so keep runs idempotent.
 */
export interface Job {
  /** The pg-boss queue name: lower-case words with dashes. */
  readonly name: string;
  readonly cron?: string;
  readonly run: (context: JobContext) => Promise<void>;
}
