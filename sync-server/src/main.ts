import type { Server } from 'node:http';

import { createApp } from './app';
import { loadConfig } from './config';
import { createDataSource } from './data-access/data-source';
import { migrate } from './data-access/migrate';
import { User } from './data-access/entities/user.entity';
import { createSmtpMailer } from './domain/mailer';
import { startJobRunner } from './jobs/job-runner';

/** Starts the server: connect, migrate, listen. Ctrl-C (SIGINT) or SIGTERM stops it cleanly. */
async function main(): Promise<void> {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  if (config.adminEmail) {
    await dataSource.getRepository(User).update({ email: config.adminEmail }, { role: 'admin' });
  }

  const jobs = await startJobRunner(config.databaseUrl, dataSource);
  const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
  const app = createApp({ config, dataSource, mailer });
  const server: Server = app.listen(config.port, config.host, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    console.log(`Lamplight is running at http://${config.host}:${port}/`);
  });
  server.on('error', (err) => {
    console.error(`Could not listen on ${config.host}:${config.port}: ${err.message}`);
    process.exit(1);
  });

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal}: stopping Lamplight…`);
    server.close(() => {
      mailer.close();
      void jobs
        .stop()
        .catch((err: unknown) => console.error(`Background jobs did not stop cleanly: ${String(err)}`))
        .then(() => dataSource.destroy())
        .finally(() => process.exit(0));
    });
    server.closeAllConnections();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
