import path from 'node:path';
import { z } from 'zod';

const flag = z
  .enum(['0', '1', 'true', 'false'])
  .default('0')
  .transform((v) => v === '1' || v === 'true');

const schema = z.object({
  S3_ENDPOINT: z.url().optional(),
  S3_BUCKET: z.string().min(3).max(63).default('holdfast-attachments'),
  S3_ACCESS_KEY: z.string().min(1).default('S3RVER'),
  S3_SECRET_KEY: z.string().min(1).default('S3RVER'),
  S3_REGION: z.string().min(1).default('us-east-1'),
  /** Start a local S3-compatible fake (s3rver) inside the server process. */
  S3_EMBEDDED: flag,
  /** Port of the embedded fake on 127.0.0.1 (0 = any free port). */
  S3_PORT: z.coerce.number().int().min(0).max(65535).default(4569),
  /** Request timeout towards the storage, ms; a dead or hanging endpoint answers 503 within twice this. */
  S3_TIMEOUT_MS: z.coerce.number().int().positive().default(5000),
});

export type StorageSettings = z.infer<typeof schema> & { directory: string };

/** Object-storage settings from the environment (see docs: S3_*). */
export function loadStorageSettings(
  dataDir: string,
  env: NodeJS.ProcessEnv = process.env,
): StorageSettings {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== ''));
  const parsed = schema.parse(cleaned);
  return { ...parsed, directory: path.join(dataDir, 's3') };
}
