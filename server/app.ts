import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Pool } from 'pg';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { apiNotFound, errorMiddleware } from './common/error.middleware';
import { createLogger, safeError } from './common/logger';
import { requireOwnOrigin } from './common/own-origin.middleware';
import { ThrottledPgStore } from './common/throttled-session-store';
import { rejectBadUrlEncoding } from './common/url-encoding.middleware';
import type { ServerConfig } from './config/env';
import { AuditQueryService } from './modules/audit/audit-query.service';
import { auditRouter } from './modules/audit/audit.router';
import { writeAuditEvent, type AuditWriter } from './modules/audit/audit.service';
import { authRouter } from './modules/auth/auth.router';
import { AuthService } from './modules/auth/auth.service';
import { createPassport } from './modules/auth/passport';
import { endExpiredSessions } from './modules/auth/session-lifetime.middleware';
import { Reauthenticator } from './modules/auth/reauthenticate';
import { SignInThrottle } from './modules/auth/sign-in-throttle';
import { healthRouter } from './modules/health/health.router';
import { jobRouter } from './modules/jobs/job.router';
import { JobService } from './modules/jobs/job.service';
import { revisionRouter } from './modules/revisions/revision.router';
import { RevisionService } from './modules/revisions/revision.service';
import { sheetsRouter } from './modules/sheets/sheets.router';
import { SheetsService } from './modules/sheets/sheets.service';
import { PooledSheetRenderer, type SheetRenderer } from './modules/sheets/render/sheet-render-pool';
import { jobSpoolRouter, spoolRouter } from './modules/spools/spool.router';
import { SpoolService } from './modules/spools/spool.service';
import { userRouter } from './modules/users/user.router';
import { UserService } from './modules/users/user.service';

/** Name of the session cookie. */
export const SESSION_COOKIE = 'tackline.sid';
const SESSION_MAX_AGE_MS = 12 * 60 * 60 * 1000; // one long shift

/** What the app is built from. Tests pass their own DataSource and config; nothing listens here. */
export interface AppOptions {
  /** An initialised DataSource with migrations applied. */
  dataSource: DataSource;
  config: ServerConfig;
  /** Audit writer; tests inject a failing one to prove transactions roll back. */
  audit?: AuditWriter;
  /** Folder of the built client to serve (with SPA fallback); null or missing folder: API only. */
  clientDir?: string | null;
  /** Structured logger for requests and 5xx errors (secrets redacted); default: pino on stdout at `config.logLevel`. */
  logger?: Logger;
  /** Draws sheet PDFs; default: a worker-thread pool with `config.sheetRender`'s limits. */
  sheetRenderer?: SheetRenderer;
}

/** The app and what must be closed with it (render threads). */
export type TacklineApp = Express & { locals: { sheetRenderer: SheetRenderer } };

/** Builds the Express app: JSON API under /api, and the built client when there is one. */
export function createApp(options: AppOptions): TacklineApp {
  const { dataSource: ds, config } = options;
  const sheetRenderer = options.sheetRenderer ?? new PooledSheetRenderer(config.sheetRender);
  const audit = options.audit ?? writeAuditEvent;

  const authService = new AuthService(ds, audit, config.bcryptCost);
  const users = new UserService(ds, audit, config.bcryptCost);
  // One throttle for sign-in and re-authentication: both are password guesses at one account.
  const signInThrottle = new SignInThrottle(ds, config.signIn);
  const jobs = new JobService(ds, audit);
  const spools = new SpoolService(ds, audit, jobs);
  const revisions = new RevisionService(ds, audit, spools);
  const passport = createPassport(authService);

  const app = express() as TacklineApp;
  app.locals.sheetRenderer = sheetRenderer;
  app.disable('x-powered-by');
  // Behind a reverse proxy the client address and protocol come from X-Forwarded-*.
  app.set('trust proxy', config.trustProxy);
  const logger = options.logger ?? createLogger(config.logLevel);
  app.use(
    pinoHttp({
      logger,
      // Method, path (no query string), status and time only: no headers, cookies or bodies.
      serializers: {
        req: (req: { id: unknown; method: string; url: string; remoteAddress?: string }) => ({
          id: req.id,
          method: req.method,
          path: req.url.split('?')[0],
          remoteAddress: req.remoteAddress,
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
        err: safeError,
      },
      customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? 'error' : 'info'),
    }),
  );
  app.use(securityHeaders(config.publicUrl.startsWith('https:')));
  app.use(rejectBadUrlEncoding);

  const api = express.Router();
  // Before the body is read: a forged request is refused without parsing anything.
  api.use(requireOwnOrigin(config.allowedOrigins));
  api.use(express.json({ limit: config.jsonBodyLimit }));
  api.use('/health', healthRouter(ds));

  api.use(
    session({
      name: SESSION_COOKIE,
      secret: config.sessionSecret,
      store: new ThrottledPgStore({
        // The DataSource's own pg pool: one pool per process, closed with the DataSource.
        pool: (ds.driver as unknown as { master: Pool }).master,
        tableName: 'session',
        createTableIfMissing: false,
        pruneSessionInterval: config.sessionPruneSeconds,
      }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: config.secureCookies,
        maxAge: SESSION_MAX_AGE_MS,
        path: '/',
      },
    }),
  );
  api.use(endExpiredSessions(config.sessionLifetimeMs));
  api.use(passport.initialize());
  api.use(passport.session());
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  api.use(
    '/auth',
    authRouter({
      passport,
      auth: authService,
      users,
      throttle: signInThrottle,
      cookieName: SESSION_COOKIE,
    }),
  );
  api.use('/users', userRouter(users, new Reauthenticator(ds, signInThrottle)));
  api.use('/audit-events', auditRouter(new AuditQueryService(ds)));
  api.use('/jobs', jobRouter(jobs));
  api.use('/jobs/:jobId/spools', jobSpoolRouter(spools));
  api.use('/spools', spoolRouter(spools));
  api.use('/spools', revisionRouter(revisions));
  api.use(sheetsRouter(new SheetsService(ds, jobs, spools, revisions, config.publicUrl, sheetRenderer)));
  api.use(apiNotFound);

  app.use('/api', api);

  const clientDir = options.clientDir;
  if (clientDir && existsSync(path.join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // SPA fallback: every non-API GET gets index.html; React Router takes it from there.
    app.get('/{*splat}', (req, res, next) => {
      if (req.path === '/api' || req.path.startsWith('/api/')) return next();
      // A missing file (a stale hashed asset, a typo) is a 404, never the page: a browser
      // would otherwise run or parse HTML as a script or style.
      if (req.path.startsWith('/assets/') || path.extname(req.path) !== '') {
        res.status(404).type('text/plain').send('Not found');
        return;
      }
      res.set('Cache-Control', 'no-cache');
      res.sendFile(path.join(clientDir, 'index.html'));
    });
  }

  app.use(errorMiddleware(logger));
  return app;
}

/**
 * helmet with a Content-Security-Policy the built client needs and no more: scripts and styles
 * from our origin only (no inline script), workers also from `blob:` (three.js loaders start
 * them from object URLs), `data:`/`blob:` for images and fetches of embedded model buffers;
 * no framing; HSTS and upgrade-insecure-requests only behind an https PUBLIC_URL, since a
 * shop reaching the server over plain http on its LAN would otherwise be locked out.
 */
function securityHeaders(https: boolean) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'"],
        fontSrc: ["'self'", 'data:'],
        workerSrc: ["'self'", 'blob:'],
        imgSrc: ["'self'", 'data:', 'blob:'],
        connectSrc: ["'self'", 'data:', 'blob:'],
        frameAncestors: ["'none'"],
        upgradeInsecureRequests: https ? [] : null,
      },
    },
    crossOriginOpenerPolicy: { policy: 'same-origin' },
    strictTransportSecurity: https ? { maxAge: 180 * 24 * 60 * 60, includeSubDomains: false } : false,
    xFrameOptions: { action: 'deny' },
    referrerPolicy: { policy: 'same-origin' },
  });
}
