import type { INestApplicationContext } from '@nestjs/common';
import { demoHistory } from './demo-history.repository.js';
import { demoSite } from './demo-plant.js';
import { seedDemoFieldRecords } from './seed-demo-field-records.js';
import { seedDemoPlant } from './seed-demo-plant.js';

/**
 * The demo scenario (invented plant, sheets, revisions, comments, field records), made through
 * the server's services in `app` (the demo seed context, or a test's app). Idempotent: does
 * nothing when the demo site exists, so `npm start` may run it on every start. The demo users
 * come first (db seed). Returns whether it made the demo.
 */
export async function seedDemoScenario(app: INestApplicationContext): Promise<boolean> {
  if (await demoHistory(app).siteExists(demoSite.code)) return false;
  const made = await seedDemoPlant(app);
  await seedDemoFieldRecords(app, made);
  return true;
}
