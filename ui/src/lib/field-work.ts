import type { Role } from '@holdfast/shared';

/** Who may record field work: the server's RECORDERS (technician, engineer; checkers are engineers too). */
export const FIELD_RECORDERS: Role[] = ['technician', 'engineer', 'checker'];

export const canRecordFieldWork = (role: Role | undefined): boolean =>
  !!role && FIELD_RECORDERS.includes(role);

/** Where a field record against an approved revision is started. */
export const newFieldRecordPath = (revisionId: string) => `/field-records/new/${revisionId}`;
