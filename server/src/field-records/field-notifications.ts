import { positionFieldPath, screenUrl } from '@holdfast/shared';
import type { MailMessage } from '../mail/mailer.js';

export interface RecordAbout {
  recordId: string;
  positionId: string;
  positionTag: string;
  documentNumber: string;
  revisionLabel: string;
}

/** To the sheet's owner and the plant engineers: a value was left outside its tolerance. */
export function outOfToleranceMail(
  base: string,
  a: RecordAbout,
  to: string[],
  signer: string,
  lines: string[],
): MailMessage {
  return {
    to,
    subject: `[Holdfast] ${a.positionTag}: value left out of tolerance`,
    text: [
      `${signer} signed a field record on ${a.positionTag} (set to ${a.documentNumber} rev. ${a.revisionLabel}) with values left outside their tolerance:`,
      '',
      ...lines.map((l) => `- ${l}`),
      '',
      'The record waits for a plant engineer to countersign it.',
      `Open the position's records: ${screenUrl(base, positionFieldPath(a.positionId))}`,
    ].join('\n'),
  };
}

/** Ahead of a due inspection. */
export function inspectionDueMail(
  base: string,
  a: { positionId: string; positionTag: string; dueOn: string },
  to: string[],
): MailMessage {
  return {
    to,
    subject: `[Holdfast] ${a.positionTag}: inspection due ${a.dueOn}`,
    text: [
      `The next inspection of brake position ${a.positionTag} is due on ${a.dueOn}.`,
      '',
      `Open the position: ${screenUrl(base, positionFieldPath(a.positionId))}`,
    ].join('\n'),
  };
}
