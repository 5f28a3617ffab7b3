import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sheetDetailSchema, type CreateSheetInput, type SheetDetail } from '@holdfast/shared';
import { api } from '../../../lib/api-client';
import { registerKeys, sheetKeys, workQueueKeys } from '../../../lib/query-keys';

export function createSheet(input: CreateSheetInput): Promise<SheetDetail> {
  return api.post(apiPath(apiRoutes.sheets.create), { body: input, schema: sheetDetailSchema });
}

export function useCreateSheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createSheet,
    onSuccess: (sheet) => {
      queryClient.setQueryData(sheetKeys.detail(sheet.id), sheet);
      void queryClient.invalidateQueries({ queryKey: sheetKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: workQueueKeys.all });
      void queryClient.invalidateQueries({ queryKey: registerKeys.all });
    },
  });
}
