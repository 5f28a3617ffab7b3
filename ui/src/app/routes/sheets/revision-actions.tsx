import { useState } from 'react';
import { Button, Group, Menu } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconChevronDown, IconPrinter, IconSend } from '@tabler/icons-react';
import type { CheckResult } from '@holdfast/calc';
import type { Revision } from '@holdfast/shared';
import { errorMessage } from '../../../lib/api-client';
import { usePrintRevision, type PrintKind } from '../../../features/revisions/api/print-revision';
import { useSubmitRevision } from '../../../features/revisions/api/submit-revision';
import { useDriftRevision } from '../../../features/revisions/api/drift-revision';
import { DriftDialog } from '../../../features/revisions/components/drift-dialog';
import { UnconfirmedDialog } from '../../../features/revisions/components/unconfirmed-dialog';
import type { WorkbenchContext } from '../../../features/revisions/components/revision-workbench';
import { SubmitDialog } from '../../../features/review/components/submit-dialog';
import { CheckActions } from './check-actions';

export interface RevisionActionsProps {
  revision: Revision;
  ctx: WorkbenchContext;
  openComments: number;
}

/** Only what the server says this user may do with this revision in its state, plus printing. */
export function RevisionActions({ revision, ctx, openComments }: RevisionActionsProps) {
  const [dialog, setDialog] = useState<'submit' | 'drift' | 'unconfirmed' | null>(null);
  const [failing, setFailing] = useState<CheckResult[]>([]);
  const [rowVersion, setRowVersion] = useState(revision.rowVersion);
  const submit = useSubmitRevision(revision.id);
  const print = usePrintRevision(revision.id);
  const drift = useDriftRevision(revision.id);
  const close = () => setDialog(null);

  const openSubmit = async () => {
    const saved = await ctx.flush();
    if (ctx.hasInputErrors) {
      notifications.show({
        color: 'fail',
        title: 'Not sent',
        message: 'Fix the inputs marked in red first.',
      });
      return;
    }
    if (ctx.unconfirmed.length > 0) {
      setDialog('unconfirmed');
      return;
    }
    setRowVersion(saved?.rowVersion ?? revision.rowVersion);
    setFailing((ctx.evaluation?.checks ?? []).filter((c) => !c.pass));
    setDialog('submit');
  };

  const doPrint = (kind: PrintKind) =>
    print.mutate(
      { kind },
      {
        onError: (e) =>
          notifications.show({
            color: 'fail',
            title: 'Could not download the printout',
            message: errorMessage(e),
          }),
      },
    );

  return (
    <Group gap="xs">
      {revision.canSubmit ? (
        <Button
          size="sm"
          leftSection={<IconSend size={16} aria-hidden />}
          onClick={() => void openSubmit()}
        >
          Send for check
        </Button>
      ) : null}
      <CheckActions revision={revision} openComments={openComments} />
      <Menu position="bottom-end" withinPortal>
        <Menu.Target>
          <Button
            size="sm"
            variant="default"
            leftSection={<IconPrinter size={16} aria-hidden />}
            rightSection={<IconChevronDown size={14} aria-hidden />}
            loading={print.isPending}
          >
            Print
          </Button>
        </Menu.Target>
        <Menu.Dropdown>
          <Menu.Label>
            {revision.state === 'approved' ? 'Approved revision' : 'Marked “not for use”'}
          </Menu.Label>
          <Menu.Item onClick={() => doPrint('pdf')}>Calculation sheet (PDF)</Menu.Item>
          <Menu.Item onClick={() => doPrint('field-card')}>Field setting card (PDF)</Menu.Item>
          {revision.state === 'approved' || revision.state === 'superseded' ? (
            <>
              <Menu.Divider />
              <Menu.Item
                onClick={() => {
                  setDialog('drift');
                  drift.mutate();
                }}
              >
                Recalculate with today’s core
              </Menu.Item>
            </>
          ) : null}
        </Menu.Dropdown>
      </Menu>
      <UnconfirmedDialog
        opened={dialog === 'unconfirmed'}
        onClose={close}
        fields={dialog === 'unconfirmed' ? ctx.unconfirmed : []}
      />
      <DriftDialog
        opened={dialog === 'drift'}
        onClose={close}
        report={drift.data}
        pending={drift.isPending}
        error={drift.error}
      />
      <SubmitDialog
        opened={dialog === 'submit'}
        onClose={close}
        failingChecks={failing}
        onSubmit={(justification) => submit.mutateAsync({ rowVersion, justification })}
      />
    </Group>
  );
}
