import { waitingPhotos, type OutboxEntry, type OutboxOwner } from './outbox-store';

/** What one person (or nobody known) still has on this device for the server. */
export interface Waiting {
  records: number;
  photos: number;
}

export interface OthersWaiting extends Waiting {
  owner: OutboxOwner;
}

/** The device's outbox seen by one signed-in user (or by nobody, on the sign-in page). */
export interface OutboxSummary {
  mine: Waiting;
  /** Other people's entries, one line per person, in the order they were first saved. */
  others: OthersWaiting[];
  /** Entries kept before owners were stored: sent only once someone confirms they are theirs. */
  unassigned: OutboxEntry[];
  /** What the unassigned entries hold, counted as for a person. */
  unassignedWaiting: Waiting;
}

function waiting(entry: OutboxEntry): Waiting {
  return { records: entry.state === 'sent' ? 0 : 1, photos: waitingPhotos(entry).length };
}

function holdsSomething(w: Waiting): boolean {
  return w.records + w.photos > 0;
}

/** Sorts what the device holds by whose it is; entries with nothing left to send are left out. */
export function summariseOutbox(
  entries: readonly OutboxEntry[],
  userId: string | null,
): OutboxSummary {
  const mine: Waiting = { records: 0, photos: 0 };
  const others = new Map<string, OthersWaiting>();
  const unassigned: OutboxEntry[] = [];
  const unassignedWaiting: Waiting = { records: 0, photos: 0 };
  for (const entry of entries) {
    const w = waiting(entry);
    if (!holdsSomething(w)) continue;
    if (!entry.owner) {
      unassigned.push(entry);
      unassignedWaiting.records += w.records;
      unassignedWaiting.photos += w.photos;
    } else if (entry.owner.id === userId) {
      mine.records += w.records;
      mine.photos += w.photos;
    } else {
      const line = others.get(entry.owner.id) ?? { owner: entry.owner, records: 0, photos: 0 };
      line.records += w.records;
      line.photos += w.photos;
      others.set(entry.owner.id, line);
    }
  }
  return { mine, others: [...others.values()], unassigned, unassignedWaiting };
}

function plural(n: number, one: string, many: string): string {
  return n === 1 ? `1 ${one}` : `${n} ${many}`;
}

/** "2 field records and 1 photo", or '' when nothing waits. */
export function waitingText(w: Waiting): string {
  return [
    w.records > 0 ? plural(w.records, 'field record', 'field records') : null,
    w.photos > 0 ? plural(w.photos, 'photo', 'photos') : null,
  ]
    .filter(Boolean)
    .join(' and ');
}

/** How a person is named on the device: as stored with their entry when they saved it. */
export function ownerName(owner: OutboxOwner): string {
  return `${owner.displayName} (${owner.initials})`;
}
