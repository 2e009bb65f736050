import path from 'node:path';
import { z } from 'zod';

/** Runtime settings from the environment, with embedded defaults that work on a fresh machine. */
const EnvSchema = z.object({
  PORT: z.coerce.number().int().min(1).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  RINGSEAT_DB: z.string().default(path.join('data', 'ringseat.sqlite')),
  RINGSEAT_DATA_DIR: z.string().default('data'),
  /** Public origin when served behind a proxy, e.g. https://ringseat.example.org. */
  RINGSEAT_ORIGIN: z.string().optional(),
  /** Proxies whose X-Forwarded-For is believed: a hop count, or addresses and subnets (`loopback`, `10.0.0.0/8`). */
  RINGSEAT_TRUST_PROXY: z.string().optional(),
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  /** Unset: the demo workshop goes into a new database in development, never in production. */
  RINGSEAT_DEMO: z.enum(['demo', 'none']).optional(),
});

export type AppConfig = {
  port: number;
  host: string;
  databasePath: string;
  dataDir: string;
  publicOrigin?: string;
  /** Express's `trust proxy` from RINGSEAT_TRUST_PROXY; false when unset. */
  trustProxy: string | number | false;
  production: boolean;
  logLevel: z.infer<typeof EnvSchema>['LOG_LEVEL'];
  /** Whether a new database gets the demo workshop: RINGSEAT_DEMO, else only outside production. */
  demo: 'demo' | 'none';
};

export function loadConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  return {
    port: e.PORT,
    host: e.HOST,
    databasePath: e.RINGSEAT_DB,
    dataDir: e.RINGSEAT_DATA_DIR,
    publicOrigin: e.RINGSEAT_ORIGIN,
    trustProxy: trustProxyOf(e.RINGSEAT_TRUST_PROXY),
    production: e.NODE_ENV === 'production',
    logLevel: e.LOG_LEVEL,
    demo: e.RINGSEAT_DEMO ?? (e.NODE_ENV === 'production' ? 'none' : 'demo'),
  };
}

/** `2` trusts two hops; `loopback, 10.0.0.0/8` those addresses; unset or empty trusts none. */
function trustProxyOf(value: string | undefined): string | number | false {
  const text = value?.trim();
  if (!text) return false;
  return /^\d+$/.test(text) ? Number(text) : text;
}
