import PgBoss from 'pg-boss';
import type { DataSource } from 'typeorm';

import type { Job, JobServices } from './job';
import { JOBS } from './jobs';

/**
 * A run still active after this long counts as failed (and is retried). It also bounds how long
 * a run left active by a crashed instance blocks its singleton queue.
 */
const RUN_LIMIT_SECONDS = 5 * 60;

/** pg-boss keeps its tables in a schema of their own, beside ours. */
export const JOBS_SCHEMA = 'pgboss';

export interface JobRunner {
  /** Sends a job now (specs and one-off runs); answers the job id. */
  send(name: string): Promise<string | null>;
  /** Stops taking jobs, waits up to `timeoutMs` for running ones, then closes pg-boss's pool. */
  stop(timeoutMs?: number): Promise<void>;
}

/**
 * Starts pg-boss 10 on the server's database and works every job of {@link JOBS}. Safe with
 * several instances: pg-boss claims jobs with `SKIP LOCKED`, sends each cron tick once and
 * creates its schema under an advisory lock; each queue is `singleton`, so a job never runs
 * twice at once. pg-boss has its own small pool (`max` connections).
 */
export async function startJobRunner(databaseUrl: string, dataSource: DataSource, jobs: readonly Job[] = JOBS, services?: JobServices): Promise<JobRunner> {
  // Instances starting together race to create pg-boss's schema: a loser starts again with a fresh client.
  const boss = await settled(async () => {
    const candidate = new PgBoss({ connectionString: databaseUrl, schema: JOBS_SCHEMA, max: 3, application_name: 'lamplight-jobs' });
    candidate.on('error', (error: Error) => console.error(`Background jobs: ${error.message}`));
    try {
      await candidate.start();
      return candidate;
    } catch (error) {
      await candidate.stop({ graceful: false, wait: true }).catch(() => undefined);
      throw error;
    }
  });
  for (const job of jobs) {
    await settled(() => boss.createQueue(job.name, { name: job.name, policy: 'singleton', retryLimit: 2, expireInSeconds: RUN_LIMIT_SECONDS }));
    await settled(() => (job.cron ? boss.schedule(job.name, job.cron, {}, { tz: 'UTC' }) : boss.unschedule(job.name)));
    await boss.work(job.name, { pollingIntervalSeconds: 2 }, async () => {
      await job.run({ dataSource, services });
    });
  }
  return {
    send: (name) => boss.send(name, {}),
    stop: (timeoutMs = 10_000) => boss.stop({ graceful: true, timeout: timeoutMs, wait: true }),
  };
}

/** PostgreSQL's codes for a deadlock and for a table or row another session has just created. */
const COLLISIONS = new Set(['40P01', '23505', '42P07']);

/**
 * Instances starting together create pg-boss's schema and the same queues at once, and PostgreSQL
 * may answer one of them with a duplicate or a deadlock (seen with three instances through
 * PgBouncer): creating what exists is a no-op, so the step is simply tried again a little later.
 */
async function settled<T>(step: () => Promise<T>, attempts = 6): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await step();
    } catch (error) {
      const code = (error as { code?: unknown }).code;
      if (attempt >= attempts || typeof code !== 'string' || !COLLISIONS.has(code)) throw error;
      await new Promise((resolve) => setTimeout(resolve, 100 * attempt + Math.random() * 200));
    }
  }
}
