import { useState } from 'react';
import {
  Alert,
  Anchor,
  Group,
  Paper,
  Progress,
  Skeleton,
  Stack,
  Table,
  Text,
  Title,
} from '@mantine/core';
import { Dropzone, type FileRejection } from '@mantine/dropzone';
import { IconFileUpload, IconPaperclip } from '@tabler/icons-react';
import { attachmentContentTypes, MAX_ATTACHMENT_BYTES } from '@holdfast/shared';
import { ErrorPanel } from '../../../components/errors/error-panel';
import { errorMessage } from '../../../lib/api-client';
import { useAttachments } from '../api/get-attachments';
import { useDownloadAttachment } from '../api/download-attachment';
import { useUploadAttachment } from '../api/upload-attachment';
import { formatBytes } from '../../../lib/format-bytes';
import { isoDay } from '../../../lib/dates';

interface Upload {
  name: string;
  percent: number | null;
  error?: string;
}

/** Data sheets, drawings and photos of a revision: drop to upload, click to download. */
export function AttachmentsPanel({
  revisionId,
  canUpload,
}: {
  revisionId: string;
  canUpload: boolean;
}) {
  const list = useAttachments(revisionId);
  const upload = useUploadAttachment(revisionId);
  const download = useDownloadAttachment();
  const [uploads, setUploads] = useState<Upload[]>([]);

  const update = (name: string, patch: Partial<Upload>) =>
    setUploads((all) => all.map((u) => (u.name === name ? { ...u, ...patch } : u)));

  const onDrop = async (files: File[]) => {
    setUploads((all) => [
      ...all.filter((u) => !u.error),
      ...files.map((f) => ({ name: f.name, percent: 0 })),
    ]);
    for (const file of files) {
      try {
        await upload.mutateAsync({
          file,
          onProgress: (p) => update(file.name, { percent: p.percent }),
        });
        setUploads((all) => all.filter((u) => u.name !== file.name));
      } catch (error) {
        update(file.name, { error: errorMessage(error), percent: null });
      }
    }
  };

  const onReject = (rejections: FileRejection[]) => {
    setUploads((all) => [
      ...all,
      ...rejections.map((r) => ({
        name: r.file.name,
        percent: null,
        error: r.errors.map((e) => rejectionText(e.code, e.message)).join(' '),
      })),
    ]);
  };

  return (
    <Paper p="md" component="section" aria-labelledby="attachments-title">
      <Title order={2} size="h5" id="attachments-title" mb="sm">
        Attachments
      </Title>
      {canUpload ? (
        <Dropzone
          onDrop={(f) => void onDrop(f)}
          onReject={onReject}
          maxSize={MAX_ATTACHMENT_BYTES}
          accept={[...attachmentContentTypes]}
          mb="sm"
          aria-label="Upload attachments"
        >
          <Group justify="center" gap="sm" mih={64} style={{ pointerEvents: 'none' }}>
            <IconFileUpload size={28} stroke={1.5} aria-hidden />
            <div>
              <Text size="sm">Drop files here or click to choose</Text>
              <Text size="xs" c="dimmed">
                PDF, PNG, JPEG, text or CSV, up to {formatBytes(MAX_ATTACHMENT_BYTES)} each
              </Text>
            </div>
          </Group>
        </Dropzone>
      ) : null}
      {uploads.length > 0 ? (
        <Stack gap={6} mb="sm" aria-live="polite">
          {uploads.map((u) =>
            u.error ? (
              <Alert
                key={u.name}
                color="fail"
                variant="light"
                p="xs"
                role="alert"
                title={`${u.name} was not uploaded`}
              >
                {u.error}
              </Alert>
            ) : (
              <div key={u.name}>
                <Text size="xs">
                  Uploading {u.name} {u.percent !== null ? `${u.percent} %` : ''}
                </Text>
                <Progress
                  value={u.percent ?? 100}
                  animated={u.percent === null}
                  size="sm"
                  aria-label={`Upload of ${u.name}`}
                />
              </div>
            ),
          )}
        </Stack>
      ) : null}
      {list.isPending ? (
        <Skeleton h={60} />
      ) : list.isError ? (
        <ErrorPanel error={list.error} onRetry={() => void list.refetch()} />
      ) : list.data.items.length === 0 ? (
        <Text size="sm" c="dimmed">
          No attachments.
        </Text>
      ) : (
        <Table fz="sm" verticalSpacing={4} aria-label="Attached files">
          <Table.Tbody>
            {list.data.items.map((a) => (
              <Table.Tr key={a.id}>
                <Table.Td>
                  <Group gap={6} wrap="nowrap">
                    <IconPaperclip size={14} aria-hidden />
                    <Anchor
                      component="button"
                      type="button"
                      size="sm"
                      onClick={() => download.mutate({ id: a.id, fileName: a.fileName })}
                    >
                      {a.fileName}
                    </Anchor>
                  </Group>
                </Table.Td>
                <Table.Td c="dimmed">{formatBytes(a.size)}</Table.Td>
                <Table.Td c="dimmed">{a.uploadedBy.initials}</Table.Td>
                <Table.Td c="dimmed">{isoDay(a.createdAt)}</Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      )}
      {download.isError ? (
        <Text size="xs" c="fail.8" role="alert" mt={4}>
          Download failed: {errorMessage(download.error)}
        </Text>
      ) : null}
    </Paper>
  );
}

function rejectionText(code: string, fallback: string): string {
  if (code === 'file-too-large')
    return `The file is larger than ${formatBytes(MAX_ATTACHMENT_BYTES)}.`;
  if (code === 'file-invalid-type')
    return 'Only PDF, PNG, JPEG, text and CSV files can be attached.';
  return fallback;
}
