import { useCallback, useEffect, useRef, useState } from 'react';
import type { InputValue, SheetInputs, SheetTypeDefinition } from '@holdfast/calc';
import type { Revision } from '@holdfast/shared';
import { withMissingFields } from '../../../components/calc/utils/sheet-types';
import {
  convertQuantity,
  defaultUnit,
  isQuantity,
  type UnitSystem,
} from '../../../components/calc/utils/units';
import {
  changedKeys,
  clearLocalDraft,
  readLocalDraft,
  type LocalDraft,
} from '../utils/local-draft';
import { useDraftAutosave, type DraftContent, type InvalidKeys } from './use-draft-autosave';

/** Edits found on this device for a revision, offered back when it is opened again. */
export interface LocalOffer {
  draft: LocalDraft;
  /** Fields (and 'changeNote') that differ from what the server holds. */
  changed: string[];
  /** True when the server's copy moved on since these edits were typed. */
  stale: boolean;
}

/**
 * The editable state of one revision: inputs, unit system and change note, kept locally so every
 * keystroke recalculates at once, and saved in the background.
 */
export function useRevisionDraft(revision: Revision, sheetType: SheetTypeDefinition) {
  const editable = revision.canEdit;
  const [content, setContent] = useState<DraftContent>(() => fromRevision(revision, sheetType));
  const contentRef = useRef(content);
  const invalidKeys = useRef<InvalidKeys | null>(null);
  const autosave = useDraftAutosave(revision, editable, invalidKeys);
  const [offer, setOffer] = useState<LocalOffer | null>(() =>
    editable ? localOffer(revision, sheetType) : null,
  );

  // Stable callbacks (the autosave object is new each render, its functions are not): the field
  // rows are memoised on them, so a keystroke renders one row instead of every row.
  const { touch, takeTheirs: takeTheirsSaved } = autosave;
  const apply = useCallback(
    (next: DraftContent) => {
      contentRef.current = next;
      setContent(next);
      touch(next);
    },
    [touch],
  );

  // A different revision (navigation) starts from its own stored content.
  useEffect(() => {
    const fresh = fromRevision(revision, sheetType);
    contentRef.current = fresh;
    setContent(fresh);
    setOffer(editable ? localOffer(revision, sheetType) : null);
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
      const unconfirmed = cur.unconfirmed?.includes(key)
        ? cur.unconfirmed.filter((k) => k !== key)
        : cur.unconfirmed;
      apply({ ...cur, inputs: { ...cur.inputs, [key]: value }, unconfirmed });
    },
    [apply],
  );

  /** Marks example or copied values as checked by the engineer without changing them. */
  const confirm = useCallback(
    (keys: string[]) => {
      const cur = contentRef.current;
      if (!cur.unconfirmed?.some((k) => keys.includes(k))) return;
      apply({ ...cur, unconfirmed: cur.unconfirmed.filter((k) => !keys.includes(k)) });
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
    const theirs = await takeTheirsSaved();
    const fresh = fromRevision(theirs, sheetType);
    contentRef.current = fresh;
    setContent(fresh);
  }, [takeTheirsSaved, sheetType]);

  /** Puts the edits kept on this device back into the editor (and saves them). */
  const restoreLocal = useCallback(() => {
    if (!offer) return;
    setOffer(null);
    apply({ ...offer.draft.content, unconfirmed: offer.draft.content.unconfirmed });
  }, [offer, apply]);

  const discardLocal = useCallback(() => {
    clearLocalDraft(revision.id);
    setOffer(null);
  }, [revision.id]);

  return {
    content,
    setInput,
    confirm,
    setChangeNote,
    setUnitSystem,
    autosave,
    takeTheirs,
    editable,
    invalidKeys,
    offer,
    restoreLocal,
    discardLocal,
  };
}

function localOffer(revision: Revision, type: SheetTypeDefinition): LocalOffer | null {
  const draft = readLocalDraft(revision.id);
  if (!draft) return null;
  const changed = changedKeys(draft.content, fromRevision(revision, type));
  if (changed.length === 0) {
    clearLocalDraft(revision.id);
    return null;
  }
  return { draft, changed, stale: draft.baseRowVersion !== revision.rowVersion };
}

function fromRevision(revision: Revision, type: SheetTypeDefinition): DraftContent {
  return {
    inputs: withMissingFields(type, revision.inputs),
    unitSystem: revision.unitSystem,
    changeNote: revision.changeNote,
    unconfirmed: revision.unconfirmed ?? [],
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
