import type { RequestHandler } from 'express';
import { HttpError } from './errors';

const tooLarge = (maxBytes: number) =>
  new HttpError(413, 'too_large', `the body is too large (at most ${maxBytes / 1024} KiB here)`);

/**
 * Reads a body of at most `maxBytes` into `req.body` as UTF-8 text, for a handler that reads the body itself
 * (better-auth takes an already-read body from `req.body`). A larger one is refused with 413 before anything
 * is kept: by its Content-Length before reading, or — sent in chunks — as soon as the count passes the limit.
 * The rest is never read: the stream is paused and the connection closes after the answer (body-parser would
 * read the whole body to its end before answering).
 */
export const limitedBody =
  (maxBytes: number): RequestHandler =>
  (req, res, next) => {
    const length = req.headers['content-length'];
    if (length === undefined ? req.headers['transfer-encoding'] === undefined : Number(length) === 0)
      return next();
    const refuse = () => {
      req.pause();
      res.setHeader('connection', 'close');
      next(tooLarge(maxBytes));
    };
    if (!(Number(length ?? 0) <= maxBytes)) return refuse();
    const chunks: Buffer[] = [];
    let size = 0;
    const onData = (chunk: Buffer) => {
      size += chunk.length;
      if (size <= maxBytes) chunks.push(chunk);
      else {
        stop();
        refuse();
      }
    };
    const onEnd = () => {
      stop();
      req.body = Buffer.concat(chunks).toString('utf8');
      next();
    };
    const onError = (err: Error) => {
      stop();
      next(err);
    };
    const stop = () => {
      req.off('data', onData).off('end', onEnd).off('error', onError);
    };
    req.on('data', onData).on('end', onEnd).on('error', onError);
  };
