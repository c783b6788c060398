import { type DestinationStream, type Logger, pino } from 'pino';
import type { Config } from './config';

/** Never written to a log: the session cookie, credentials and the cookies the server sets. */
const REDACT = ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'];

/** The server's log: pino at `config.logLevel` (silent in tests), secrets redacted, to stdout or `to`. */
export const createLogger = (config: Config, to?: DestinationStream): Logger =>
  pino({ level: config.env === 'test' ? 'silent' : config.logLevel, redact: REDACT }, to);
