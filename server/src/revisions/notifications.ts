import { revisionPath, screenUrl } from '@holdfast/shared';
import type { MailMessage } from '../mail/mailer.js';

interface About {
  sheetId: string;
  revisionId: string;
  documentNumber: string;
  title: string;
  label: string;
}

const link = (base: string, a: About) => screenUrl(base, revisionPath(a.sheetId, a.revisionId));
const name = (a: About) => `${a.documentNumber} rev. ${a.label}`;

export function submittedMail(
  base: string,
  a: About,
  to: string[],
  author: string,
  failing: number,
): MailMessage {
  return {
    to,
    subject: `[Holdfast] ${name(a)} is waiting for your check`,
    text: [
      `${author} submitted ${name(a)} "${a.title}" for check.`,
      failing > 0
        ? `${failing} check(s) fail; the author's justification is on the revision.`
        : 'All checks pass.',
      '',
      `Open it: ${link(base, a)}`,
    ].join('\n'),
  };
}

export function approvedMail(base: string, a: About, to: string[], checker: string): MailMessage {
  return {
    to,
    subject: `[Holdfast] ${name(a)} approved`,
    text: [`${checker} approved ${name(a)} "${a.title}".`, '', `Open it: ${link(base, a)}`].join(
      '\n',
    ),
  };
}

export function returnedMail(
  base: string,
  a: About,
  to: string[],
  checker: string,
  comment: string,
): MailMessage {
  return {
    to,
    subject: `[Holdfast] ${name(a)} returned with comments`,
    text: [
      `${checker} returned ${name(a)} "${a.title}":`,
      '',
      comment,
      '',
      `Open it: ${link(base, a)}`,
    ].join('\n'),
  };
}
