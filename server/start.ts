import { createServer, type RequestListener } from 'node:http';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import type { RequestHandler } from 'express';
import type { Logger } from 'pino';
import pretty from 'pino-pretty';
import type { ViteDevServer } from 'vite';
import { createApp } from './app';
import type { Config } from './config';
import { openDatabase } from './db/client';
import { demoAccounts, seedDemo } from './db/seed';
import { createLogger } from './logger';
import { startMailCapture } from './mail/capture';
import { createSmtpMailer } from './mail/mailer';
import { startLocalS3 } from './storage/local-s3';
import { createS3Store, storageTarget } from './storage/object-store';

const clientDir = fileURLToPath(new URL('../dist/client', import.meta.url));

/** Readable log lines for a person at a terminal; JSON lines (one object each) for a log collector. */
function serverLogger(config: Config): Logger | undefined {
  if (config.env === 'test' || !process.stdout.isTTY) return undefined;
  return createLogger(
    config,
    pretty({
      colorize: true,
      translateTime: 'SYS:HH:MM:ss',
      sync: true,
      // A request is one line (method, path, status, time); anything else keeps its fields (an error's stack).
      ignore: 'pid,hostname,req,res,responseTime',
      messageFormat: (log, messageKey) => {
        const { req, res, responseTime } = log as {
          req?: { method: string; url: string };
          res?: { statusCode: number };
          responseTime?: number;
        };
        return req && res
          ? `${req.method} ${req.url} → ${res.statusCode} (${responseTime} ms)`
          : String(log[messageKey]);
      },
    }),
  );
}

/**
 * Opens the database (migrating it), starts the local mail capture when no SMTP_URL is set and the local
 * fake S3 server when no S3_BUCKET is set, seeds the demo on first start, and listens. Returns a stopper
 * that closes everything in order.
 */
export async function startServer(config: Config, opts: { dev?: boolean } = {}) {
  const database = await openDatabase(config);
  const capture = config.smtpUrl ? null : await startMailCapture(database.db);
  const mailer = createSmtpMailer(config.smtpUrl ?? capture!.url, config.mailFrom);
  const real = storageTarget(config.storage);
  // An in-memory database gets a throw-away file store too; otherwise S3_LOCAL_DIR or data/local/s3.
  const localS3 = real
    ? null
    : await startLocalS3(
        config.storage.localDir ?? (config.pgliteDir.startsWith('memory://') ? undefined : 'data/local/s3'),
      );
  const storage = createS3Store(real ?? localS3!.target);

  // Listen first (a random port is known only then); answer 503 until the app is ready.
  let app: RequestListener | undefined;
  const httpServer = createServer((req, res) => {
    if (app) return app(req, res);
    res.writeHead(503, { 'content-type': 'application/json', 'retry-after': '1' });
    res.end(
      JSON.stringify({
        error: { code: 'starting', message: 'the server is starting; try again in a moment' },
      }),
    );
  });
  await new Promise<void>((resolve) => httpServer.listen(config.port, config.host, resolve));
  const { port } = httpServer.address() as AddressInfo;
  // A random port (tests) is known only now; links and the origin check must use it.
  const effective = config.port === 0 ? { ...config, baseUrl: `http://127.0.0.1:${port}` } : config;

  let vite: ViteDevServer | undefined;
  let clientMiddleware: RequestHandler[] | undefined;
  if (opts.dev) {
    const { createServer: createVite } = await import('vite');
    vite = await createVite({
      server: { middlewareMode: true, hmr: { server: httpServer } },
      appType: 'spa',
    });
    clientMiddleware = [vite.middlewares];
  }
  const created = createApp({
    database,
    config: effective,
    mailer,
    storage,
    clientDir: opts.dev ? undefined : clientDir,
    clientMiddleware,
    logger: serverLogger(effective),
  });
  const seeded = effective.seedDemo ? await seedDemo(database.db, created.auth) : false;
  app = created.app;
  const { logger } = created;

  async function stop() {
    httpServer.closeAllConnections();
    await new Promise<void>((resolve) => httpServer.close(() => resolve()));
    await vite?.close();
    await capture?.close();
    await localS3?.close();
    await database.close();
  }
  return {
    port,
    baseUrl: effective.baseUrl,
    stop,
    logger,
    seeded,
    databaseKind: database.kind,
    accounts: demoAccounts,
  };
}
