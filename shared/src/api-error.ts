import { z } from 'zod';

/** The closed set of error codes every API failure carries. */
export const errorCodes = [
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'too_many_requests',
  'payload_too_large',
  'unsupported_media_type',
  'service_unavailable',
  'internal_error',
] as const;
export type ErrorCode = (typeof errorCodes)[number];

export const fieldIssueSchema = z.object({
  path: z.string(),
  message: z.string(),
});
export type FieldIssue = z.infer<typeof fieldIssueSchema>;

/** `{ error: { code, message, fields? } }` — the one shape of every failed response. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.enum(errorCodes),
    message: z.string(),
    fields: z.array(fieldIssueSchema).optional(),
    /** Extra machine-readable detail, e.g. the current row version on a 409. */
    details: z.record(z.string(), z.unknown()).optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/** Turn zod issues into field paths and reasons ('inputs.springForce', 'must be positive'). */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  const join = (path: PropertyKey[]) => path.map(String).join('.') || '(body)';
  return error.issues.flatMap((issue) =>
    // An unknown field is reported at its own path, so a form can point at it.
    issue.code === 'unrecognized_keys'
      ? issue.keys.map((key) => ({
          path: join([...issue.path, key]),
          message: 'is not a known field',
        }))
      : [{ path: join(issue.path), message: issue.message }],
  );
}
