/**
 * The probes: `GET /api/health` (liveness: the process answers) and `GET /api/ready`
 * (readiness: PostgreSQL answers and every migration is applied; 503 otherwise).
 */
export interface HealthAnswer {
  readonly status: 'ok';
}

export interface ReadyAnswer {
  readonly status: 'ready' | 'not_ready';
  readonly db: 'ok' | 'down';
  readonly migrations: 'ok' | 'pending' | 'unknown' | 'down';
}
