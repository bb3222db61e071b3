// The cluster of `npm run start:cluster` (scripts/start.mjs --cluster builds and seeds first):
// nginx on LAMPLIGHT_CLUSTER_LISTEN (127.0.0.1:8080) in front of server instances on
// LAMPLIGHT_CLUSTER_PORTS (8081,8082,8083), through PgBouncer on LAMPLIGHT_PGBOUNCER_PORT (6432)
// when run with --pgbouncer. Ctrl-C stops them all; PostgreSQL keeps running.
import path from 'node:path';

import { startCluster } from './cluster';

async function main(): Promise<void> {
  const ports = (process.env['LAMPLIGHT_CLUSTER_PORTS'] ?? '8081,8082,8083').split(',').map((port) => Number(port.trim()));
  if (ports.some((port) => !Number.isInteger(port) || port < 1 || port > 65535)) {
    throw new Error('LAMPLIGHT_CLUSTER_PORTS must be a comma-separated list of ports, e.g. 8081,8082,8083');
  }
  const withPgBouncer = process.argv.includes('--pgbouncer');
  const cluster = await startCluster({
    env: process.env,
    instancePorts: ports,
    listen: process.env['LAMPLIGHT_CLUSTER_LISTEN'] ?? '127.0.0.1:8080',
    prefix: path.resolve(__dirname, '../../../../.data/nginx'),
    echo: true,
    ...(withPgBouncer ? { pgBouncerPort: Number(process.env['LAMPLIGHT_PGBOUNCER_PORT'] ?? 6432) } : {}),
  });
  console.error(
    `\nLamplight cluster: ${cluster.baseUrl}/ → nginx → instances on ${cluster.instances.map((instance) => instance.port).join(', ')}` +
      (cluster.pgBouncer ? ` → PgBouncer (${cluster.pgBouncer.databaseUrl.replace(/:[^:@/]*@/, ':…@')})` : '') +
      ` → PostgreSQL. nginx files: .data/nginx/. Ctrl-C stops.\n`,
  );
  let stopping = false;
  const stop = () => {
    if (stopping) return;
    stopping = true;
    void cluster.stop().then(() => process.exit(0));
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  // An instance that dies is reported; nginx keeps serving from the others.
  for (const instance of cluster.instances) {
    instance.child.once('exit', (code, signal) => {
      if (!stopping) console.error(`${instance.name} (port ${instance.port}) exited (${code ?? signal}); nginx sends its share to the others`);
    });
  }
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
