import { Router } from 'express';
import type { DataSource } from 'typeorm';

import type { HealthAnswer, ReadyAnswer } from '../../../shared/api/health';

/** How long a readiness probe waits for PostgreSQL before calling it down. */
const DB_PROBE_TIMEOUT_MS = 2000;

/**
 * `GET /api/health` (liveness): the process answers HTTP. It does not ask PostgreSQL, so a
 * database outage takes instances out of the balancer (readiness) rather than restarting them.
 * `GET /api/ready` (readiness): PostgreSQL answers and every migration this build knows is applied.
 */
export function healthRoutes(dataSource: DataSource): { health: Router; ready: Router } {
  const health = Router();
  health.get('/', (_req, res) => {
    res.setHeader('Cache-Control', 'no-store');
    const body: HealthAnswer = { status: 'ok' };
    res.json(body);
  });

  const ready = Router();
  ready.get('/', async (_req, res) => {
    const db = await withTimeout(probeDatabase(dataSource));
    const migrations = db === 'ok' ? await withTimeout(probeMigrations(dataSource)) : 'unknown';
    const isReady = db === 'ok' && migrations === 'ok';
    res.setHeader('Cache-Control', 'no-store');
    const body: ReadyAnswer = { status: isReady ? 'ready' : 'not_ready', db, migrations };
    res.status(isReady ? 200 : 503).json(body);
  });
  return { health, ready };
}

async function probeDatabase(dataSource: DataSource): Promise<'ok' | 'down'> {
  if (!dataSource.isInitialized) return 'down';
  const rows: { ok: number }[] = await dataSource.query('SELECT 1 AS ok');
  return rows[0]?.ok === 1 ? 'ok' : 'down';
}

/** Compares the migrations table with this build's list (TypeORM names each migration). */
async function probeMigrations(dataSource: DataSource): Promise<'ok' | 'pending'> {
  const applied: { name: string }[] = await dataSource.query('SELECT name FROM migrations');
  const names = new Set(applied.map((row) => row.name));
  const known = dataSource.migrations.map((migration) => migration.name ?? migration.constructor.name);
  return known.every((name) => names.has(name)) ? 'ok' : 'pending';
}

/** The probe's answer, or 'down' when it fails or takes longer than the timeout. */
async function withTimeout<T extends string>(probe: Promise<T>): Promise<T | 'down'> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<'down'>((resolve) => {
    timer = setTimeout(() => resolve('down'), DB_PROBE_TIMEOUT_MS);
  });
  try {
    return await Promise.race([probe.catch(() => 'down' as const), timeout]);
  } finally {
    clearTimeout(timer);
  }
}
