import { Injectable, Logger } from '@nestjs/common';
import type { SheetInputs } from '@holdfast/calc';
import type { ImpactReport } from '@holdfast/shared';
import { Database } from '../database/database.js';
import { evaluateSheet } from '../revisions/calc-engine.js';
import { CriteriaService } from './criteria.service.js';

/**
 * Impact check: re-evaluate the stored inputs of every approved revision that uses this criteria
 * set against a given version of it, and list those that would no longer pass.
 */
@Injectable()
export class ImpactService {
  private readonly logger = new Logger('ImpactService');

  constructor(
    private readonly db: Database,
    private readonly criteria: CriteriaService,
  ) {}

  async impact(setId: string, version?: number): Promise<ImpactReport> {
    const criteria = await this.criteria.load(setId, version ?? 'latest');
    const approved = await this.db
      .selectFrom('revisions as r')
      .innerJoin('sheets as s', 's.id', 'r.sheetId')
      .select([
        'r.id',
        'r.label',
        'r.inputs',
        's.id as sheetId',
        's.documentNumber',
        's.title',
        's.sheetType',
      ])
      .where('r.state', '=', 'approved')
      .where('r.criteriaSetId', '=', setId)
      .orderBy('s.documentNumber')
      .execute();
    const items: ImpactReport['items'] = [];
    for (const rev of approved) {
      let failing: ImpactReport['items'][number]['failing'];
      try {
        const evaluation = evaluateSheet(rev.sheetType, rev.inputs as SheetInputs, criteria);
        failing = evaluation.checks
          .filter((c) => !c.pass)
          .map((c) => ({
            id: c.id,
            label: c.label,
            value: c.value,
            limit: c.limit,
            unit: c.unit,
            dimension: c.dimension,
          }));
      } catch (e) {
        this.logger.warn(
          `impact: ${rev.documentNumber} rev. ${rev.label} no longer evaluates: ${String(e)}`,
        );
        failing = [
          {
            id: 'evaluation',
            label: 'Stored inputs no longer evaluate',
            value: 0,
            limit: 0,
            unit: '',
          },
        ];
      }
      if (failing.length > 0) {
        items.push({
          sheetId: rev.sheetId,
          documentNumber: rev.documentNumber,
          title: rev.title,
          revisionId: rev.id,
          revisionLabel: rev.label,
          failing,
        });
      }
    }
    return { criteriaSetId: setId, version: criteria.version, checked: approved.length, items };
  }
}
