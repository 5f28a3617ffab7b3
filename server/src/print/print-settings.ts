import { availableParallelism } from 'node:os';
import { z } from 'zod';

const schema = z.object({
  /** Render threads; 0 renders on the request thread (for comparisons only: it blocks the server). */
  PRINT_WORKERS: z.coerce.number().int().min(0).max(64).default(availableParallelism()),
  /** Renders one user may have running or waiting at once; the next answers 429. */
  PRINT_USER_LIMIT: z.coerce.number().int().min(1).default(4),
  /** Renders waiting for a thread, all users together; the next answers 503. */
  PRINT_QUEUE_LIMIT: z.coerce.number().int().min(1).default(64),
  /** Memory for rendered PDFs kept for repeat downloads, in MB; 0 keeps none. */
  PRINT_CACHE_MB: z.coerce.number().min(0).default(64),
});

export type PrintSettings = z.infer<typeof schema>;

export function loadPrintSettings(env: NodeJS.ProcessEnv = process.env): PrintSettings {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== ''));
  return schema.parse(cleaned);
}
