import { Injectable } from '@nestjs/common';
import type { SheetEvaluation, SheetInputs } from '@holdfast/calc';
import type { DriftReport } from '@holdfast/shared';
import type { AuthUser } from '../auth/auth-user.js';
import { conflict } from '../common/errors/api-exception.js';
import { CriteriaService } from '../criteria/criteria.service.js';
import { failingChecks } from '../criteria/failing-checks.js';
import { coreVersion, evaluateStoredRecord } from '../calc/calc-engine.js';
import { diffChecks, diffResults } from './diff.js';
import { RevisionsService } from './revisions.service.js';

/**
 * Re-run an evaluated revision's stored inputs with today's calc core, against the same
 * criteria-set version it was evaluated with, and report every result that moved; and, when the
 * set has a newer version, against that one too, reporting the checks that fail under it.
 */
@Injectable()
export class DriftService {
  constructor(
    private readonly revisions: RevisionsService,
    private readonly criteria: CriteriaService,
  ) {}

  async drift(user: AuthUser, id: string): Promise<DriftReport> {
    const rev = await this.revisions.load(user, id);
    const then = rev.evaluation as SheetEvaluation | null;
    if (!then || !rev.coreVersion)
      throw conflict(`Revision ${rev.label} has no stored evaluation to compare.`);
    const criteria = await this.criteria.load(rev.criteriaSetId, rev.criteriaSetVersion);
    const newestCriteria = await this.newest(rev, criteria.version);
    let now: SheetEvaluation;
    try {
      now = evaluateStoredRecord(rev.sheetType, rev.inputs as SheetInputs, criteria);
    } catch (e) {
      return {
        coreVersionThen: rev.coreVersion,
        coreVersionNow: coreVersion(),
        moved: [],
        checksChanged: [],
        error: `Today's core no longer evaluates these inputs: ${e instanceof Error ? e.message : String(e)}`,
        newestCriteria,
      };
    }
    return {
      coreVersionThen: rev.coreVersion,
      coreVersionNow: coreVersion(),
      // A result present on one side only shows up as a moved check or in the compare view.
      moved: diffResults(then, now).flatMap((d) =>
        d.from === null || d.to === null || d.delta === null
          ? []
          : [{ key: d.key, label: d.label, unit: d.unit, then: d.from, now: d.to, delta: d.delta }],
      ),
      checksChanged: diffChecks(then, now).map((c) => ({
        id: c.id,
        label: c.label,
        then: c.from,
        now: c.to,
      })),
      error: null,
      newestCriteria,
    };
  }

  /** The stored inputs under the newest version of the set; null when the revision used it. */
  private async newest(
    rev: { sheetType: string; inputs: unknown; criteriaSetId: string },
    versionThen: number,
  ): Promise<DriftReport['newestCriteria']> {
    const latest = await this.criteria.load(rev.criteriaSetId, 'latest');
    if (latest.version === versionThen) return null;
    let error: string | null = null;
    const failing = failingChecks(rev.sheetType, rev.inputs, latest, (e) => {
      error = e instanceof Error ? e.message : String(e);
    });
    return {
      criteriaSetId: rev.criteriaSetId,
      versionThen,
      versionNow: latest.version,
      failing: error ? [] : failing.map((f) => ({ id: f.id, label: f.label })),
      error,
    };
  }
}
