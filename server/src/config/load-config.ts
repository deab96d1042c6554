import { DEV_SECRETS, envSchema, type AppConfig } from './env.schema.js';

export const APP_CONFIG = Symbol('APP_CONFIG');

/** Validates the environment once at boot; refuses production with development secrets. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const config = parsed.data;
  if (config.NODE_ENV === 'production') {
    const unsafe = (Object.keys(DEV_SECRETS) as (keyof typeof DEV_SECRETS)[]).filter(
      (key) => config[key] === DEV_SECRETS[key],
    );
    if (unsafe.length > 0) {
      throw new Error(`Refusing to start in production with development defaults for: ${unsafe.join(', ')}`);
    }
  }
  return config;
}
