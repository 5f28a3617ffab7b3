import { z } from 'zod';
import type { core } from 'zod';

/**
 * Plain words for zod's own messages, for every schema of Holdfast (server and UI share one zod):
 * the API answers a bad field with its reason, and "Invalid input: expected string, received
 * undefined" is a reason for a programmer, not for whoever filled the form. A message a schema
 * gives itself wins over these.
 */
type Issue = Parameters<core.$ZodErrorMap>[0];

const TYPE_WORDS: Record<string, string> = {
  string: 'text',
  number: 'a number',
  int: 'a whole number',
  boolean: 'true or false',
  object: 'an object',
  array: 'a list',
  date: 'a date',
};

const list = (values: readonly unknown[]) => {
  const shown = values.slice(0, 8).map((v) => (typeof v === 'string' ? `"${v}"` : String(v)));
  return values.length > 8 ? `${shown.join(', ')} …` : shown.join(', ');
};

export function plainMessage(issue: Issue): string | undefined {
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined) return 'is required';
      return `must be ${TYPE_WORDS[issue.expected] ?? issue.expected}`;
    case 'too_small': {
      const n = Number(issue.minimum);
      if (issue.origin === 'string')
        return n <= 1 ? 'must not be empty' : `at least ${n} characters`;
      if (issue.origin === 'array') return `at least ${n} item${n === 1 ? '' : 's'}`;
      if (issue.origin === 'number' || issue.origin === 'bigint')
        return issue.inclusive ? `must be at least ${n}` : `must be greater than ${n}`;
      return undefined;
    }
    case 'too_big': {
      const n = Number(issue.maximum);
      if (issue.origin === 'string') return `at most ${n} characters`;
      if (issue.origin === 'array') return `at most ${n} item${n === 1 ? '' : 's'}`;
      if (issue.origin === 'number' || issue.origin === 'bigint')
        return issue.inclusive ? `must be at most ${n}` : `must be less than ${n}`;
      return undefined;
    }
    case 'invalid_value':
      return `must be one of ${list(issue.values)}`;
    case 'invalid_format':
      if (issue.format === 'uuid') return 'must be a UUID';
      if (issue.format === 'email') return 'not a valid e-mail address';
      if (issue.format === 'datetime' || issue.format === 'date') return 'must be a date';
      return undefined;
    case 'unrecognized_keys':
      return `${list(issue.keys)} ${issue.keys.length === 1 ? 'is not a known field' : 'are not known fields'}`;
    default:
      return undefined;
  }
}

z.config({ customError: plainMessage });
