import type { ServerConfig } from '../config';
import type { Mailer } from '../mail/mailer';
import type { JobServices } from './job';

/**
 * The services jobs get from the server's config. With `LAMPLIGHT_JOBS_NOW` the jobs' clock
 * starts at that instant and runs on at the real pace, so a spec or a demo can make "the day a
 * loan is due" arrive; the rest of the server keeps the real time.
 */
export function jobServices(config: Pick<ServerConfig, 'publicUrl' | 'jwtSecret' | 'jobsNow'>, mailer: Mailer): JobServices {
  const started = Date.now();
  const fake = config.jobsNow;
  return {
    mailer,
    publicUrl: config.publicUrl,
    serverSecret: config.jwtSecret,
    now: fake === null ? () => new Date() : () => new Date(fake + (Date.now() - started)),
  };
}
