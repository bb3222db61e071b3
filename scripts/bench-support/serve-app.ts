/**
 * The sync server in a process of its own for a benchmark (as deployed): the benchmark's client
 * then shares no event loop with it. Listens on a free port of 127.0.0.1, sends the port to the
 * parent and serves until the parent disconnects. Uses the parent's environment (database, JWT secret).
 */
import type { AddressInfo } from 'node:net';

import { createApp } from '../../sync-server/src/app';
import { loadConfig } from '../../sync-server/src/config';
import { createDataSource } from '../../sync-server/src/data-access/data-source';
import { createSmtpMailer } from '../../sync-server/src/mail/mailer';

async function main(): Promise<void> {
  const config = loadConfig(process.env);
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const mailer = createSmtpMailer('smtp://127.0.0.1:9', 'bench@example.com');
  const server = createApp({ config, dataSource, mailer }).listen(0, '127.0.0.1', () => {
    process.send!({ port: (server.address() as AddressInfo).port });
  });
  // The benchmark's keep-alive socket idles while it times other paths; Node's 5 s default closed it under load (ECONNRESET).
  server.keepAliveTimeout = 120_000;
  process.on('disconnect', () => {
    server.close();
    mailer.close();
    void dataSource.destroy().then(() => process.exit(0));
  });
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
