import { z } from 'zod';
import { LOG_LEVELS, type LogLevel } from '../common/logger';
import {
  defaultSheetRenderLimits,
  type SheetRenderLimits,
} from '../modules/sheets/render/sheet-render-limits';

const DEV_SESSION_SECRET = 'tackline-dev-session-secret-change-me';
/** Where `npm run dev` serves the client (vite.config.ts), proxying /api here. */
const DEV_SERVER_ORIGINS = ['http://127.0.0.1:5173', 'http://localhost:5173'];

const envSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  DATABASE_URL: z.url().default('postgres://postgres@127.0.0.1:54717/tackline'),
  // TACKLINE_PORT is what the scripts export; PORT wins when both are set.
  PORT: z.coerce.number().int().min(1).max(65535).optional(),
  TACKLINE_PORT: z.coerce.number().int().min(1).max(65535).default(4717),
  HOST: z.string().min(1).default('127.0.0.1'),
  SESSION_SECRET: z.string().min(16).optional(),
  PUBLIC_URL: z.url().optional(),
  // Extra page origins whose writes are accepted besides PUBLIC_URL's (comma-separated).
  ALLOWED_ORIGINS: z.string().optional(),
  // auto: Secure cookies when PUBLIC_URL is https. false: e.g. tests over plain http.
  COOKIE_SECURE: z.enum(['auto', 'true', 'false']).default('auto'),
  // Express "trust proxy". Unset: trust a loopback proxy only when PUBLIC_URL is https.
  TRUST_PROXY: z.string().min(1).optional(),
  SIGN_IN_MAX_ATTEMPTS: z.coerce.number().int().min(1).default(10),
  SIGN_IN_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  // Absolute session lifetime from sign-in, however active the session has been.
  SESSION_LIFETIME_DAYS: z.coerce.number().positive().max(365).default(7),
  BCRYPT_COST: z.coerce.number().int().min(4).max(15).default(10),
  JSON_BODY_LIMIT: z.string().default('2mb'),
  LOG_LEVEL: z.enum(LOG_LEVELS).default('info'),
  // Slow clients: whole headers within, whole request within, idle keep-alive socket closed after.
  HTTP_HEADERS_TIMEOUT_MS: z.coerce.number().int().min(100).max(600_000).default(10_000),
  HTTP_REQUEST_TIMEOUT_MS: z.coerce.number().int().min(100).max(3_600_000).default(20_000),
  HTTP_KEEP_ALIVE_TIMEOUT_MS: z.coerce.number().int().min(100).max(600_000).default(5_000),
  // Sheet rendering on worker threads (server/modules/sheets/render/sheet-render-pool.ts).
  SHEET_RENDER_THREADS: z.coerce.number().int().min(1).max(64).optional(),
  SHEET_RENDER_TIMEOUT_MS: z.coerce.number().int().min(1).max(600_000).default(30_000),
  SHEET_RENDER_MEMORY_MB: z.coerce.number().int().min(64).max(16_384).default(512),
  SHEET_RENDER_QUEUE: z.coerce.number().int().min(0).max(10_000).default(16),
  SHEET_RENDER_WAIT_MS: z.coerce.number().int().min(1).max(600_000).default(20_000),
});

/** Everything the server reads from its environment, parsed once. */
export interface ServerConfig {
  nodeEnv: 'development' | 'test' | 'production';
  databaseUrl: string;
  port: number;
  host: string;
  sessionSecret: string;
  /** True when SESSION_SECRET was not set and the development value is in use. */
  usingDevSessionSecret: boolean;
  publicUrl: string;
  /**
   * Origins of pages allowed to send writes: PUBLIC_URL's, ALLOWED_ORIGINS, and in
   * development the Vite dev server. (The origin a request is addressed to always is.)
   */
  allowedOrigins: string[];
  /** Cookies get `Secure` when the public URL is https (COOKIE_SECURE=auto), or as COOKIE_SECURE says. */
  secureCookies: boolean;
  /**
   * Express "trust proxy" value. Off unless configured or behind an https public URL,
   * so a client cannot pick its own address (and dodge the sign-in limit) with X-Forwarded-For.
   */
  trustProxy: boolean | string;
  signIn: { maxAttemptsPerAccount: number; maxAttemptsPerIp: number; windowMs: number };
  bcryptCost: number;
  jsonBodyLimit: string;
  /** pino level of the server log (stdout, one JSON line per event). */
  logLevel: LogLevel;
  /** Node http server time-outs in ms (see server/http-server.ts). */
  http: HttpTimeouts;
  /** Seconds between pruning expired sessions; false turns pruning off (tests). */
  sessionPruneSeconds: number | false;
  /** A session ends this long (ms) after its sign-in, even while in use. */
  sessionLifetimeMs: number;
  /** Render threads and the time, memory and queue limits of sheet rendering. */
  sheetRender: SheetRenderLimits;
}

/** Node http server time-outs, in milliseconds. */
export interface HttpTimeouts {
  /** Longest time to receive a request's headers (Node `headersTimeout`). */
  headersTimeoutMs: number;
  /** Longest time to receive a whole request, headers and body (Node `requestTimeout`). */
  requestTimeoutMs: number;
  /** How long an idle keep-alive connection stays open (Node `keepAliveTimeout`). */
  keepAliveTimeoutMs: number;
}

/** Parses `env` (default `process.env`) into the server config; exits on a bad value. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): ServerConfig {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const port = e.PORT ?? e.TACKLINE_PORT;
  if (!e.SESSION_SECRET) {
    if (e.NODE_ENV === 'production') throw new Error('SESSION_SECRET must be set in production');
  }
  const publicUrl = e.PUBLIC_URL ?? `http://${e.HOST}:${port}`;
  return {
    nodeEnv: e.NODE_ENV,
    databaseUrl: e.DATABASE_URL,
    port,
    host: e.HOST,
    sessionSecret: e.SESSION_SECRET ?? DEV_SESSION_SECRET,
    usingDevSessionSecret: !e.SESSION_SECRET,
    publicUrl,
    allowedOrigins: [
      new URL(publicUrl).origin,
      ...(e.ALLOWED_ORIGINS ?? '')
        .split(',')
        .map((o) => o.trim())
        .filter(Boolean)
        .map((o) => new URL(o).origin),
      ...(e.NODE_ENV === 'development' ? DEV_SERVER_ORIGINS : []),
    ],
    secureCookies: e.COOKIE_SECURE === 'auto' ? publicUrl.startsWith('https:') : e.COOKIE_SECURE === 'true',
    trustProxy:
      e.TRUST_PROXY === undefined
        ? publicUrl.startsWith('https:') && 'loopback'
        : e.TRUST_PROXY === 'true' || (e.TRUST_PROXY === 'false' ? false : e.TRUST_PROXY),
    signIn: {
      maxAttemptsPerAccount: e.SIGN_IN_MAX_ATTEMPTS,
      // A looser per-address cap stops one client spraying many e-mails.
      maxAttemptsPerIp: e.SIGN_IN_MAX_ATTEMPTS * 5,
      windowMs: e.SIGN_IN_WINDOW_MINUTES * 60_000,
    },
    bcryptCost: e.BCRYPT_COST,
    jsonBodyLimit: e.JSON_BODY_LIMIT,
    logLevel: e.LOG_LEVEL,
    http: {
      headersTimeoutMs: e.HTTP_HEADERS_TIMEOUT_MS,
      // Node requires requestTimeout >= headersTimeout.
      requestTimeoutMs: Math.max(e.HTTP_REQUEST_TIMEOUT_MS, e.HTTP_HEADERS_TIMEOUT_MS),
      keepAliveTimeoutMs: e.HTTP_KEEP_ALIVE_TIMEOUT_MS,
    },
    sessionPruneSeconds: e.NODE_ENV === 'test' ? false : 15 * 60,
    sessionLifetimeMs: Math.round(e.SESSION_LIFETIME_DAYS * 24 * 60 * 60 * 1000),
    sheetRender: {
      threads: e.SHEET_RENDER_THREADS ?? defaultSheetRenderLimits().threads,
      timeoutMs: e.SHEET_RENDER_TIMEOUT_MS,
      memoryMb: e.SHEET_RENDER_MEMORY_MB,
      queueLength: e.SHEET_RENDER_QUEUE,
      waitMs: e.SHEET_RENDER_WAIT_MS,
    },
  };
}
