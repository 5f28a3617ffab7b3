import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as english from '@zxcvbn-ts/language-en';

/** Score 0–4 from zxcvbn; 3 means "safely unguessable" against an offline-throttled attack. */
export const MIN_PASSWORD_SCORE = 3;
export const MIN_PASSWORD_LENGTH = 12;

export interface PasswordVerdict {
  ok: boolean;
  /** Why the password is refused, in words for the person typing it. */
  message?: string;
}

let checker: ZxcvbnFactory | undefined;
function zxcvbn(): ZxcvbnFactory {
  // Building the dictionaries takes a moment; do it once, on first use.
  checker ??= new ZxcvbnFactory({
    dictionary: { ...common.dictionary, ...english.dictionary },
    graphs: common.adjacencyGraphs,
    translations: english.translations,
  });
  return checker;
}

/**
 * The password rule for every new password (account creation, change, reset, first admin):
 * at least 12 characters and not guessable — common passwords, keyboard walks, repeats,
 * dates, dictionary words and the person's own name or e-mail are refused, however long.
 */
export function checkPasswordStrength(password: string, personal: string[] = []): PasswordVerdict {
  if (password.length < MIN_PASSWORD_LENGTH) {
    return { ok: false, message: `at least ${MIN_PASSWORD_LENGTH} characters` };
  }
  const inputs = ['holdfast', 'brake', ...personal.flatMap((p) => [p, ...p.split(/[\s@.]+/)])];
  const result = zxcvbn().check(password.slice(0, 100), inputs.filter(Boolean));
  if (result.score >= MIN_PASSWORD_SCORE) return { ok: true };
  const hint = result.feedback.warning ?? result.feedback.suggestions[0];
  return {
    ok: false,
    message: `too easy to guess${hint ? ` (${hint.replace(/\.$/, '').toLowerCase()})` : ''}; use a few unrelated words or a password manager`,
  };
}
