import type { DataSource } from 'typeorm';

import type { Mailer } from '../mail/mailer';

/** What jobs that reach readers need besides the database (`main.ts` gives them; specs give their own). */
export interface JobServices {
  readonly mailer: Mailer;
  /** The app's address, for links in mails. */
  readonly publicUrl: string;
  /** The server secret, for signed links (unsubscribe). */
  readonly serverSecret: Uint8Array;
  /** The jobs' clock: the real one, or a moved one in development and tests (`LAMPLIGHT_JOBS_NOW`). */
  readonly now: () => Date;
}

/** What a job's run gets: the server's one DataSource, and the services when the runner was given them. */
export interface JobContext {
  readonly dataSource: DataSource;
  readonly services?: JobServices;
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

/**
 * Runs `step` until it finds nothing more to do or has run `most` times, so one run of a job
 * stays short; the job's next run takes the rest.
 */
export async function atMost(most: number, step: () => Promise<boolean>): Promise<void> {
  for (let n = 0; n < most && (await step()); n++);
}
