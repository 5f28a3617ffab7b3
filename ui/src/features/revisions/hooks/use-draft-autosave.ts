import { useCallback, useEffect, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { Revision, SaveRevisionInput } from '@holdfast/shared';
import { isApiRequestError } from '../../../lib/api-client';
import { getRevision } from '../api/get-revision';
import { revisionKeys } from '../api/revision-keys';
import { saveRevision } from '../api/save-revision';

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'error' | 'conflict';

export type DraftContent = Pick<SaveRevisionInput, 'inputs' | 'unitSystem' | 'changeNote'>;

export interface DraftAutosave {
  status: SaveStatus;
  lastSavedAt: Date | null;
  /** Server field errors of the last save, keyed by input key ('inputs.x' → 'x'). */
  serverErrors: Record<string, string>;
  errorMessage: string | null;
  /** Marks the content changed; a save follows after the pause. */
  touch: (content: DraftContent) => void;
  /** Saves now if anything is unsaved; resolves to the saved revision (or the current one). */
  flush: () => Promise<Revision | null>;
  /** After a 409: take the other person's version (returns it) or save mine over it. */
  takeTheirs: () => Promise<Revision>;
  keepMine: () => Promise<void>;
}

const PAUSE_MS = 800;

/**
 * Debounced autosave of a draft with optimistic concurrency: every PUT carries the row version it
 * was based on. A 409 stops autosaving until the user decides how to resolve the conflict.
 */
export function useDraftAutosave(revision: Revision, enabled: boolean): DraftAutosave {
  const queryClient = useQueryClient();
  const id = revision.id;
  const rowVersion = useRef(revision.rowVersion);
  const pending = useRef<DraftContent | null>(null);
  const inFlight = useRef<Promise<Revision | null> | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const [status, setStatus] = useState<SaveStatus>('saved');
  const statusRef = useRef<SaveStatus>('saved');
  const [lastSavedAt, setLastSavedAt] = useState<Date | null>(null);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const [errorMessage, setErrorMessage] = useState<string | null>(null);

  const setBoth = (s: SaveStatus) => {
    statusRef.current = s;
    setStatus(s);
  };

  useEffect(() => {
    rowVersion.current = revision.rowVersion;
  }, [id]); // eslint-disable-line react-hooks/exhaustive-deps

  const saveNow = useCallback(async (): Promise<Revision | null> => {
    if (inFlight.current) await inFlight.current;
    const content = pending.current;
    if (!content || statusRef.current === 'conflict') return null;
    pending.current = null;
    setBoth('saving');
    const run = (async () => {
      try {
        const saved = await saveRevision(id, { ...content, rowVersion: rowVersion.current });
        rowVersion.current = saved.rowVersion;
        queryClient.setQueryData(revisionKeys.detail(id), saved);
        setServerErrors({});
        setErrorMessage(null);
        setLastSavedAt(new Date());
        setBoth(pending.current ? 'unsaved' : 'saved');
        return saved;
      } catch (error) {
        // Put the content back so nothing typed is lost, whatever went wrong.
        pending.current ??= content;
        if (isApiRequestError(error) && error.status === 409) {
          setBoth('conflict');
        } else {
          if (isApiRequestError(error) && error.fields.length > 0) {
            const map: Record<string, string> = {};
            for (const f of error.fields)
              map[f.path.replace(/^inputs\./, '').split('.')[0]!] ??= f.message;
            setServerErrors(map);
          }
          setErrorMessage(error instanceof Error ? error.message : 'The draft could not be saved.');
          setBoth('error');
        }
        return null;
      } finally {
        inFlight.current = null;
      }
    })();
    inFlight.current = run;
    return run;
  }, [id, queryClient]);

  const touch = useCallback(
    (content: DraftContent) => {
      if (!enabled) return;
      pending.current = content;
      if (statusRef.current !== 'conflict') setBoth('unsaved');
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => void saveNow(), PAUSE_MS);
    },
    [enabled, saveNow],
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
    const theirs = await getRevision(id);
    rowVersion.current = theirs.rowVersion;
    queryClient.setQueryData(revisionKeys.detail(id), theirs);
    setBoth('saved');
    return theirs;
  }, [id, queryClient]);

  const keepMine = useCallback(async () => {
    const theirs = await getRevision(id);
    rowVersion.current = theirs.rowVersion;
    setBoth('unsaved');
    await saveNow();
  }, [id, saveNow]);

  // Save what is pending when the editor closes.
  useEffect(
    () => () => {
      if (timer.current) clearTimeout(timer.current);
      if (pending.current && statusRef.current !== 'conflict') void saveNow();
    },
    [saveNow],
  );

  return { status, lastSavedAt, serverErrors, errorMessage, touch, flush, takeTheirs, keepMine };
}
