import { z } from 'zod';

/** Development defaults: fine on a laptop, refused in production (see loadConfig). */
export const DEV_SECRETS = {
  JWT_SECRET: 'endgrain-dev-jwt-secret-change-me',
  DB_PASSWORD: 'endgrain-dev-db-password',
  SEARCH_MASTER_KEY: 'endgrain-dev-search-master-key',
} as const;

const port = z.coerce.number().int().min(1).max(65535);

export const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: port.default(3000),
  HOST: z.string().default('127.0.0.1'),
  PUBLIC_URL: z.url().default('http://127.0.0.1:3000'),
  TRUST_PROXY: z.string().default('loopback'),
  DB_HOST: z.string().default('127.0.0.1'),
  DB_PORT: port.default(3307),
  DB_NAME: z.string().regex(/^[A-Za-z0-9_]+$/).default('endgrain'),
  DB_USER: z.string().default('endgrain'),
  DB_PASSWORD: z.string().default(DEV_SECRETS.DB_PASSWORD),
  JWT_SECRET: z.string().min(16).default(DEV_SECRETS.JWT_SECRET),
  JWT_TTL: z.string().default('12h'),
  SEARCH_URL: z.url().default('http://127.0.0.1:7700'),
  SEARCH_MASTER_KEY: z.string().default(DEV_SECRETS.SEARCH_MASTER_KEY),
  SMTP_URL: z.string().default('smtp://127.0.0.1:1025'),
  MAIL_FROM: z.string().default('Endgrain <no-reply@example.org>'),
  CLIENT_DIST: z.string().optional(),
  UPLOAD_DIR: z.string().default('.data/uploads'),
  DEMO_PASSWORD: z.string().default('endgrain-demo-2026'),
  SIGN_IN_LIMIT_PER_IP: z.coerce.number().int().positive().default(20),
  SIGN_IN_LIMIT_PER_ACCOUNT: z.coerce.number().int().positive().default(5),
  SIGN_IN_WINDOW_SECONDS: z.coerce.number().int().positive().default(900),
});

export type AppConfig = z.infer<typeof envSchema>;
