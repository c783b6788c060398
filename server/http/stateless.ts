import type { IncomingMessage, ServerResponse } from 'node:http';
import { parse as parseQuery } from 'node:querystring';
import type { Request, RequestHandler, Response } from 'express';
import type { Logger } from 'pino';
import type { Services } from '../services';
import { invalidJson, logFailure, toApiError } from './errors';
import { bodyRefusal, originRefusal } from './guards';
import { type AnyRoute, answer, sendResult } from './route';

/** A request listener that answers a request and returns true, or leaves it untouched and returns false. */
export type LeanPath = (req: IncomingMessage, res: ServerResponse) => boolean;

const JSON_TYPES = new Set(['application/json', 'application/json; charset=utf-8']);
const NO_REFUSAL = Promise.resolve(undefined);

/**
 * The lean path for `stateless` routes (the calculations). Express's own work per request — swapping the
 * request and response prototypes, walking its middleware and router stacks, body-parser — costs more than a
 * whole calculation, so these routes are answered here first, in the same order and with the same parts as
 * the Express stack: the middleware that writes headers and logs (`middleware`: helmet, the request logger),
 * the rate limit of the calculations (`admit`), JSON parsing, the body refusal (nesting depth, NUL), the origin
 * check, validation, the handler and the error shapes. Whatever is thrown while answering becomes an error
 * answer: nothing a request sends can throw out of its event handlers and end the process.
 * Anything out of the ordinary — another spelling of the path, a content type other than plain JSON in UTF-8,
 * a compressed or chunked body, a body over the limit — is left untouched for Express, which serves the same
 * route the ordinary way (and answers 413, 415, … as it always does).
 */
export function statelessPath(
  routes: AnyRoute[],
  opts: {
    base: string;
    services: Services;
    trusted: string[];
    limitBytes: number;
    middleware: RequestHandler[];
    /** Counts the request against the calculations' rate limit: a refusal, or undefined to go on. */
    admit?: (req: IncomingMessage, res: ServerResponse) => Promise<unknown>;
    logger: Logger;
  },
): LeanPath {
  const byPath = new Map(
    routes.filter((r) => r.stateless).map((r) => [`${r.method.toUpperCase()} ${opts.base}${r.path}`, r]),
  );
  return (req, res) => {
    const url = req.url ?? '';
    const mark = url.indexOf('?');
    const route = byPath.get(`${req.method} ${mark < 0 ? url : url.slice(0, mark)}`);
    const { headers } = req;
    if (
      !route ||
      !JSON_TYPES.has(headers['content-type'] ?? '') ||
      headers['content-encoding'] !== undefined ||
      headers['transfer-encoding'] !== undefined ||
      !(Number(headers['content-length']) <= opts.limitBytes)
    )
      return false;

    const fail = (err: unknown) => {
      try {
        const { status, body } = toApiError(err);
        if (status >= 500) logFailure(opts.logger, err);
        if (!res.headersSent) sendResult(req, res, status, body);
      } catch (cause) {
        // Not even the error could be answered: drop this connection, never the process.
        opts.logger.error({ err: cause }, 'could not answer an error');
        res.destroy();
      }
    };
    let refused: unknown;
    for (const m of opts.middleware) {
      // helmet and the request logger call `next` at once (their work is writing headers and hooks).
      m(req as Request, res as Response, (err?: unknown) => {
        refused ??= err;
      });
    }
    if (refused) {
      fail(refused);
      return true;
    }
    // The rate limit decides while the body arrives; a failure of its own is answered as a refusal (and
    // never left as a rejected promise before the body's end).
    const admitted = opts.admit ? opts.admit(req, res).catch((err: unknown) => err) : NO_REFUSAL;
    const serve = (text: string) => {
      let body: unknown;
      try {
        // As body-parser: an empty body is `{}`, a byte-order mark is dropped.
        body = text.length === 0 ? {} : JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
      } catch {
        return fail(invalidJson());
      }
      const refusal = bodyRefusal(body, text) ?? originRefusal(req, opts.trusted);
      if (refusal) return fail(refusal);
      const query = mark < 0 ? {} : parseQuery(url.slice(mark + 1));
      const ctx = { req: req as Request, res: res as Response, params: {}, services: opts.services };
      return answer(route, { ...ctx, user: null, project: null, criteria: null }, { query, body });
    };
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      // Everything from here on is in the promise chain, so whatever throws is answered by `fail`.
      admitted
        .then((refused) => (refused ? fail(refused) : serve(Buffer.concat(chunks).toString('utf8'))))
        .catch(fail);
    });
    return true;
  };
}
