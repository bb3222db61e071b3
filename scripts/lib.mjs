// Small helpers shared by scripts/start.mjs and scripts/test.mjs. Node built-ins only: these run
// before `npm ci` on a fresh machine.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');

/** Runs a command to completion with inherited output; throws when it fails. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit', ...options });
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} failed (exit ${result.status ?? result.signal})`);
  }
}

/** Runs a command and resolves with its exit code (never throws for a non-zero exit). */
export function runStatus(command, args, options = {}) {
  return new Promise((resolve) => {
    const child = spawn(command, args, { cwd: root, stdio: 'inherit', ...options });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
    child.on('error', () => resolve(127));
  });
}

/** Output of a command, trimmed. */
export function capture(command, args) {
  const result = spawnSync(command, args, { cwd: root, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed: ${result.stderr}`);
  return result.stdout.trim();
}

/** `npm ci` when node_modules is missing, or older than package-lock.json (after a pull). */
export function ensureDependencies() {
  const installed = path.join(root, 'node_modules', '.package-lock.json');
  const lock = path.join(root, 'package-lock.json');
  if (existsSync(installed) && statSync(installed).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log('Installing npm dependencies (npm ci)…');
  run('npm', ['ci', '--no-audit', '--no-fund']);
}

/** Starts the project-local PostgreSQL cluster (installs Debian's package when missing). */
export function startDatabase() {
  run('bash', ['scripts/db.sh', 'start']);
}

export function databaseUrl(name) {
  return capture('bash', ['scripts/db.sh', 'url', name]);
}

export const bin = (name) => path.join(root, 'node_modules', '.bin', name);
