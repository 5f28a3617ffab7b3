import { Injectable } from '@nestjs/common';
import type { SheetInputs } from '@holdfast/calc';
import type { RevisionChanges } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditRepository } from '../audit/audit.repository.js';
import { fieldLabel } from '../calc/calc-engine.js';
import { diffInputs } from './diff.js';
import { RevisionsRepository } from './revisions.repository.js';
import { RevisionsService } from './revisions.service.js';

interface Reference {
  kind: 'submission' | 'revision';
  label: string;
  at: Date;
  inputs: SheetInputs;
  changeNote: string;
}

/** Whether the revision's current inputs are themselves a submission (so compare one further back). */
const submittedNow = (state: string) => state !== 'draft' && state !== 'returned';

/**
 * "Changed since last submission": a returned revision sent back in is compared with what the
 * checker saw at its previous submission (the inputs recorded in the audit event of that submit);
 * a revision's first submission is compared with the revision it was started from.
 */
@Injectable()
export class ChangesService {
  constructor(
    private readonly auditRepo: AuditRepository,
    private readonly repo: RevisionsRepository,
    private readonly revisions: RevisionsService,
  ) {}

  async changes(user: AuthUser, id: string): Promise<RevisionChanges> {
    const rev = await this.revisions.load(user, id);
    const ref = await this.reference(rev.id, rev.sheetId, rev.seq, rev.state);
    if (!ref) return { since: null, inputs: [], changeNote: null };
    const inputs = diffInputs(ref.inputs, rev.inputs as SheetInputs, (k) =>
      fieldLabel(rev.sheetType, k),
    );
    return {
      since: { kind: ref.kind, label: ref.label, at: ref.at.toISOString() },
      inputs,
      // A new revision brings its own change note; only a resubmission can have changed it.
      changeNote:
        ref.kind === 'submission' && ref.changeNote !== rev.changeNote
          ? { from: ref.changeNote, to: rev.changeNote }
          : null,
    };
  }

  private async reference(
    id: string,
    sheetId: string,
    seq: number,
    state: string,
  ): Promise<Reference | undefined> {
    const submits = await this.auditRepo.eventsFor(id, 'revision.submitted');
    const earlier = submittedNow(state) ? submits[1] : submits[0];
    const snap = earlier?.before as { inputs?: SheetInputs; changeNote?: string } | null;
    if (earlier && snap?.inputs) {
      const label = await this.repo.label(id);
      return {
        kind: 'submission',
        label: label ?? '',
        at: earlier.at,
        inputs: snap.inputs,
        changeNote: snap.changeNote ?? '',
      };
    }
    const previous = await this.repo.previousSubmitted(sheetId, seq);
    if (!previous) return undefined;
    return {
      kind: 'revision',
      label: previous.label,
      at: previous.submittedAt ?? previous.createdAt,
      inputs: previous.inputs as SheetInputs,
      changeNote: previous.changeNote,
    };
  }
}
