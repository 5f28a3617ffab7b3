import 'reflect-metadata';
import { createApp } from './app.js';
import { isConnectionError } from '@holdfast/db';
import { ConfigError, loadSettings } from './config/env.js';

async function main(): Promise<void> {
  let settings;
  try {
    settings = loadSettings();
  } catch (error) {
    if (error instanceof ConfigError) {
      console.error(`Holdfast server cannot start: ${error.message}`);
      process.exit(2);
    }
    throw error;
  }
  const { app, logger, uiServed } = await createApp(settings);
  // pg-boss 10 marks a finished job complete or failed without awaiting it; with PostgreSQL gone
  // that promise rejects unhandled and Node would end the process. A lost connection is an
  // outage the server rides out (the job is tried again once it expires, and the outbox row
  // stops a second mail); any other unhandled rejection still ends the process.
  process.on('unhandledRejection', (reason) => {
    if (!isConnectionError(reason)) throw reason;
    logger.warn(`database connection lost under a background task: ${String(reason)}`);
  });
  app.enableShutdownHooks(['SIGINT', 'SIGTERM']);
  if (!uiServed) logger.warn(`no built UI at ${settings.UI_DIST}; serving the API only`);
  try {
    await app.listen(settings.PORT, settings.HOST);
  } catch (error) {
    const code = (error as { code?: string }).code;
    const reason =
      code === 'EADDRINUSE'
        ? `port ${settings.PORT} on ${settings.HOST} is already in use (set PORT to use another)`
        : error instanceof Error
          ? error.message
          : String(error);
    logger.fatal(`cannot listen: ${reason}`);
    console.error(`Holdfast server cannot start: ${reason}`);
    await app.close().catch(() => undefined);
    process.exit(1);
  }
  logger.info(`Holdfast listening on http://${settings.HOST}:${settings.PORT} (API under /api)`);
}

void main();
