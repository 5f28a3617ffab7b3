import { z } from 'zod';

const flag = z
  .enum(['0', '1', 'true', 'false'])
  .default('0')
  .transform((v) => v === '1' || v === 'true');

const schema = z.object({
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(1025),
  MAIL_FROM: z.string().min(3).default('Holdfast <holdfast@holdfast.test>'),
  /** Run maildev (SMTP fake + web inbox on loopback) as a child process of the server. */
  MAIL_EMBEDDED: flag,
  MAILDEV_WEB_PORT: z.coerce.number().int().min(1).max(65535).default(1080),
  /** First retry delay in seconds; pg-boss doubles it on each further attempt (with jitter). */
  MAIL_RETRY_DELAY_SECONDS: z.coerce.number().int().min(1).default(10),
  MAIL_RETRY_LIMIT: z.coerce.number().int().min(0).default(12),
  /** How often the mail worker looks for jobs. */
  OUTBOX_POLL_SECONDS: z.coerce.number().min(0.5).default(2),
});

export type MailSettings = z.infer<typeof schema>;

export function loadMailSettings(env: NodeJS.ProcessEnv = process.env): MailSettings {
  const cleaned = Object.fromEntries(Object.entries(env).filter(([, v]) => v !== ''));
  return schema.parse(cleaned);
}
