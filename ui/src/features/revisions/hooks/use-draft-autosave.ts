import { useCallback, useEffect, useRef, useState, type RefObject } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { InputValue } from '@holdfast/calc';
import type { Revision, SaveRevisionInput } from '@holdfast/shared';
import { isApiRequestError } from '../../../lib/api-client';
import { getRevision } from '../api/get-revision';
import { revisionKeys } from '../../../lib/query-keys';
import { saveRevision, saveRevisionOnLeave } from '../api/save-revision';
import { clearLocalDraft, writeLocalDraft } from '../utils/local-draft';

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'error' | 'conflict';

export type DraftContent = Pick<SaveRevisionInput, 'inputs' | 'unitSystem' | 'changeNote'> & {
  /** Fields still holding an example or copied value nobody has confirmed (sent when known). */
  unconfirmed?: string[];
};

export interface DraftAutosave {
  status: SaveStatus;
  lastSavedAt: Date | null;
  /** Server field errors of the last save, keyed by input key ('inputs.x' → 'x'). */
  serverErrors: Record<string, string>;
  errorMessage: string | null;
  /** Fields held back from the last save because they are not valid (their text stays here). */
  heldBack: string[];
  /** Marks the content changed; a save follows after the pause. */
  touch: (content: DraftContent) => void;
  /** Saves now if anything is unsaved; resolves to the saved revision (or the current one). */
  flush: () => Promise<Revision | null>;
  /** After a 409: take the other person's version (returns it) or save mine over it. */
  takeTheirs: () => Promise<Revision>;
  keepMine: () => Promise<void>;
}

/** Which fields of a content must not be sent yet (invalid text, out of range…). */
export type InvalidKeys = (content: DraftContent) => ReadonlySet<string>;

const PAUSE_MS = 500;
const LOCAL_PAUSE_MS = 150;

/**
 * What is sent: the content with each invalid field put back to its last saved value (blank when
 * it never had one), so one bad field never stops the others saving. The bad text itself stays in
 * the editor and in the copy on the device.
 */
export function saveableContent(
  content: DraftContent,
  invalid: ReadonlySet<string>,
  saved: Record<string, InputValue> | undefined,
): DraftContent {
  if (invalid.size === 0) return content;
  const inputs = { ...content.inputs };
  for (const key of invalid) inputs[key] = saved?.[key] ?? '';
  return { ...content, inputs };
}

/**
 * Autosave of a draft with optimistic concurrency: every PUT carries the row version it was based
 * on, and a 409 stops autosaving until the user decides. Saves run shortly after typing stops, on
 * flush (blur, send for check) and when the tab is hidden; a keepalive request carries the last
 * edits as the page goes away. Every edit is also kept on the device until the server has it.
 */
export function useDraftAutosave(
  revision: Revision,
  enabled: boolean,
  invalidKeys?: RefObject<InvalidKeys | null>,
): DraftAutosave {
  const queryClient = useQueryClient();
  const id = revision.id;
  const rowVersion = useRef(revision.rowVersion);
  const saved = useRef<Record<string, InputValue>>(revision.inputs);
  const pending = useRef<DraftContent | null>(null);
  /** The newest content typed, saved or not: what the device copy holds. */
  const latest = useRef<DraftContent | null>(null);
  const inFlight = useRef<Promise<Revision | null> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const localTimer = useRef<ReturnType<typeof setTimeout> | null>(null);
  /** Fields the server refused in the last save: held back until they change. */
  const refused = useRef(new Map<string, string>());
  const [status, setStatus] = useState<SaveStatus>('saved');
  const statusRef = useRef<SaveStatus>('saved');
  const [lastSavedAt, setLastSavedAt] = useState<Date | null>(null);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [errorMessage, setErrorMessage] = useState<string | null>(null);
  const [heldBack, setHeldBack] = useState<string[]>([]);

  const setBoth = (s: SaveStatus) => {
    statusRef.current = s;
    setStatus(s);
  };

  useEffect(() => {
    rowVersion.current = revision.rowVersion;
    saved.current = revision.inputs;
  }, [id]); // eslint-disable-line react-hooks/exhaustive-deps

  const keepOnDevice = useCallback(() => {
    if (localTimer.current) clearTimeout(localTimer.current);
    localTimer.current = null;
    if (latest.current)
      writeLocalDraft({
        revisionId: id,
        baseRowVersion: rowVersion.current,
        content: latest.current,
      });
  }, [id]);

  /** The request body for a content: invalid and server-refused fields held back. */
  const prepare = useCallback(
    (content: DraftContent) => {
      const invalid = new Set(invalidKeys?.current?.(content) ?? []);
      for (const [key, value] of refused.current) {
        if (JSON.stringify(content.inputs[key]) === value) invalid.add(key);
        else refused.current.delete(key);
      }
      return { body: saveableContent(content, invalid, saved.current), held: [...invalid] };
    },
    [invalidKeys],
  );

  const saveNow = useCallback(async (): Promise<Revision | null> => {
    if (inFlight.current) await inFlight.current;
    const content = pending.current;
    if (!content || statusRef.current === 'conflict') return null;
    pending.current = null;
    setBoth('saving');
    const run = (async (): Promise<Revision | null> => {
      for (let attempt = 0; attempt < 2; attempt++) {
        const { body, held } = prepare(content);
        try {
          const result = await saveRevision(id, { ...body, rowVersion: rowVersion.current });
          rowVersion.current = result.rowVersion;
          saved.current = result.inputs;
          queryClient.setQueryData(revisionKeys.detail(id), result);
          setServerErrors({});
          setErrorMessage(null);
          setHeldBack(held);
          setLastSavedAt(new Date());
          setBoth(pending.current ? 'unsaved' : 'saved');
          // The device copy may go once the server holds everything typed, as typed.
          if (!pending.current && held.length === 0 && latest.current === content)
            clearLocalDraft(id);
          else keepOnDevice();
          return result;
        } catch (error) {
          if (isApiRequestError(error) && error.status === 409) {
            pending.current ??= content;
            keepOnDevice();
            setBoth('conflict');
            return null;
          }
          const fields = isApiRequestError(error) ? error.fields : [];
          const map: Record<string, string> = {};
          for (const f of fields) map[f.path.replace(/^inputs\./, '').split('.')[0]!] ??= f.message;
          const fresh = Object.keys(map).filter((k) => k in content.inputs && !held.includes(k));
          if (attempt === 0 && fresh.length > 0) {
            // Hold back what the server refused and save the rest at once.
            for (const k of fresh) refused.current.set(k, JSON.stringify(content.inputs[k]));
            setServerErrors(map);
            continue;
          }
          pending.current ??= content;
          keepOnDevice();
          setServerErrors(map);
          setErrorMessage(error instanceof Error ? error.message : 'The draft could not be saved.');
          setBoth('error');
          return null;
        }
      }
      return null;
    })().finally(() => {
      inFlight.current = null;
    });
    inFlight.current = run;
    return run;
  }, [id, queryClient, prepare, keepOnDevice]);

  const touch = useCallback(
    (content: DraftContent) => {
      if (!enabled) return;
      pending.current = content;
      latest.current = content;
      if (statusRef.current !== 'conflict') setBoth('unsaved');
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void saveNow(), PAUSE_MS);
      localTimer.current ??= setTimeout(keepOnDevice, LOCAL_PAUSE_MS);
    },
    [enabled, saveNow, keepOnDevice],
  );

  const flush = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    if (inFlight.current) await inFlight.current;
    if (pending.current) return saveNow();
    return queryClient.getQueryData<Revision>(revisionKeys.detail(id)) ?? null;
  }, [id, queryClient, saveNow]);

  const takeTheirs = useCallback(async () => {
    if (timer.current) clearTimeout(timer.current);
    pending.current = null;
    latest.current = null;
    const theirs = await getRevision(id);
    rowVersion.current = theirs.rowVersion;
    saved.current = theirs.inputs;
    queryClient.setQueryData(revisionKeys.detail(id), theirs);
    clearLocalDraft(id);
    setBoth('saved');
    return theirs;
  }, [id, queryClient]);

  const keepMine = useCallback(async () => {
    const theirs = await getRevision(id);
    rowVersion.current = theirs.rowVersion;
    saved.current = theirs.inputs;
    setBoth('unsaved');
    await saveNow();
  }, [id, saveNow]);

  // Tab hidden: save now. Page going away: keep the copy and send a keepalive save.
  useEffect(() => {
    if (!enabled) return;
    const onHide = () => {
      if (document.visibilityState === 'hidden' && pending.current) {
        keepOnDevice();
        void flush();
      }
    };
    const onLeave = () => {
      if (!pending.current || statusRef.current === 'conflict') return;
      keepOnDevice();
      const { body } = prepare(pending.current);
      saveRevisionOnLeave(id, { ...body, rowVersion: rowVersion.current });
    };
    document.addEventListener('visibilitychange', onHide);
    window.addEventListener('pagehide', onLeave);
    return () => {
      document.removeEventListener('visibilitychange', onHide);
      window.removeEventListener('pagehide', onLeave);
    };
  }, [enabled, id, flush, keepOnDevice, prepare]);

  // Save what is pending when the editor closes (navigation inside the app).
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      if (pending.current && statusRef.current !== 'conflict') {
        keepOnDevice();
        void saveNow();
      }
    },
    [saveNow, keepOnDevice],
  );

  return {
    status,
    lastSavedAt,
    serverErrors,
    errorMessage,
    heldBack,
    touch,
    flush,
    takeTheirs,
    keepMine,
  };
}
