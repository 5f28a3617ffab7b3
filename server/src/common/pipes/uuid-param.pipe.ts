import { Injectable, type PipeTransform } from '@nestjs/common';
import { badRequest } from '../errors/api-exception.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** `@Param('id', UuidParamPipe) id: string` — a malformed id is a 400 naming the parameter. */
@Injectable()
export class UuidParamPipe implements PipeTransform<string, string> {
  transform(value: string, metadata: { data?: string }): string {
    if (typeof value === 'string' && UUID.test(value)) return value.toLowerCase();
    const name = metadata.data ?? 'id';
    throw badRequest('Some fields are not valid.', [{ path: name, message: 'must be a UUID' }]);
  }
}
