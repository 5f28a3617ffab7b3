import { positionFieldPath, screenUrl, type PositionPlace } from '@holdfast/shared';
import type { MailMessage } from '../mail/mailer.js';

export interface RecordAbout {
  recordId: string;
  positionId: string;
  place: PositionPlace;
  documentNumber: string;
  revisionLabel: string;
}

/**
 * A position named in a mail, e.g. "DB-1 on LC-2 (NRW)": the mail goes to everyone on the site and
 * tags repeat across machines. Plain ASCII words, so the subject line needs no encoding.
 */
function placeWords(p: PositionPlace): string {
  return `${p.positionTag} on ${p.machineTag} (${p.siteCode})`;
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
    subject: `[Holdfast] ${placeWords(a.place)}: value left out of tolerance`,
    text: [
      `${signer} signed a field record on ${placeWords(a.place)} (set to ${a.documentNumber} rev. ${a.revisionLabel}) with values left outside their tolerance:`,
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
  a: { positionId: string; place: PositionPlace; dueOn: string },
  to: string[],
): MailMessage {
  return {
    to,
    subject: `[Holdfast] ${placeWords(a.place)}: inspection due ${a.dueOn}`,
    text: [
      `The next inspection of brake position ${placeWords(a.place)} is due on ${a.dueOn}.`,
      '',
      `Open the position: ${screenUrl(base, positionFieldPath(a.positionId))}`,
    ].join('\n'),
  };
}
