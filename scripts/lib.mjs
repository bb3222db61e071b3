// Small helpers shared by scripts/start.mjs and scripts/test.mjs. Node built-ins only: these run
// before `npm ci` on a fresh machine.
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
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

/**
 * Runs a command with its output (stdout and stderr, interleaved as they come) kept in memory,
 * for steps that run beside others and print when their turn comes. Resolves `{ code, output }`.
 */
export function runCaptured(command, args, options = {}) {
  return new Promise((resolve) => {
    const chunks = [];
    const child = spawn(command, args, { cwd: root, stdio: ['ignore', 'pipe', 'pipe'], ...options });
    child.stdout.on('data', (chunk) => chunks.push(chunk));
    child.stderr.on('data', (chunk) => chunks.push(chunk));
    const done = (code) => resolve({ code, output: Buffer.concat(chunks).toString('utf8') });
    child.on('close', (code, signal) => done(code ?? (signal ? 1 : 0)));
    child.on('error', (error) => {
      chunks.push(Buffer.from(`${error.message}\n`));
      done(127);
    });
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

/**
 * Installs a Debian package when its program is missing and we are root (apt-get); otherwise
 * stops with the command to run.
 */
export function ensureDebianPackage(program, debianPackage) {
  if (existsSync(program)) return;
  if (process.getuid?.() !== 0) {
    throw new Error(`${program} is missing. Install Debian's ${debianPackage}: sudo apt-get install -y ${debianPackage}`);
  }
  console.log(`Installing Debian's ${debianPackage} (apt-get)…`);
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', debianPackage], { env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
}

/** The token-signing secret: from the environment, else one generated once and kept in .data/. */
export function jwtSecret() {
  if (process.env.LAMPLIGHT_JWT_SECRET) return process.env.LAMPLIGHT_JWT_SECRET;
  const file = path.join(root, '.data', 'jwt-secret');
  if (!existsSync(file)) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}
