import type { CreateFieldRecordInput } from '@holdfast/shared';

/**
 * The server's field errors on a refused record, keyed as the record form keys its own errors
 * (`<settingKey>.asLeft`, `checks.<key>.value`, `checks.<key>.cycles`, `performedAt`), so each shows under its box.
 * A path the form has no box for keeps the server's path (the status panel lists it).
 */
export function refusedFieldErrors(
  payload: CreateFieldRecordInput,
  fields: readonly { path: string; message: string }[],
): Record<string, string> {
  const errors: Record<string, string> = {};
  for (const f of fields) {
    const [list, index, part] = f.path.split('.');
    const i = Number(index);
    let key = f.path;
    if (list === 'measurements' && part && payload.measurements[i]) {
      key = `${payload.measurements[i].settingKey}.${part}`;
    } else if (list === 'checks' && payload.checks[i]) {
      const check = `checks.${payload.checks[i].key}`;
      key = part === 'value' || part === 'cycles' ? `${check}.${part}` : check;
    }
    errors[key] ??= f.message;
  }
  return errors;
}
