import { z } from 'zod';

/** Settings the server reads from the environment, validated once at start-up (fail fast). */
export interface ServerConfig {
  readonly host: string;
  readonly port: number;
  readonly databaseUrl: string;
  /** Folder of the built Angular app; `null` serves only the API (server specs). */
  readonly appDir: string | null;
  readonly production: boolean;
}

const environmentSchema = z.object({
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(0).max(65535).default(8080),
  DATABASE_URL: z
    .string({ error: 'DATABASE_URL is required (scripts/db.sh url prints the local one)' })
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must be a postgres:// URL'),
  LAMPLIGHT_APP_DIR: z.string().optional(),
  NODE_ENV: z.string().optional(),
});

/** Reads and validates the environment; throws one error naming every bad variable. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): ServerConfig {
  const parsed = environmentSchema.safeParse(env);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid server configuration:\n  ${problems.join('\n  ')}`);
  }
  const values = parsed.data;
  return {
    host: values.HOST,
    port: values.PORT,
    databaseUrl: values.DATABASE_URL,
    appDir: values.LAMPLIGHT_APP_DIR ?? null,
    production: values.NODE_ENV === 'production',
  };
}
