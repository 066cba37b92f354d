import { isIP } from 'node:net';
import { resolve, sep } from 'node:path';
import { z } from 'zod';

const port = (fallback: number) => z.coerce.number().int().min(0).max(65535).default(fallback);

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: port(3000),
  DATABASE_URL: z
    .url({ protocol: /^postgres(ql)?$/ })
    .default('postgres://shoalwise@127.0.0.1:5487/shoalwise'),
  PUBLIC_BASE_URL: z.url().optional(),
  SESSION_SECRET: z.string().min(32).optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  SMTP_HOST: z.string().optional(),
  SMTP_PORT: port(0),
  MAIL_FROM: z.string().default('Shoalwise <no-reply@shoalwise.invalid>'),
  /** Where uploaded photos are kept: outside the web root, never served statically. */
  UPLOADS_DIR: z.string().min(1).default('.data/uploads'),
  /** Who may tell us the client's address in X-Forwarded-For; required in production (see trustProxySetting). */
  TRUST_PROXY: z.string().trim().min(1).optional(),
  /** How often open sockets are checked against their sessions (ended or expired ones are disconnected). */
  SOCKET_SESSION_CHECK_SECONDS: z.coerce.number().int().min(1).max(3600).default(30),
});

const NAMED_RANGES = new Set(['loopback', 'linklocal', 'uniquelocal']);
const isAddressOrRange = (entry: string) => {
  if (NAMED_RANGES.has(entry)) return true;
  const [address, bits, ...rest] = entry.split('/');
  const family = isIP(address ?? '');
  if (!family || rest.length) return false;
  return bits === undefined || (/^\d+$/.test(bits) && Number(bits) <= (family === 4 ? 32 : 128));
};

/**
 * Express's `trust proxy`: `false` (no proxy, the socket's address is the client's), a number of proxy hops, or the
 * proxies' addresses and ranges. `true` (believe any X-Forwarded-For) is refused: it lets a client pick the address
 * that rate limits count.
 */
function trustProxySetting(value: string | undefined): false | number | string[] {
  if (value === undefined || value === 'false' || value === 'none') return false;
  if (/^\d+$/.test(value)) {
    const hops = Number(value);
    if (hops >= 1 && hops <= 10) return hops;
  }
  const entries = value
    .split(',')
    .map((e) => e.trim())
    .filter(Boolean);
  if (value !== 'true' && entries.length && entries.every(isAddressOrRange)) return entries;
  throw new ConfigError(
    `Bad configuration: TRUST_PROXY must be "none", a number of proxy hops (1-10) or the proxies' addresses/ranges (e.g. "loopback, 10.0.0.0/8"), not "${value}"`,
  );
}

export type Env = z.infer<typeof envSchema>;

export interface Config {
  env: Env['NODE_ENV'];
  isProduction: boolean;
  host: string;
  port: number;
  databaseUrl: string;
  baseUrl: string;
  sessionSecret: string;
  logLevel: Env['LOG_LEVEL'];
  smtp: { host: string | undefined; port: number };
  mailFrom: string;
  /** Absolute path of the photo folder. */
  uploadsDir: string;
  /** Express's `trust proxy` (TRUST_PROXY). */
  trustProxy: false | number | string[];
  socketSessionCheckSeconds: number;
}

export class ConfigError extends Error {
  override name = 'ConfigError';
}

/** Reads the environment once. Throws a ConfigError whose message names each bad variable on one line. */
export function loadConfig(source: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(source);
  if (!parsed.success) {
    const problems = parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ');
    throw new ConfigError(`Bad configuration: ${problems}`);
  }
  const e = parsed.data;
  const isProduction = e.NODE_ENV === 'production';
  if (isProduction && !e.SESSION_SECRET)
    throw new ConfigError('Bad configuration: SESSION_SECRET is required in production');
  if (isProduction && !e.PUBLIC_BASE_URL)
    throw new ConfigError('Bad configuration: PUBLIC_BASE_URL is required in production');
  // Behind a proxy every client would share the proxy's address (one limit for everyone) unless this is said.
  if (isProduction && !e.TRUST_PROXY)
    throw new ConfigError(
      'Bad configuration: TRUST_PROXY is required in production ("none" when no proxy is in front)',
    );
  const trustProxy = trustProxySetting(e.TRUST_PROXY);
  const uploadsDir = resolve(e.UPLOADS_DIR);
  // The built client is served statically: uploads there would bypass the permission checks (ASVS 5.3.1).
  for (const servedFolder of [resolve('dist'), resolve('public')]) {
    if (uploadsDir === servedFolder || uploadsDir.startsWith(`${servedFolder}${sep}`)) {
      throw new ConfigError(`Bad configuration: UPLOADS_DIR must be outside ${servedFolder}`);
    }
  }
  return {
    env: e.NODE_ENV,
    isProduction,
    host: e.HOST,
    port: e.PORT,
    databaseUrl: e.DATABASE_URL,
    baseUrl: (e.PUBLIC_BASE_URL ?? `http://127.0.0.1:${e.PORT}`).replace(/\/$/, ''),
    // Development and tests get a fixed secret so sessions survive restarts; production must set one.
    sessionSecret: e.SESSION_SECRET ?? 'development-only-secret-not-for-production-use',
    logLevel: e.NODE_ENV === 'test' && !source.LOG_LEVEL ? 'silent' : e.LOG_LEVEL,
    smtp: { host: e.SMTP_HOST, port: e.SMTP_PORT },
    mailFrom: e.MAIL_FROM,
    uploadsDir,
    trustProxy,
    socketSessionCheckSeconds: e.SOCKET_SESSION_CHECK_SECONDS,
  };
}
