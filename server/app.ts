import { existsSync } from 'node:fs';
import path from 'node:path';
import { toNodeHandler } from 'better-auth/node';
import express, { type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import { pino } from 'pino';
import { pinoHttp } from 'pino-http';
import swaggerUi from 'swagger-ui-express';
import { createAuth } from './auth/auth';
import type { Config } from './config';
import type { Database } from './db/client';
import { apiNotFound, errorHandler, HttpError } from './http/errors';
import { buildOpenApi } from './http/openapi';
import { mountRoutes } from './http/route';
import type { Mailer } from './mail/mailer';
import { apiRoutes } from './routes';
import { createServices } from './services';
import { type ObjectStore, unavailableStore } from './storage/object-store';

export interface AppDeps {
  database: Database;
  config: Config;
  mailer: Mailer;
  /** Where uploaded files are stored (S3 API); omitted = uploads answer 503. */
  storage?: ObjectStore;
  /** Serve the built client from this folder (production); omitted for API-only tests and dev mode. */
  clientDir?: string;
  /** Dev mode: Vite's middleware serving the client with hot reload. */
  clientMiddleware?: RequestHandler[];
}

/** Whether any string (value or key) holds a NUL character, which PostgreSQL text cannot store. */
function hasNul(value: unknown): boolean {
  if (typeof value === 'string') return value.includes('\u0000');
  if (Array.isArray(value)) return value.some(hasNul);
  if (value && typeof value === 'object')
    for (const k in value)
      if (k.includes('\u0000') || hasNul((value as Record<string, unknown>)[k])) return true;
  return false;
}

/** The path of the first string (value or key) holding a NUL character. */
function nulPath(value: unknown, path: string[] = []): string | null {
  if (typeof value === 'string') return value.includes('\u0000') ? path.join('.') || '(body)' : null;
  if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) {
      if (k.includes('\u0000')) return [...path, '(key)'].join('.');
      const found = nulPath(v, [...path, k]);
      if (found) return found;
    }
  return null;
}

const refuseNul: RequestHandler = (req, _res, next) => {
  // The common case (no NUL anywhere) is one walk without allocations; the path is found only for a refusal.
  const field = hasNul(req.body) ? nulPath(req.body) : null;
  next(
    field
      ? new HttpError(400, 'validation_failed', 'the request is not valid', {
          [field]: 'text must not contain NUL characters',
        })
      : undefined,
  );
};

/** Refuses cookie-authenticated writes whose Origin is not ours (CSRF); requests without Origin are not from a browser form. */
function originCheck(trusted: string[]): RequestHandler {
  return (req, _res, next) => {
    if (req.method === 'GET' || req.method === 'HEAD' || req.method === 'OPTIONS') return next();
    const origin = req.get('origin');
    if (origin && !trusted.includes(origin))
      return next(new HttpError(403, 'bad_origin', 'cross-site request refused'));
    next();
  };
}

/** Builds the Express app without listening, so tests can drive it with supertest. */
export function createApp({ database, config, mailer, storage, clientDir, clientMiddleware }: AppDeps) {
  const auth = createAuth(database.db, config, mailer);
  const services = createServices(database, config, mailer, auth, storage ?? unavailableStore());
  const logger = pino({ level: config.env === 'test' ? 'silent' : config.logLevel });
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      // Vite's dev middleware injects inline scripts for hot reload; the CSP applies to the built client.
      contentSecurityPolicy: clientMiddleware
        ? false
        : {
            directives: {
              defaultSrc: ["'self'"],
              scriptSrc: ["'self'"],
              styleSrc: ["'self'", "'unsafe-inline'"],
              imgSrc: ["'self'", 'data:', 'blob:'],
              fontSrc: ["'self'", 'data:'],
              connectSrc: ["'self'"],
              objectSrc: ["'none'"],
              // The compliance sheet preview: a PDF blob shown in a frame of the run's page.
              frameSrc: ["'self'", 'blob:'],
              frameAncestors: ["'none'"],
              upgradeInsecureRequests: null,
            },
          },
    }),
  );
  // pino-http logs each API request at info; below that level it would only build per-request child loggers
  // that never write, so the app logger itself serves as `req.log` (500s are still logged by the error handler).
  if (logger.isLevelEnabled('info'))
    app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } }));
  else
    app.use((req, _res, next) => {
      req.log = logger;
      next();
    });

  const trusted = (auth.options.trustedOrigins as string[]) ?? [];
  const authLimiter = rateLimit({
    windowMs: 60_000,
    limit: config.authRateLimit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res) =>
      res
        .status(429)
        .json({ error: { code: 'rate_limited', message: 'too many attempts; wait a minute and try again' } }),
  });
  app.use(
    [
      '/api/auth/sign-in/*splat',
      '/api/auth/sign-up/*splat',
      '/api/auth/request-password-reset',
      '/api/auth/reset-password',
    ],
    authLimiter,
  );
  // better-auth must see the raw body: mount it before express.json().
  app.all('/api/auth/*splat', toNodeHandler(auth));

  app.use(express.json({ limit: '1mb', strict: false }));
  // Code-table imports may send CSV as text/csv.
  app.use(express.text({ type: 'text/csv', limit: '1mb' }));
  app.use('/api', refuseNul);
  app.use('/api', originCheck(trusted));

  // The API routes first (the reference pages share no path with them), then the reference.
  mountRoutes(app, apiRoutes, services, '/api');
  const openapi = buildOpenApi(apiRoutes);
  app.get('/api/openapi.json', (_req, res) => {
    res.json(openapi);
  });
  app.use(
    '/api/docs',
    swaggerUi.serve,
    swaggerUi.setup(openapi, { customSiteTitle: 'Skinwright API reference' }),
  );
  app.use('/api', apiNotFound);

  if (clientDir && existsSync(path.join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get('/{*splat}', (_req, res) => res.sendFile(path.join(clientDir, 'index.html')));
  }
  for (const m of clientMiddleware ?? []) app.use(m);
  app.use(errorHandler);
  return { app, services, auth, logger };
}
