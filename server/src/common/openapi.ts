import { applyDecorators } from '@nestjs/common';
import { ApiBody } from '@nestjs/swagger';
import { z } from 'zod';

/**
 * Documents a request body in the OpenAPI document from the same zod schema the pipe validates
 * with, so the docs cannot drift from the validation.
 */
export function ApiBodySchema(schema: z.ZodType): MethodDecorator {
  const json = z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' }) as Record<
    string,
    unknown
  >;
  delete json.$schema;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  return applyDecorators(ApiBody({ schema: json as any }));
}
