import type { ReactNode } from 'react';
import { Anchor } from '@mantine/core';
import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs } from 'react-router-dom';
import type { SheetDetail } from '@holdfast/shared';
import { sheetQueryOptions } from '../../../features/sheets/api/get-sheet';

/** The loader of a page that belongs to one sheet (audit trail, compare): the sheet, prefetched. */
export function sheetSubpageLoader(queryClient: QueryClient) {
  return async ({ params }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(sheetQueryOptions(params.sheetId!));
    return null;
  };
}

/** Above the title of such a page: the sheet it belongs to, as a link back to it (once loaded). */
export function sheetEyebrow(sheet: SheetDetail | undefined): ReactNode {
  if (!sheet) return undefined;
  return (
    <Anchor component={Link} to={`/sheets/${sheet.id}`} size="xs">
      {sheet.documentNumber} · {sheet.title}
    </Anchor>
  );
}
