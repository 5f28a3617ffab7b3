import type { LoggerService, LogLevel } from '@nestjs/common';
import type { Logger } from 'pino';

/**
 * Nest's LoggerService over pino (nestjs-pino does not support Nest 12). Nest passes the context
 * (class name) as the last string argument; an error's stack comes before it.
 */
export class PinoLoggerService implements LoggerService {
  constructor(private readonly logger: Logger) {}

  log(message: unknown, ...rest: unknown[]): void {
    this.write('info', message, rest);
  }
  error(message: unknown, ...rest: unknown[]): void {
    this.write('error', message, rest);
  }
  warn(message: unknown, ...rest: unknown[]): void {
    this.write('warn', message, rest);
  }
  debug(message: unknown, ...rest: unknown[]): void {
    this.write('debug', message, rest);
  }
  verbose(message: unknown, ...rest: unknown[]): void {
    this.write('trace', message, rest);
  }
  fatal(message: unknown, ...rest: unknown[]): void {
    this.write('fatal', message, rest);
  }
  setLogLevels(levels: LogLevel[]): void {
    if (levels.length === 0) this.logger.level = 'silent';
  }

  private write(
    level: 'info' | 'error' | 'warn' | 'debug' | 'trace' | 'fatal',
    message: unknown,
    rest: unknown[],
  ) {
    const args = [...rest];
    const context = typeof args[args.length - 1] === 'string' ? (args.pop() as string) : undefined;
    const stack =
      typeof args[0] === 'string' && args[0].includes('\n    at ')
        ? (args.shift() as string)
        : undefined;
    const fields: Record<string, unknown> = {};
    if (context) fields.context = context;
    if (stack) fields.stack = stack;
    if (message instanceof Error) {
      this.logger[level]({ ...fields, err: message }, message.message);
    } else if (typeof message === 'object' && message !== null) {
      this.logger[level]({ ...fields, ...(message as object) });
    } else {
      this.logger[level](fields, String(message));
    }
  }
}
