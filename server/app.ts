import { existsSync } from 'node:fs';
import type { IncomingMessage, RequestListener, ServerResponse } from 'node:http';
import path from 'node:path';
import express, { type Request, type RequestHandler } from 'express';
import { ipKeyGenerator, MemoryStore, type RateLimitInfo, rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import swaggerUi from 'swagger-ui-express';
import { authHandler, createAuth } from './auth/auth';
import type { Config } from './config';
import type { Database } from './db/client';
import { limitedBody } from './http/body-limit';
import { apiNotFound, errorHandler, HttpError } from './http/errors';
import { originCheck, refuseBadBody } from './http/guards';
import { buildOpenApi } from './http/openapi';
import { mountRoutes } from './http/route';
import { statelessPath } from './http/stateless';
import { createLogger } from './logger';
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
  /** The log (default: pino at `config.logLevel`, silent in tests); tests pass one to read what is written. */
  logger?: Logger;
}

/** The largest JSON (or CSV) body accepted: 1 MiB. */
const JSON_LIMIT_BYTES = 1024 * 1024;
/** The largest body of the sign-in, sign-up, … routes (theirs are under 1 kB): 64 KiB. */
const AUTH_BODY_LIMIT_BYTES = 64 * 1024;
/** Express's `req.ip` (the client's address by the 'trust proxy' setting), read for bare requests too. */
const requestIp = Object.getOwnPropertyDescriptor(express.request, 'ip')?.get;

/**
 * Builds the request listener without listening, so tests can drive it with supertest: the Express app, with
 * the lean path for the calculations in front of it.
 */
export function createApp({
  database,
  config,
  mailer,
  storage,
  clientDir,
  clientMiddleware,
  logger = createLogger(config),
}: AppDeps) {
  const auth = createAuth(database, config, mailer);
  const services = createServices(database, config, mailer, auth, storage ?? unavailableStore());
  const app = express();
  app.disable('x-powered-by');
  // Forwarded client addresses are believed only from the proxies TRUST_PROXY names (default: none).
  app.set('trust proxy', config.trustProxy);
  const securityHeaders = helmet({
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
  });
  // pino-http logs each API request at info; below that level it would only build per-request child loggers
  // that never write, so the app logger itself serves as `req.log` (500s are still logged by the error handler).
  const requestLog: RequestHandler = logger.isLevelEnabled('info')
    ? pinoHttp({ logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } })
    : (req, _res, next) => {
        req.log = logger;
        next();
      };
  app.use(securityHeaders, requestLog);

  const trusted = (auth.options.trustedOrigins as string[]) ?? [];
  // The public calculations, by both paths (Express and the lean path's bare requests): per address — as
  // Express computes `req.ip` — and minute, counted in one store; over the limit 429 with Retry-After.
  const clientAddress = (req: IncomingMessage): string =>
    requestIp?.call({ app, headers: req.headers, socket: req.socket }) ?? req.socket.remoteAddress ?? '';
  const calcKey = (req: IncomingMessage) => ipKeyGenerator(clientAddress(req));
  const calcStore = new MemoryStore();
  /** Retry-After (seconds until the address's window ends) and the refusal to answer. */
  const calcRefusal = (res: ServerResponse, reset: Date | undefined) => {
    const seconds = reset ? Math.ceil((reset.getTime() - Date.now()) / 1000) : 60;
    res.setHeader('retry-after', String(Math.max(1, seconds)));
    return new HttpError(429, 'rate_limited', 'too many calculations from this address; wait a minute');
  };
  const calcLimiter = rateLimit({
    windowMs: 60_000,
    limit: config.calcRateLimit,
    standardHeaders: false,
    legacyHeaders: false,
    store: calcStore,
    keyGenerator: calcKey,
    handler: (req, res, next) =>
      next(calcRefusal(res, (req as Request & { rateLimit?: RateLimitInfo }).rateLimit?.resetTime)),
  });
  // The lean path counts in the same store itself: the middleware's own work per request (a chain of awaits
  // and its bookkeeping) cost four times the count (D-018).
  const admitCalc = async (req: IncomingMessage, res: ServerResponse) => {
    const { totalHits, resetTime } = await calcStore.increment(calcKey(req));
    return totalHits > config.calcRateLimit ? calcRefusal(res, resetTime) : undefined;
  };
  /** Per address and minute; over the limit: 429 with Retry-After (seconds until the window ends). */
  const limiter = (limit: number, message: string) =>
    rateLimit({
      windowMs: 60_000,
      limit,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: (_req, res) => res.status(429).json({ error: { code: 'rate_limited', message } }),
    });
  const authLimiter = limiter(config.authRateLimit, 'too many attempts; wait a minute and try again');
  app.use(
    [
      '/api/auth/sign-in/*splat',
      '/api/auth/sign-up/*splat',
      '/api/auth/request-password-reset',
      '/api/auth/reset-password',
      '/api/auth/change-password',
      '/api/auth/send-verification-email',
    ],
    authLimiter,
  );
  // Verification codes are public: guessing them is throttled per address.
  app.use(
    '/api/verify',
    limiter(
      config.verifyRateLimit,
      'too many verification checks from this address; wait a minute and try again',
    ),
  );
  // better-auth reads the body itself (mounted before express.json()): it gets it as text, at most 64 KiB.
  app.all('/api/auth/*splat', limitedBody(AUTH_BODY_LIMIT_BYTES), authHandler(auth));
  app.use('/api/v1/calc', calcLimiter);

  app.use(express.json({ limit: JSON_LIMIT_BYTES, strict: false }));
  // Code-table imports may send CSV as text/csv.
  app.use(express.text({ type: 'text/csv', limit: JSON_LIMIT_BYTES }));
  app.use('/api', refuseBadBody);
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

  // The calculations are answered before Express when the request is plain (see server/http/stateless.ts).
  const lean = statelessPath(apiRoutes, {
    base: '/api',
    services,
    trusted,
    limitBytes: JSON_LIMIT_BYTES,
    middleware: [securityHeaders, requestLog],
    admit: admitCalc,
    logger,
  });
  const listener: RequestListener = (req, res) => {
    if (!lean(req, res)) app(req, res);
  };
  return { app: listener, services, auth, logger };
}
