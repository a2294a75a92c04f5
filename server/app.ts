import { existsSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import connectPgSimple from 'connect-pg-simple';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { config } from './config.ts';
import { pgPool } from './db/sequelize.ts';
import { csrfProtection } from './middleware/csrf.ts';
import { apiNotFound, errorHandler } from './middleware/error-handler.ts';
import { requestId } from './middleware/request-id.ts';
import { API_ROUTERS } from './api-routers.ts';
import { SESSION_COOKIE } from './modules/auth/session-cookie.ts';
import { devRouter } from './modules/dev/dev-router.ts';
import { healthRouter } from './modules/health/health-router.ts';

const DIST_DIR = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../dist');

export type AppHandle = { app: Express; close: () => Promise<void> };

/**
 * The Express app: middleware, the API routers under /api, the built client,
 * and the error handler last. No listen here: server/index.ts and the tests
 * decide where it listens.
 */
export function createApp(): AppHandle {
  const cfg = config();
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', cfg.http.trustProxy);
  app.set('query parser', 'extended');

  const PgStore = connectPgSimple(session);
  // Sessions live in PostgreSQL so any app server can serve any request and a
  // restart signs nobody out; expired rows are pruned every 15 minutes.
  const store = new PgStore({ pool: pgPool, tableName: 'sessions', pruneSessionInterval: 15 * 60 });

  app.use(requestId);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          // Toasts and charts set style attributes at run time.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:', ...(cfg.storage.endpoint ? [new URL(cfg.storage.endpoint).origin] : [])],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          frameAncestors: ["'none'"],
          formAction: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          upgradeInsecureRequests: cfg.production ? [] : null,
        },
      },
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: '256kb' }));
  api.use(
    session({
      name: SESSION_COOKIE,
      store,
      secret: cfg.session.secret,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: cfg.session.secureCookie,
        // Rolling: every answer pushes the cookie and the stored row's expiry
        // forward by the idle timeout, so only an unused session runs out.
        maxAge: cfg.session.idleMs,
        path: '/',
      },
    }),
  );
  // A session older than its absolute lifetime is ended even if it stayed active.
  api.use((req, _res, next) => {
    const started = req.session.signedInAt;
    if (started && Date.now() - started > cfg.session.absoluteMs) {
      // Regenerate rather than destroy: the stored row goes, and the request
      // carries on with a fresh signed-out session instead of none at all.
      req.session.regenerate((err) => next(err));
      return;
    }
    next();
  });
  api.use(healthRouter);
  api.use(csrfProtection);
  for (const router of API_ROUTERS) api.use(router);
  if (!cfg.production) api.use(devRouter);
  api.use(apiNotFound);
  app.use('/api', api);

  if (existsSync(DIST_DIR)) {
    // Hashed assets are immutable; index.html must always be revalidated.
    app.use(
      '/assets',
      express.static(path.join(DIST_DIR, 'assets'), { immutable: true, maxAge: '1y', fallthrough: false }),
    );
    app.use(express.static(DIST_DIR, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(path.join(DIST_DIR, 'index.html'));
    });
  }

  app.use(errorHandler);
  return { app, close: async () => store.close() };
}
