import { apiPath, apiRoutes } from '@holdfast/shared';
import { attachmentSchema, type Attachment } from '@holdfast/shared';
import { apiUpload } from '../../../lib/api-client';
import type { OutboxPhoto } from '../offline/outbox-store';

/** POST one photo of a field record (a draft the signed-in user made) as multipart "file". */
export function uploadFieldPhoto(recordId: string, photo: OutboxPhoto): Promise<Attachment> {
  const form = new FormData();
  form.append('file', new Blob([photo.bytes], { type: photo.type }), photo.name);
  return apiUpload(apiPath(apiRoutes.fieldRecords.upload, { id: recordId }), form, {
    schema: attachmentSchema,
  });
}
