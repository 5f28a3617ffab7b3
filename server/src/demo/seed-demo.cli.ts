#!/usr/bin/env node
// node server/dist/demo/seed-demo.cli.js   (DATABASE_URL: the owner role, as migrations use)
import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { demoRequested } from '@holdfast/db';
import { loadSettings } from '../config/env.js';
import { DemoSeedModule } from './demo-seed.module.js';
import { seedDemoScenario } from './seed-demo.js';

async function main(): Promise<void> {
  if (!demoRequested()) {
    console.log('demo not requested (HOLDFAST_DEMO): no demo scenario');
    return;
  }
  // This process sends no mail: the demo drops the mail its past steps queue (see
  // DemoHistoryRepository), and its mail worker must not pick any up before that.
  process.env.OUTBOX_POLL_SECONDS = '3600';
  const settings = loadSettings({ ...process.env, PORT: '0', LOG_LEVEL: 'error' });
  const app = await NestFactory.createApplicationContext(DemoSeedModule.forRoot(settings), {
    logger: ['error', 'fatal'],
  });
  try {
    const made = await seedDemoScenario(app);
    console.log(made ? 'demo scenario seeded' : 'demo scenario already there');
  } finally {
    await app.close();
  }
}

main().catch((error: unknown) => {
  console.error(
    `demo seed: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`,
  );
  process.exitCode = 1;
});
