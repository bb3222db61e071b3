import type { Server } from 'node:http';

import { createApp } from './app';
import { loadConfig } from './config';
import { createDataSource } from './data-access/data-source';
import { migrate } from './data-access/migrate';
import { User } from './data-access/entities/user.entity';
import { createSmtpMailer } from './mail/mailer';
import { closeGracefully, exitOnUnexpectedError } from './process-lifecycle';
import { createLogger } from './observability/logger';
import { closePasswordPools } from './domain/passwords';
import { jobServices } from './jobs/job-services';
import { JOBS } from './jobs/jobs';
import { startJobRunner } from './jobs/job-runner';
import { circleReminders } from './jobs/circle-reminders.job';

/**
 * Starts the server: connect, migrate, listen. Ctrl-C (SIGINT) or SIGTERM stops it gracefully:
 * no new connections, the requests in flight are answered, then the pool closes.
 */
async function main(): Promise<void> {
  exitOnUnexpectedError();
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  await migrate(dataSource);
  if (config.adminEmail) {
    await dataSource.getRepository(User).update({ email: config.adminEmail }, { role: 'admin' });
  }

  const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
  const services = jobServices(config, mailer);
  const jobs = await startJobRunner(config.databaseUrl, dataSource, [...JOBS, circleReminders(mailer, config.publicUrl, services.now)], services);
  const app = createApp({ config, dataSource, mailer, logger });
  const server: Server = app.listen(config.port, config.host, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    // Said at info even when the log level is higher: scripts starting instances wait for it.
    const announce = config.logLevel === 'silent' ? logger : logger.child({}, { level: 'info' });
    announce.info({ port }, `Lamplight is running at http://${config.host}:${port}/`);
  });
  server.on('error', (err) => {
    logger.fatal(`Could not listen on ${config.host}:${config.port}: ${err.message}`);
    process.exit(1);
  });

  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info(`${signal}: stopping Lamplight (finishing the requests in flight)`);
    await closeGracefully(server);
    mailer.close();
    await jobs.stop().catch((err: unknown) => logger.error(`Background jobs did not stop cleanly: ${String(err)}`));
    await Promise.allSettled([dataSource.destroy(), closePasswordPools()]);
    logger.info('Lamplight stopped.');
    process.exit(0);
  };
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
