import { Counter, Gauge, Histogram, Registry, collectDefaultMetrics } from 'prom-client';
import type { DataSource } from 'typeorm';

/**
 * The process's Prometheus metrics (prom-client). One registry per process, like the process
 * itself: several apps in one process (specs) add to the same counters.
 */
export const registry = new Registry();
collectDefaultMetrics({ register: registry, prefix: 'lamplight_' });

/** A histogram in this process's registry. */
function histogram<L extends string = never>(name: string, help: string, buckets: number[], labelNames: readonly L[] = []): Histogram<L> {
  return new Histogram<L>({ name, help, buckets, labelNames, registers: [registry] });
}

export const httpDuration = histogram(
  'lamplight_http_request_duration_seconds',
  'Time from request to response, by method, route pattern and status',
  [0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5, 5, 10],
  ['method', 'route', 'status'] as const,
);

export const pushChanges = histogram('lamplight_sync_push_changes', 'Field changes per accepted push', [1, 5, 20, 50, 100, 250, 500, 1000]);

export const pushOutcome = new Counter({
  name: 'lamplight_sync_push_changes_total',
  help: 'Field changes pushed, by outcome (applied: won the merge; duplicate: already stored or older)',
  labelNames: ['outcome'] as const,
  registers: [registry],
});

export const pullChanges = histogram('lamplight_sync_pull_changes', 'Field changes per pulled page', [0, 1, 10, 100, 500, 1000, 2500, 5000]);

export const mergeDuration = histogram(
  'lamplight_sync_merge_seconds',
  'Time to merge one push in PostgreSQL (lock, merge statements, commit)',
  [0.001, 0.0025, 0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1, 2.5],
);

export const outboxLag = histogram(
  'lamplight_sync_outbox_lag_seconds',
  "Time from a change's clock on the device to its push reaching the server (device clocks may be off)",
  [1, 5, 15, 60, 300, 900, 3600, 6 * 3600, 24 * 3600, 7 * 24 * 3600],
);

const pools = new Set<DataSource>();

/** Reports the pool of this DataSource in `lamplight_db_pool_connections`. */
export function trackPool(dataSource: DataSource): void {
  pools.add(dataSource);
}

/** node-postgres' Pool counters, where TypeORM keeps it. */
interface PgPool {
  totalCount: number;
  idleCount: number;
  waitingCount: number;
}

new Gauge({
  name: 'lamplight_db_pool_connections',
  help: 'Database pool: open connections (total), idle ones, and queries waiting for one',
  labelNames: ['state'] as const,
  registers: [registry],
  collect() {
    const sums = { total: 0, idle: 0, waiting: 0 };
    for (const dataSource of pools) {
      if (!dataSource.isInitialized) {
        pools.delete(dataSource);
        continue;
      }
      const pool = (dataSource.driver as unknown as { master?: PgPool }).master;
      if (!pool) continue;
      sums.total += pool.totalCount;
      sums.idle += pool.idleCount;
      sums.waiting += pool.waitingCount;
    }
    for (const [state, value] of Object.entries(sums)) this.set({ state }, value);
  },
});

/** Jobs waiting or running in pg-boss's queue table, when that table exists (read at scrape time). */
const jobQueueDepth = new Gauge({
  name: 'lamplight_job_queue_depth',
  help: 'Background jobs by queue and state (created, retry, active); absent until the job runner has made its tables',
  labelNames: ['queue', 'state'] as const,
  registers: [registry],
});

/** Refreshes the gauges that need a query; called before each scrape. */
export async function refreshQueryGauges(dataSource: DataSource): Promise<void> {
  jobQueueDepth.reset();
  const [table] = await dataSource.query(`SELECT to_regclass('pgboss.job') IS NOT NULL AS present`);
  if (!table?.present) return;
  const rows: { queue: string; state: string; jobs: string }[] = await dataSource.query(
    `SELECT name AS queue, state::text AS state, count(*) AS jobs FROM pgboss.job
     WHERE state IN ('created', 'retry', 'active') GROUP BY 1, 2`,
  );
  for (const row of rows) jobQueueDepth.set({ queue: row.queue, state: row.state }, Number(row.jobs));
}
