import { useState } from 'react';
import { notifications } from '@mantine/notifications';
import { errorMessage, saveBlob } from '../../../lib/api-client';
import { csvBlob } from '../../../lib/csv';
import { sheetTypeTitle } from '../../../components/calc/utils/sheet-types';
import { getSheets } from '../../../features/sheets/api/get-sheets';
import type { SheetListParams } from '../../../lib/query-keys';
import { usePrintSafetyFile } from '../../../features/sheets/api/print-safety-file';
import { sheetsCsv } from '../../../features/sheets/utils/sheets-csv';

const EXPORT_PAGE = 200;

/**
 * What leaves the sheet list: the approved revisions picked for one safety-file PDF, and the
 * list (every page, with the filters on screen) as CSV.
 */
export function useListOutputs(params: SheetListParams) {
  const [picked, setPicked] = useState<ReadonlySet<string>>(new Set());
  const print = usePrintSafetyFile();
  const fail = (title: string) => (e: unknown) =>
    notifications.show({ color: 'fail', title, message: errorMessage(e) });

  const toggle = (id: string) =>
    setPicked((prev) => {
      const next = new Set(prev);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  const printPicked = () =>
    print.mutate(
      { revisionIds: [...picked], paper: 'A4' },
      { onError: fail('Could not print the safety file') },
    );

  const exportCsv = async () => {
    try {
      const all = [];
      for (let page = 1; ; page++) {
        const list = await getSheets({ ...params, page, pageSize: EXPORT_PAGE });
        all.push(...list.items);
        if (all.length >= list.total || list.items.length === 0) break;
      }
      const day = new Date().toISOString().slice(0, 10);
      saveBlob(csvBlob(sheetsCsv(all, sheetTypeTitle)), `holdfast-sheets-${day}.csv`);
    } catch (e) {
      fail('Could not export the list')(e);
    }
  };

  return {
    picked,
    toggle,
    printPicked,
    exportCsv: () => void exportCsv(),
    printing: print.isPending,
  };
}
