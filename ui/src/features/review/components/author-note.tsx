import { Alert, Text } from '@mantine/core';
import { IconMessageExclamation } from '@tabler/icons-react';

/**
 * The author's note to the checker, given when the revision went for check with failing checks.
 * The checker reads it before deciding, so it sits in the review tab and in both dialogs.
 */
export function AuthorNote({ justification }: { justification: string | null }) {
  if (!justification) return null;
  return (
    <Alert
      color="amber"
      variant="light"
      icon={<IconMessageExclamation size={18} aria-hidden />}
      title="Note from the author to the checker"
      data-testid="author-note"
    >
      <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
        {justification}
      </Text>
    </Alert>
  );
}
