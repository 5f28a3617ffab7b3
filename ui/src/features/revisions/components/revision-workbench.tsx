import { useMemo, useState, type ReactNode } from 'react';
import {
  Alert,
  Box,
  Grid,
  Group,
  Paper,
  SegmentedControl,
  Stack,
  Text,
  TextInput,
} from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import type { CriteriaSet, SheetEvaluation, SheetTypeDefinition } from '@holdfast/calc';
import type { Revision } from '@holdfast/shared';
import { InputSections } from '../../calc/components/input-sections';
import { ResultsPanel } from '../../calc/components/results-panel';
import { useLiveEvaluation } from '../../calc/hooks/use-live-evaluation';
import { useNumberFormat } from '../../calc/hooks/use-number-format';
import { fieldMessages } from '../../calc/utils/field-check';
import type { UnitSystem } from '../../calc/utils/units';
import { useRevisionDraft } from '../hooks/use-revision-draft';
import { ConflictDialog } from './conflict-dialog';
import { SaveStatusText } from './save-status';

export interface WorkbenchContext {
  /** Saves pending edits and resolves with the saved revision (null when nothing could be saved). */
  flush: () => Promise<Revision | null>;
  /** The live evaluation of the current inputs, null when they are invalid. */
  evaluation: SheetEvaluation | null;
  hasInputErrors: boolean;
}

export interface RevisionWorkbenchProps {
  revision: Revision;
  sheetType: SheetTypeDefinition;
  criteria: CriteriaSet | undefined;
  renderActions?: (ctx: WorkbenchContext) => ReactNode;
  renderFieldAside?: (key: string) => ReactNode;
  renderStepAside?: (id: string) => ReactNode;
  renderCheckAside?: (id: string) => ReactNode;
}

const READ_ONLY_REASON: Record<string, string> = {
  in_check: 'This revision is with a checker. It cannot be edited until it is returned.',
  approved:
    'This revision is approved and can never change. Start a new revision to make a change.',
  superseded: 'This revision has been superseded by a later approval. It is kept as it was.',
};

/** The revision editor: inputs on the left, results recalculated live on the right. */
export function RevisionWorkbench(props: RevisionWorkbenchProps) {
  const { revision, sheetType, criteria } = props;
  const draft = useRevisionDraft(revision, sheetType);
  const { content, autosave, editable } = draft;
  const live = useLiveEvaluation(sheetType, content.inputs, criteria);
  // A frozen revision keeps its stored units; a reader may still view the results in the other system.
  const [viewSystem, setViewSystem] = useState<UnitSystem | null>(null);
  const storedSystem = content.unitSystem as UnitSystem;
  const unitSystem = editable ? storedSystem : (viewSystem ?? storedSystem);

  // Frozen revisions show the evaluation the server stored at submission: that is the record.
  const stored = !editable && revision.evaluation ? revision.evaluation : null;
  const evaluation = stored ?? live.evaluation;
  // Field messages in the field's own unit and the user's number format (not the core's SI text).
  const format = useNumberFormat();
  const { serverErrors } = autosave;
  const coreErrors = live.fieldErrors;
  const errors = useMemo(
    () =>
      editable
        ? fieldMessages(
            sheetType.fields,
            content.inputs,
            { ...serverErrors, ...coreErrors },
            format,
          )
        : { ...serverErrors, ...coreErrors },
    [editable, sheetType, content.inputs, serverErrors, coreErrors, format],
  );
  const invalidCount = Object.keys(errors).length;

  return (
    <Stack>
      <Paper p="sm">
        <Group justify="space-between" gap="sm" wrap="wrap">
          <Group gap="md" wrap="wrap">
            <SegmentedControl
              size="xs"
              aria-label="Units for this sheet"
              value={unitSystem}
              onChange={(v) =>
                editable ? draft.setUnitSystem(v as UnitSystem) : setViewSystem(v as UnitSystem)
              }
              data={[
                { value: 'SI', label: 'SI units' },
                { value: 'US', label: 'US customary' },
              ]}
            />
            {editable ? (
              <SaveStatusText status={autosave.status} lastSavedAt={autosave.lastSavedAt} />
            ) : null}
          </Group>
          {props.renderActions?.({
            flush: autosave.flush,
            evaluation: live.evaluation,
            hasInputErrors: invalidCount > 0,
          })}
        </Group>
        {autosave.status === 'error' && autosave.errorMessage ? (
          <Text size="xs" c="fail.8" mt={6} role="alert">
            {autosave.errorMessage}
          </Text>
        ) : null}
      </Paper>
      {!editable ? (
        <Alert icon={<IconLock size={18} />} color="steel" variant="light" title="Read only">
          {READ_ONLY_REASON[revision.state] ?? 'You cannot edit this revision.'}
        </Alert>
      ) : null}
      <Grid gap="md" align="flex-start">
        <Grid.Col span={{ base: 12, md: 6 }}>
          <Stack gap="md">
            <Paper p="md">
              <TextInput
                label="Change note"
                description="What this revision changes and why; printed in the revision history."
                value={content.changeNote}
                readOnly={!editable}
                onChange={(e) => draft.setChangeNote(e.currentTarget.value)}
                maxLength={2000}
              />
            </Paper>
            <InputSections
              sheetType={sheetType}
              inputs={content.inputs}
              onChange={draft.setInput}
              unitSystem={unitSystem}
              errors={errors}
              readOnly={!editable}
              renderFieldAside={props.renderFieldAside}
            />
          </Stack>
        </Grid.Col>
        <Grid.Col span={{ base: 12, md: 6 }}>
          <Box
            style={{
              position: 'sticky',
              top: 72,
              maxHeight: 'calc(100vh - 150px)',
              overflowY: 'auto',
              borderRadius: 4,
            }}
            tabIndex={-1}
          >
            <ResultsPanel
              evaluation={evaluation}
              stale={stored ? null : live.lastGood}
              sections={sheetType.sections}
              unitSystem={unitSystem}
              durationMs={stored || live.runs === 0 ? undefined : live.durationMs}
              origin={
                stored
                  ? `Stored at submission (${revision.coreVersion ?? 'core'})`
                  : 'Recalculated live in your browser'
              }
              failure={stored ? null : live.failure}
              invalidCount={stored ? 0 : invalidCount}
              renderCheckAside={props.renderCheckAside}
              renderStepAside={props.renderStepAside}
            />
          </Box>
        </Grid.Col>
      </Grid>
      <ConflictDialog
        opened={autosave.status === 'conflict'}
        onTakeTheirs={draft.takeTheirs}
        onKeepMine={autosave.keepMine}
      />
    </Stack>
  );
}
