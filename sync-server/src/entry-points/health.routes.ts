import { Router } from 'express';
import type { DataSource } from 'typeorm';

/** How long a health probe waits for PostgreSQL before calling it down. */
const DB_PROBE_TIMEOUT_MS = 2000;

/** `GET /api/health`: the server is up, and PostgreSQL answered a real query. */
export function healthRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const db = (await probeDatabase(dataSource)) ? 'ok' : 'down';
    res.status(db === 'ok' ? 200 : 503).json({ status: db === 'ok' ? 'ok' : 'degraded', db });
  });
  return router;
}

async function probeDatabase(dataSource: DataSource): Promise<boolean> {
  if (!dataSource.isInitialized) return false;
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), DB_PROBE_TIMEOUT_MS);
  });
  const query = dataSource.query('SELECT 1 AS ok').then(
    (rows: { ok: number }[]) => rows[0]?.ok === 1,
    () => false,
  );
  try {
    return await Promise.race([query, timeout]);
  } finally {
    clearTimeout(timer);
  }
}
