import { fieldRecordPath, type FieldRecordRoute } from '@holdfast/shared';

/**
 * A field-records path for the API client, which adds the /api prefix itself (env.apiBase);
 * the shared route table writes the paths as the server mounts them, prefix included.
 */
export function fieldApi(route: FieldRecordRoute, params: Record<string, string> = {}): string {
  return fieldRecordPath(route, params).replace(/^\/api(?=\/)/, '');
}
