import type { Server } from 'node:http';

import { createApp } from './app';
import { loadConfig } from './config';
import { createDataSource } from './data-access/data-source';
import { migrate } from './data-access/migrate';
import { User } from './data-access/entities/user.entity';
import { createSmtpMailer } from './mail/mailer';
import { closeGracefully, exitOnUnexpectedError } from './process-lifecycle';

/**
 * Starts the server: connect, migrate, listen. Ctrl-C (SIGINT) or SIGTERM stops it gracefully:
 * no new connections, the requests in flight are answered, then the pool closes.
 */
async function main(): Promise<void> {
  exitOnUnexpectedError();
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  if (config.adminEmail) {
    await dataSource.getRepository(User).update({ email: config.adminEmail }, { role: 'admin' });
  }

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
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal}: stopping Lamplight (finishing the requests in flight)…`);
    await closeGracefully(server);
    mailer.close();
    await dataSource.destroy();
    console.log('Lamplight stopped.');
    process.exit(0);
  };
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
