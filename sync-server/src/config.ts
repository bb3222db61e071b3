import { isIP } from 'node:net';
import path from 'node:path';

import * as z from 'zod';

import { LOG_LEVELS, type LogLevel } from './observability/logger';

/** Settings the server reads from the environment, validated once at start-up (fail fast). */
export interface ServerConfig {
  readonly host: string;
  readonly port: number;
  readonly databaseUrl: string;
  /** Folder of the built Angular app; `null` serves only the API (server specs). */
  readonly appDir: string | null;
  readonly production: boolean;
  /** The address readers open, used in links inside e-mails. */
  readonly publicUrl: string;
  /** HMAC key for access tokens (HS256), at least 32 bytes. */
  readonly jwtSecret: Uint8Array;
  readonly bcryptCost: number;
  /** The account with this e-mail is made an admin (at start-up and on registration). */
  readonly adminEmail: string | null;
  /** Where outgoing mail goes; in development the local inbox that `npm start` runs. */
  readonly smtpUrl: string;
  readonly mailFrom: string;
  /** Folder the development inbox writes caught mail to; `null` hides the admin mail page. */
  readonly devMailDir: string | null;
  /** Sign-in, registration and reset attempts allowed per client address per 15 minutes. */
  readonly authRateLimit: number;
  /** Largest cover image accepted by `POST /api/uploads`, in bytes. */
  readonly uploadMaxBytes: number;
  /** SRU base URLs of the library catalogues, asked in this order. */
  readonly catalogueUrls: readonly string[];
  /** How long one catalogue may take to answer. */
  readonly catalogueTimeoutMs: number;
  /** Catalogue look-ups allowed per reader per minute. */
  readonly catalogueRateLimit: number;
  /** Level of the JSON request and server log on stdout. */
  readonly logLevel: LogLevel;
  /** Bearer token that opens `GET /metrics` from anywhere; without it, loopback only. */
  readonly metricsToken: string | null;
  /** How long a device session's check is remembered; another instance's sign-out reaches this one within it (0: never remembered). */
  readonly sessionCheckMs: number;
  /** DATABASE_URL goes through a transaction-mode pooler (PgBouncer): no named prepared statements. */
  readonly dbTransactionPooling: boolean;
  /** Cover storage per reader, in bytes (the sum of the covers they own). */
  readonly uploadQuotaBytes: number;
  /** Proxies whose X-Forwarded-For is believed (Express `trust proxy`); empty: none. */
  readonly trustProxy: readonly string[];
  /** Threads that hash passwords, and sign-ins allowed to wait for one before a 503. */
  readonly hashThreads: number;
  readonly hashQueue: number;
  /** Sync requests per reader per minute, and uploads per reader per 10 minutes. */
  readonly syncRateLimit: number;
  readonly uploadRateLimit: number;
  /** Live updates: where the one LISTEN connection goes (a session, not a transaction pooler) and the heartbeat. */
  /** The instant the jobs' clock starts from (development and tests), else null: the real clock. */
  readonly jobsNow: number | null;
  readonly syncEvents: { readonly listenDatabaseUrl: string; readonly heartbeatMs: number };
}

/** Generous for covers of a few hundred KB each: several thousand books. */
const DEFAULT_UPLOAD_QUOTA_BYTES = 200 * 1024 * 1024;

/** `trust proxy` accepts these names, IP addresses and CIDR ranges (proxy-addr). */
const PROXY_NAMES = new Set(['loopback', 'linklocal', 'uniquelocal']);
function isProxyEntry(entry: string): boolean {
  if (PROXY_NAMES.has(entry)) return true;
  const [address, bits, ...rest] = entry.split('/');
  const version = isIP(address ?? '');
  if (version === 0 || rest.length > 0) return false;
  if (bits === undefined) return true;
  return /^\d{1,3}$/.test(bits) && Number(bits) <= (version === 4 ? 32 : 128);
}

/** The local catalogue that `npm start` runs (sync-server/src/local-catalogue/). */
export const LOCAL_CATALOGUE_URL = 'http://127.0.0.1:41500/sru';

/** Covers are resized on the device to at most 600 px tall, so 2 MiB leaves plenty of room. */
const DEFAULT_UPLOAD_MAX_BYTES = 2 * 1024 * 1024;

const environmentSchema = z
  .object({
    HOST: z.string().min(1).default('127.0.0.1'),
    PORT: z.coerce.number().int().min(0).max(65535).default(8080),
    DATABASE_URL: z
      .string({ error: 'DATABASE_URL is required (scripts/db.sh url prints the local one)' })
      .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must be a postgres:// URL'),
    LAMPLIGHT_APP_DIR: z.string().optional(),
    LAMPLIGHT_PUBLIC_URL: z.url().optional(),
    LAMPLIGHT_JWT_SECRET: z
      .string({ error: 'LAMPLIGHT_JWT_SECRET is required (npm start makes a local one)' })
      .min(32, 'LAMPLIGHT_JWT_SECRET must be at least 32 characters'),
    LAMPLIGHT_BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(10),
    LAMPLIGHT_ADMIN_EMAIL: z.email().optional(),
    SMTP_URL: z
      .string()
      .regex(/^smtps?:\/\//, 'SMTP_URL must be an smtp:// or smtps:// URL')
      .optional(),
    LAMPLIGHT_MAIL_FROM: z.string().default('Lamplight <no-reply@lamplight.invalid>'),
    LAMPLIGHT_DEV_MAIL_DIR: z.string().optional(),
    LAMPLIGHT_AUTH_RATE_LIMIT: z.coerce.number().int().min(1).default(20),
    // An upload is held in memory while it is checked and stored in one bytea value, hence the cap.
    LAMPLIGHT_UPLOAD_MAX_BYTES: z.coerce
      .number()
      .int('must be a whole number of bytes')
      .min(1024, 'must be at least 1024 bytes')
      .max(16 * 1024 * 1024, 'must be at most 16 MiB (16777216 bytes)')
      .default(DEFAULT_UPLOAD_MAX_BYTES),
    LAMPLIGHT_CATALOGUE_URLS: z
      .string()
      .default(LOCAL_CATALOGUE_URL)
      .transform((value) => value.split(/[\s,]+/).filter(Boolean))
      .pipe(z.array(z.url({ protocol: /^https?$/, error: 'each catalogue must be an http:// or https:// URL' }))),
    LAMPLIGHT_CATALOGUE_TIMEOUT_MS: z.coerce.number().int().min(100).max(30_000).default(3000),
    LAMPLIGHT_CATALOGUE_RATE_LIMIT: z.coerce.number().int().min(1).default(30),
    LAMPLIGHT_LOG_LEVEL: z.enum(LOG_LEVELS, { error: `must be one of ${LOG_LEVELS.join(', ')}` }).default('info'),
    LAMPLIGHT_METRICS_TOKEN: z.string().min(32, 'LAMPLIGHT_METRICS_TOKEN must be at least 32 characters').optional(),
    LAMPLIGHT_DB_TRANSACTION_POOLING: z.enum(['true', 'false'], { error: 'must be true or false' }).default('false'),
    LAMPLIGHT_UPLOAD_QUOTA_BYTES: z.coerce.number().int().min(1024).default(DEFAULT_UPLOAD_QUOTA_BYTES),
    LAMPLIGHT_TRUST_PROXY: z
      .string()
      .default('')
      .transform((value) =>
        value
          .split(',')
          .map((entry) => entry.trim())
          .filter((entry) => entry !== ''),
      )
      .refine((entries) => entries.every(isProxyEntry), 'must be a comma-separated list of IP addresses, CIDR ranges or loopback/linklocal/uniquelocal'),
    LAMPLIGHT_HASH_THREADS: z.coerce.number().int().min(1).max(16).default(1),
    LAMPLIGHT_HASH_QUEUE: z.coerce.number().int().min(1).max(10_000).default(32),
    LAMPLIGHT_SYNC_RATE_LIMIT: z.coerce.number().int().min(1).default(600),
    LAMPLIGHT_SESSION_CHECK_MS: z.coerce.number().int().min(0).max(60_000).default(5000),
    LAMPLIGHT_UPLOAD_RATE_LIMIT: z.coerce.number().int().min(1).default(120),
    LAMPLIGHT_LISTEN_DATABASE_URL: z
      .string()
      .regex(/^postgres(ql)?:\/\//, 'must be a postgres:// URL')
      .optional(),
    LAMPLIGHT_SYNC_HEARTBEAT_MS: z.coerce.number().int().min(100).max(120_000).default(25_000),
    /** Development and tests only: the jobs' clock starts at this instant (and runs on from it). */
    LAMPLIGHT_JOBS_NOW: z.iso.datetime({ offset: true, error: 'must be an ISO 8601 instant like 2026-03-05T08:00:00Z' }).optional(),
    NODE_ENV: z.string().optional(),
  })
  .superRefine((env, ctx) => {
    const production = env.NODE_ENV === 'production';
    if (production && !env.SMTP_URL) ctx.addIssue({ code: 'custom', path: ['SMTP_URL'], message: 'SMTP_URL is required in production' });
    if (production && env.LAMPLIGHT_JOBS_NOW) ctx.addIssue({ code: 'custom', path: ['LAMPLIGHT_JOBS_NOW'], message: 'must not be set in production' });
    if (production && env.LAMPLIGHT_BCRYPT_COST < 10) {
      ctx.addIssue({ code: 'custom', path: ['LAMPLIGHT_BCRYPT_COST'], message: 'must be at least 10 in production (OWASP)' });
    }
  });

/** Reads and validates the environment; throws one error naming every bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): ServerConfig {
  const parsed = environmentSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid server configuration:\n  ${problems.join('\n  ')}`);
  }
  const values = parsed.data;
  const production = values.NODE_ENV === 'production';
  return {
    host: values.HOST,
    port: values.PORT,
    databaseUrl: values.DATABASE_URL,
    appDir: values.LAMPLIGHT_APP_DIR ? path.resolve(values.LAMPLIGHT_APP_DIR) : null,
    production,
    publicUrl: (values.LAMPLIGHT_PUBLIC_URL ?? `http://${values.HOST}:${values.PORT}`).replace(/\/$/, ''),
    jwtSecret: new TextEncoder().encode(values.LAMPLIGHT_JWT_SECRET),
    bcryptCost: values.LAMPLIGHT_BCRYPT_COST,
    adminEmail: values.LAMPLIGHT_ADMIN_EMAIL?.toLowerCase() ?? null,
    smtpUrl: values.SMTP_URL ?? 'smtp://127.0.0.1:2525',
    mailFrom: values.LAMPLIGHT_MAIL_FROM,
    devMailDir: production || !values.LAMPLIGHT_DEV_MAIL_DIR ? null : path.resolve(values.LAMPLIGHT_DEV_MAIL_DIR),
    authRateLimit: values.LAMPLIGHT_AUTH_RATE_LIMIT,
    uploadMaxBytes: values.LAMPLIGHT_UPLOAD_MAX_BYTES,
    catalogueUrls: values.LAMPLIGHT_CATALOGUE_URLS,
    catalogueTimeoutMs: values.LAMPLIGHT_CATALOGUE_TIMEOUT_MS,
    catalogueRateLimit: values.LAMPLIGHT_CATALOGUE_RATE_LIMIT,
    logLevel: values.LAMPLIGHT_LOG_LEVEL,
    metricsToken: values.LAMPLIGHT_METRICS_TOKEN ?? null,
    dbTransactionPooling: values.LAMPLIGHT_DB_TRANSACTION_POOLING === 'true',
    uploadQuotaBytes: values.LAMPLIGHT_UPLOAD_QUOTA_BYTES,
    trustProxy: values.LAMPLIGHT_TRUST_PROXY,
    hashThreads: values.LAMPLIGHT_HASH_THREADS,
    hashQueue: values.LAMPLIGHT_HASH_QUEUE,
    syncRateLimit: values.LAMPLIGHT_SYNC_RATE_LIMIT,
    sessionCheckMs: values.LAMPLIGHT_SESSION_CHECK_MS,
    uploadRateLimit: values.LAMPLIGHT_UPLOAD_RATE_LIMIT,
    jobsNow: values.LAMPLIGHT_JOBS_NOW ? Date.parse(values.LAMPLIGHT_JOBS_NOW) : null,
    syncEvents: { listenDatabaseUrl: values.LAMPLIGHT_LISTEN_DATABASE_URL ?? values.DATABASE_URL, heartbeatMs: values.LAMPLIGHT_SYNC_HEARTBEAT_MS },
  };
}
