import { pino, type Logger, type LevelWithSilent } from 'pino';

/** The one pino instance of a server process; JSON lines on stdout. */
export function createLogger(level: LevelWithSilent): Logger {
  return pino({
    level,
    base: { app: 'holdfast' },
    redact: {
      paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'],
      censor: '[redacted]',
    },
  });
}
