import type { SheetListQuery } from '@holdfast/shared';

export type SheetListParams = Partial<SheetListQuery>;

/** Query keys of everything a sheet owns; invalidating `all` refreshes lists and details. */
export const sheetKeys = {
  all: ['sheets'] as const,
  lists: () => [...sheetKeys.all, 'list'] as const,
  list: (params: SheetListParams) => [...sheetKeys.lists(), params] as const,
  details: () => [...sheetKeys.all, 'detail'] as const,
  detail: (id: string) => [...sheetKeys.details(), id] as const,
  audit: (id: string) => [...sheetKeys.detail(id), 'audit'] as const,
  compare: (id: string, from: string, to: string) =>
    [...sheetKeys.detail(id), 'compare', from, to] as const,
};
