import { useCallback, useMemo, useRef, useState, type ReactNode } from 'react';
import { Alert, Box, Stack } from '@mantine/core';
import { IconLock } from '@tabler/icons-react';
import {
  checkDrivers,
  settingBands,
  type CriteriaSet,
  type SheetEvaluation,
  type SheetTypeDefinition,
} from '@holdfast/calc';
import type { Revision } from '@holdfast/shared';
import { InputSections } from '../../../components/calc/components/input-sections';
import { ResultsPanel } from '../../../components/calc/components/results-panel';
import { LiveSettingBands } from '../../../components/calc/components/results-tabs';
import { useLiveEvaluation } from '../../../components/calc/hooks/use-live-evaluation';
import { useNumberFormat } from '../../../components/calc/hooks/use-number-format';
import { checkField, fieldMessages } from '../../../components/calc/utils/field-check';
import type { UnitSystem } from '../../../components/calc/utils/units';
import { useRevisionDraft } from '../hooks/use-revision-draft';
import { CheckSummaryBar } from './check-summary-bar';
import { ConflictDialog } from './conflict-dialog';
import { LocalDraftOffer } from './local-draft-offer';
import { UnconfirmedNote } from './unconfirmed-note';
import { ChangeNoteField, WorkbenchBar } from './workbench-bar';
import classes from './revision-workbench.module.css';

export interface WorkbenchContext {
  /** Saves pending edits and resolves with the saved revision (null when nothing could be saved). */
  flush: () => Promise<Revision | null>;
  /** The live evaluation of the current inputs, null when they are invalid (read when needed). */
  readonly evaluation: SheetEvaluation | null;
  readonly hasInputErrors: boolean;
  /** Fields still holding example or copied values nobody confirmed, with their labels. */
  readonly unconfirmed: { key: string; label: string }[];
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
  // Read by viewers and fitters too, who cannot start one: say what a change is, not who makes it.
  approved: 'This revision is approved and can never change: a change is a new revision.',
  superseded: 'This revision has been superseded by a later approval. It is kept as it was.',
};

/** The revision editor: inputs on the left, results recalculated live on the right. */
export function RevisionWorkbench(props: RevisionWorkbenchProps) {
  const { revision, sheetType, criteria } = props;
  const draft = useRevisionDraft(revision, sheetType);
  const { content, autosave, editable } = draft;
  const live = useLiveEvaluation(sheetType, content.inputs, criteria);
  const format = useNumberFormat();
  // A frozen revision keeps its stored units; a reader may still view the results in the other system.
  const [viewSystem, setViewSystem] = useState<UnitSystem | null>(null);
  const storedSystem = content.unitSystem as UnitSystem;
  const unitSystem = editable ? storedSystem : (viewSystem ?? storedSystem);

  // Frozen revisions show the evaluation the server stored at submission: that is the record.
  const stored = !editable && revision.evaluation ? revision.evaluation : null;
  const evaluation = stored ?? live.evaluation;
  const { serverErrors } = autosave;
  const liveEvaluation = live.evaluation;
  const bandsOfLive = useCallback(
    (shown: SheetEvaluation) => {
      // Only the evaluation of the inputs as they stand (not the dimmed last good one).
      if (!criteria || shown !== liveEvaluation) return undefined;
      try {
        return settingBands(sheetType, content.inputs, criteria, shown);
      } catch {
        return undefined; // a fault in the core shows where the evaluation itself is shown
      }
    },
    [sheetType, content.inputs, criteria, liveEvaluation],
  );
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

  // What the autosave holds back: fields the editor or the core finds invalid right now.
  const latestErrors = useRef(coreErrors);
  latestErrors.current = coreErrors;
  draft.invalidKeys.current = (c) => {
    const keys = new Set(Object.keys(latestErrors.current));
    for (const f of sheetType.fields)
      if (checkField(f, c.inputs[f.key], format) && c.inputs[f.key] !== '') keys.add(f.key);
    return keys;
  };

  const unconfirmed = useMemo(() => new Set(content.unconfirmed ?? []), [content.unconfirmed]);
  const latest = useRef({ inputs: content.inputs, evaluation: live.evaluation, invalidCount });
  latest.current = { inputs: content.inputs, evaluation: live.evaluation, invalidCount };
  const unconfirmedList = useMemo(
    () =>
      sheetType.fields
        .filter((f) => unconfirmed.has(f.key))
        .map((f) => ({ key: f.key, label: f.label })),
    [sheetType, unconfirmed],
  );
  const unconfirmedRef = useRef(unconfirmedList);
  unconfirmedRef.current = unconfirmedList;

  // One object for the actions: it reads the newest state when asked, so they need not re-render.
  const { flush } = autosave;
  const ctx = useMemo<WorkbenchContext>(
    () => ({
      flush,
      get evaluation() {
        return latest.current.evaluation;
      },
      get hasInputErrors() {
        return latest.current.invalidCount > 0;
      },
      get unconfirmed() {
        return unconfirmedRef.current;
      },
    }),
    [flush],
  );
  const findDrivers = useCallback(
    (checkId: string) =>
      criteria ? checkDrivers(sheetType, latest.current.inputs, criteria, checkId) : [],
    [sheetType, criteria],
  );

  const { renderActions } = props;
  const actions = useMemo(() => renderActions?.(ctx), [renderActions, ctx]);
  const { status, lastSavedAt, heldBack } = autosave;
  const save = useMemo(
    () => (editable ? { status, lastSavedAt, heldBack: heldBack.length } : undefined),
    [editable, status, lastSavedAt, heldBack],
  );

  return (
    <Stack>
      <WorkbenchBar
        unitSystem={unitSystem}
        onUnitSystem={editable ? draft.setUnitSystem : setViewSystem}
        save={save}
        errorMessage={autosave.errorMessage}
        actions={actions}
      />
      {draft.offer ? (
        <LocalDraftOffer
          offer={draft.offer}
          onRestore={draft.restoreLocal}
          onDiscard={draft.discardLocal}
        />
      ) : null}
      {!editable ? (
        <Alert icon={<IconLock size={18} />} color="steel" variant="light" title="Read only">
          {READ_ONLY_REASON[revision.state] ?? 'You cannot edit this revision.'}
        </Alert>
      ) : null}
      {editable && unconfirmedList.length > 0 ? (
        <UnconfirmedNote fields={unconfirmedList} onConfirmAll={draft.confirm} />
      ) : null}
      <div className={classes.split}>
        <Stack
          gap="md"
          onBlur={editable ? () => void autosave.flush() : undefined}
          data-testid="workbench-inputs"
        >
          <CheckSummaryBar evaluation={evaluation} className={classes.summaryBar} />
          <ChangeNoteField
            value={content.changeNote}
            readOnly={!editable}
            onChange={draft.setChangeNote}
          />
          <InputSections
            sheetType={sheetType}
            inputs={content.inputs}
            onChange={draft.setInput}
            unitSystem={unitSystem}
            errors={errors}
            readOnly={!editable}
            renderFieldAside={props.renderFieldAside}
            unconfirmed={editable ? unconfirmed : undefined}
            onConfirm={draft.confirm}
          />
        </Stack>
        <Box className={classes.results} tabIndex={-1} data-testid="workbench-results">
          <LiveSettingBands.Provider value={bandsOfLive}>
            <ResultsPanel
              evaluation={evaluation}
              stale={stored ? null : live.lastGood}
              sections={sheetType.sections}
              unitSystem={unitSystem}
              durationMs={stored || live.runs === 0 ? undefined : live.durationMs}
              origin={
                stored
                  ? // A draft or returned revision read by someone else was stored when last saved.
                    `Stored at ${revision.state === 'draft' || revision.state === 'returned' ? 'the last save' : 'submission'} (${revision.coreVersion ?? 'core'})`
                  : 'Recalculated live in your browser'
              }
              failure={stored ? null : live.failure}
              invalidCount={stored ? 0 : invalidCount}
              renderCheckAside={props.renderCheckAside}
              renderStepAside={props.renderStepAside}
              findDrivers={criteria ? findDrivers : undefined}
              criteria={criteria}
            />
          </LiveSettingBands.Provider>
        </Box>
      </div>
      <ConflictDialog
        opened={autosave.status === 'conflict'}
        onTakeTheirs={draft.takeTheirs}
        onKeepMine={autosave.keepMine}
      />
    </Stack>
  );
}
