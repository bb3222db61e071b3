/**
 * Server specs talk to a real PostgreSQL and start real servers; on a busy 2-core machine a step
 * can take seconds, so Jasmine's 5 s default would fail them for the machine's sake, not ours.
 */
jasmine.DEFAULT_TIMEOUT_INTERVAL = 20_000;
