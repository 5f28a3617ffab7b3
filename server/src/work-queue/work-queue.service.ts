import { Injectable } from '@nestjs/common';
import type { QueueItem, WorkQueue } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { effectiveRoles } from '../auth/policy.js';
import { WorkQueueRepository, type QueueRow } from './work-queue.repository.js';

const toItem = (r: QueueRow): QueueItem => ({
  sheetId: r.sheetId,
  documentNumber: r.documentNumber,
  title: r.title,
  revisionId: r.revisionId,
  revisionLabel: r.label,
  state: r.state as QueueItem['state'],
  author: { id: r.authorId, displayName: r.displayName, initials: r.initials },
  updatedAt: r.updatedAt.toISOString(),
});

@Injectable()
export class WorkQueueService {
  constructor(private readonly repo: WorkQueueRepository) {}

  /**
   * What a viewer or a fitter acts on is any newly approved sheet (to print into the safety
   * file, or to set the brake to); an engineer or checker, the approvals of their own work; an
   * administrator, none. A fitter authors nothing, so "their own" would always be empty.
   */
  private recentlyApproved(user: AuthUser): Promise<QueueRow[]> {
    if (user.role === 'admin') return Promise.resolve([]);
    const everyone = user.role === 'viewer' || user.role === 'technician';
    return this.repo.recentlyApproved(everyone ? undefined : user.id);
  }

  /** Drafts and returned revisions I author or whose sheet I own; checks waiting for me. */
  async forUser(user: AuthUser): Promise<WorkQueue> {
    const isChecker = effectiveRoles(user.role).includes('checker');
    // Only engineers (and checkers, who are engineers too) author; nobody else has drafts.
    const authors = effectiveRoles(user.role).includes('engineer');
    const none = Promise.resolve([] as QueueRow[]);
    const [myDrafts, returnedToMe, awaitingMyCheck, recentlyApproved] = await Promise.all([
      authors ? this.repo.drafts(user.id) : none,
      authors ? this.repo.returned(user.id) : none,
      isChecker ? this.repo.awaitingCheckBy(user.id) : none,
      this.recentlyApproved(user),
    ]);
    return {
      myDrafts: myDrafts.map(toItem),
      returnedToMe: returnedToMe.map(toItem),
      awaitingMyCheck: awaitingMyCheck.map(toItem),
      recentlyApproved: recentlyApproved.map(toItem),
    };
  }
}
