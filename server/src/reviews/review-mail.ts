import { revisionPath, screenUrl } from '@holdfast/shared';
import type { MailMessage } from '../mail/mailer.js';

interface Flagged {
  sheetId: string;
  revisionId: string;
  documentNumber: string;
  title: string;
  label: string;
}

/** To the sheet's owner and the revision's checker when a criteria version makes it fail. */
export function underReviewMail(
  base: string,
  a: Flagged,
  to: string[],
  criteria: { name: string; version: number },
  failing: { label: string }[],
): MailMessage {
  const name = `${a.documentNumber} rev. ${a.label}`;
  return {
    to,
    subject: `[Holdfast] ${name} is under review: criteria ${criteria.name} v${criteria.version}`,
    text: [
      `Version ${criteria.version} of the criteria set "${criteria.name}" was published, and the approved ${name} "${a.title}" no longer passes under it:`,
      '',
      ...failing.map((f) => `- ${f.label}`),
      '',
      'The approval stays on record and /verify now says the sheet is under review. Approve a new revision, or, as a checker, record why the approved revision stands.',
      '',
      `Open it: ${screenUrl(base, revisionPath(a.sheetId, a.revisionId))}`,
    ].join('\n'),
  };
}
