import type { Server } from 'node:http';

/** How long in-flight requests get to finish after SIGTERM before their connections are cut. */
export const SHUTDOWN_GRACE_MS = 10_000;

/**
 * After an error nothing caught, the process is in a state no code planned for: log it and exit,
 * so the supervisor (systemd, the cluster script, a container runtime) starts a fresh one.
 */
export function exitOnUnexpectedError(log: (...args: unknown[]) => void = console.error): void {
  process.on('unhandledRejection', (reason) => {
    log('Unhandled promise rejection; exiting so the supervisor restarts the server:', reason);
    process.exit(1);
  });
  process.on('uncaughtException', (err) => {
    log('Uncaught exception; exiting so the supervisor restarts the server:', err);
    process.exit(1);
  });
}

/**
 * Stops accepting connections and resolves once the requests in flight have been answered (idle
 * keep-alive connections close at once). Connections still open after `graceMs` are cut.
 */
export function closeGracefully(server: Server, graceMs = SHUTDOWN_GRACE_MS): Promise<void> {
  return new Promise((resolve) => {
    const deadline = setTimeout(() => server.closeAllConnections(), graceMs);
    deadline.unref();
    server.close(() => {
      clearTimeout(deadline);
      resolve();
    });
    server.closeIdleConnections();
  });
}
