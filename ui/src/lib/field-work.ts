/** Where a field record against an approved revision is started. */
export const newFieldRecordPath = (revisionId: string) => `/field-records/new/${revisionId}`;
