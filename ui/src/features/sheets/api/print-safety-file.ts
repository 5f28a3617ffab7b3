import { apiPath, apiRoutes } from '@holdfast/shared';
import { useMutation } from '@tanstack/react-query';
import type { SafetyFileInput } from '@holdfast/shared';
import { apiDownload, saveBlob } from '../../../lib/api-client';

/** Approved revisions as one PDF for a safety file, saved under the server's file name. */
export async function printSafetyFile(input: SafetyFileInput): Promise<string> {
  const file = await apiDownload(apiPath(apiRoutes.print.safetyFile), { body: input });
  const name = file.fileName ?? 'holdfast-safety-file.pdf';
  saveBlob(file.blob, name);
  return name;
}

export function usePrintSafetyFile() {
  return useMutation({ mutationFn: printSafetyFile });
}
