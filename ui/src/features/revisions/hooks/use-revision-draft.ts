import { useCallback, useEffect, useRef, useState } from 'react';
import type { InputValue, SheetInputs, SheetTypeDefinition } from '@holdfast/calc';
import type { Revision } from '@holdfast/shared';
import { withDefaults } from '../../calc/utils/sheet-types';
import { convertQuantity, defaultUnit, isQuantity, type UnitSystem } from '../../calc/utils/units';
import { useDraftAutosave, type DraftContent } from './use-draft-autosave';

/**
 * The editable state of one revision: inputs, unit system and change note, kept locally so every
 * keystroke recalculates at once, and saved in the background.
 */
export function useRevisionDraft(revision: Revision, sheetType: SheetTypeDefinition) {
  const editable = revision.canEdit;
  const [content, setContent] = useState<DraftContent>(() => fromRevision(revision, sheetType));
  const contentRef = useRef(content);
  const autosave = useDraftAutosave(revision, editable);

  const apply = useCallback(
    (next: DraftContent) => {
      contentRef.current = next;
      setContent(next);
      autosave.touch(next);
    },
    [autosave],
  );

  // A different revision (navigation) starts from its own stored content.
  useEffect(() => {
    const fresh = fromRevision(revision, sheetType);
    contentRef.current = fresh;
    setContent(fresh);
    // Only the identity of the revision matters here, not each saved copy of it.
  }, [revision.id, sheetType]); // eslint-disable-line react-hooks/exhaustive-deps

  // A read-only revision always shows what the server holds (e.g. after a state change).
  useEffect(() => {
    if (!editable) {
      const fresh = fromRevision(revision, sheetType);
      contentRef.current = fresh;
      setContent(fresh);
    }
  }, [editable, revision, sheetType]);

  const setInput = useCallback(
    (key: string, value: InputValue) => {
      const cur = contentRef.current;
      apply({ ...cur, inputs: { ...cur.inputs, [key]: value } });
    },
    [apply],
  );

  const setChangeNote = useCallback(
    (changeNote: string) => apply({ ...contentRef.current, changeNote }),
    [apply],
  );

  /** Switches the sheet's units, converting each quantity to the new system's unit for its field. */
  const setUnitSystem = useCallback(
    (system: UnitSystem) => {
      const cur = contentRef.current;
      apply({ ...cur, unitSystem: system, inputs: convertInputs(cur.inputs, sheetType, system) });
    },
    [apply, sheetType],
  );

  const takeTheirs = useCallback(async () => {
    const theirs = await autosave.takeTheirs();
    const fresh = fromRevision(theirs, sheetType);
    contentRef.current = fresh;
    setContent(fresh);
  }, [autosave, sheetType]);

  return { content, setInput, setChangeNote, setUnitSystem, autosave, takeTheirs, editable };
}

function fromRevision(revision: Revision, type: SheetTypeDefinition): DraftContent {
  return {
    inputs: withDefaults(type, revision.inputs),
    unitSystem: revision.unitSystem,
    changeNote: revision.changeNote,
  };
}

export function convertInputs(
  inputs: SheetInputs,
  type: SheetTypeDefinition,
  system: UnitSystem,
): SheetInputs {
  const out: SheetInputs = { ...inputs };
  for (const f of type.fields) {
    const v = inputs[f.key];
    if (f.kind !== 'quantity' || !f.dimension || !isQuantity(v)) continue;
    const unit = (system === 'US' ? f.unitUS : f.unitSI) ?? defaultUnit(f.dimension, system);
    if (unit === v.unit) continue;
    out[f.key] = convertQuantity(v, unit, f.dimension) ?? v;
  }
  return out;
}
