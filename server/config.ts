import { z } from 'zod';

// The only reader of process.env. A bad variable stops start-up with every problem listed at once.
const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  HOST: z.string().default('127.0.0.1'),
  DATABASE_URL: z.string().url().default('postgres://spurwood@127.0.0.1:54329/spurwood'),
  SMTP_URL: z.string().url().default('smtp://127.0.0.1:1025'),
  MAIL_FROM: z.string().default('Spurwood <reminders@spurwood.example.org>'),
  APP_URL: z.string().url().optional(),
  SESSION_SECRET: z.string().min(16, 'must be at least 16 characters').optional(),
  COOKIE_SECURE: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  // bcrypt work factor: 12 is OWASP's Password Storage Cheat Sheet floor of 10 plus headroom; tests lower it for speed.
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(12),
  SIGN_IN_LIMIT: z.coerce.number().int().min(1).default(10),
  CLIENT_DIR: z.string().default('dist/client'),
  // The weather-station service sites pull daily readings from; `npm start` runs a local fake here.
  STATION_URL: z.string().url().default('http://127.0.0.1:8089'),
  STATION_TIMEOUT_MS: z.coerce.number().int().min(100).max(60_000).default(8000),
  // Photos live here, outside the web root (relative paths from the repository); the tests use a temp folder.
  UPLOAD_DIR: z.string().min(1).default('.data/uploads'),
});

export type Config = z.infer<typeof envSchema> & { APP_URL: string; SESSION_SECRET: string };

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Spurwood cannot start; fix these environment variables:\n${lines.join('\n')}`);
  }
  const value = parsed.data;
  if (value.NODE_ENV === 'production' && !value.SESSION_SECRET) {
    throw new Error('Spurwood cannot start; fix these environment variables:\n  SESSION_SECRET: required in production');
  }
  return {
    ...value,
    APP_URL: value.APP_URL ?? `http://${value.HOST}:${value.PORT}`,
    // Outside production a fixed secret keeps sessions across restarts of a developer's server.
    SESSION_SECRET: value.SESSION_SECRET ?? 'spurwood-development-secret-not-for-production',
  };
}

export const config = loadConfig();
