import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { DraftDetail } from '@shared/api/procedure-types';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { validateProcedure } from '@shared/engine/validate-procedure';
import { record, redo, startHistory, undo, type History } from '@shared/editor/history';
import { api, ApiError } from '@/lib/api';

const AUTOSAVE_MS = 700;

export type SaveState = { kind: 'saved' } | { kind: 'pending' } | { kind: 'saving' } | { kind: 'conflict'; message: string } | { kind: 'failed'; message: string };

/**
 * The draft being edited: its undo history, live validation, and autosave with the revision it was read at.
 * A save that finds a newer revision stops autosaving and reports a conflict; nothing is overwritten.
 */
export function useDraftEditor(procedureId: string, loaded: DraftDetail) {
  const [history, setHistory] = useState<History<ProcedureDocument>>(() => startHistory(loaded.document));
  /** Bumped whenever the document changes other than by typing in the form, so the form re-reads it. */
  const [epoch, setEpoch] = useState(0);
  const [revision, setRevision] = useState(loaded.revision);
  const [saved, setSaved] = useState<ProcedureDocument>(loaded.document);
  const [save, setSave] = useState<SaveState>({ kind: 'saved' });
  const inFlight = useRef(false);
  const document = history.present;
  const problems = useMemo(() => validateProcedure(document), [document]);

  const edit = useCallback((next: ProcedureDocument, group: string | null = null) => {
    setHistory((h) => record(h, next, group));
    setSave((s) => (s.kind === 'failed' ? { kind: 'pending' } : s));
    if (group === null) setEpoch((e) => e + 1);
  }, []);
  const step = useCallback((direction: 'undo' | 'redo') => {
    setHistory((h) => (direction === 'undo' ? undo(h) : redo(h)));
    setEpoch((e) => e + 1);
  }, []);

  useEffect(() => {
    if (document === saved) {
      // Undo then redo before the autosave fired: back where the server is, nothing to send.
      if (save.kind === 'pending') setSave({ kind: 'saved' });
      return;
    }
    if (save.kind === 'conflict' || save.kind === 'failed' || inFlight.current) return;
    setSave({ kind: 'pending' });
    const timer = setTimeout(async () => {
      inFlight.current = true;
      setSave({ kind: 'saving' });
      try {
        const result = await api<{ revision: number }>(`/api/procedures/${procedureId}/draft`, 'PUT', { revision, document });
        setRevision(result.revision);
        setSaved(document);
        setSave({ kind: 'saved' });
      } catch (error) {
        if (error instanceof ApiError && error.status === 409) setSave({ kind: 'conflict', message: error.message });
        else setSave({ kind: 'failed', message: error instanceof Error ? error.message : 'The draft could not be saved.' });
      } finally {
        inFlight.current = false;
      }
    }, AUTOSAVE_MS);
    return () => clearTimeout(timer);
  }, [document, saved, revision, save.kind, procedureId]);

  /** Replace everything with the draft as stored now (after a conflict: "Reload theirs"). */
  const reload = useCallback(async () => {
    const { draft } = await api<{ draft: DraftDetail }>(`/api/procedures/${procedureId}/draft`);
    setHistory(startHistory(draft.document));
    setSaved(draft.document);
    setRevision(draft.revision);
    setSave({ kind: 'saved' });
    setEpoch((e) => e + 1);
  }, [procedureId]);

  return {
    document,
    problems,
    revision,
    save,
    epoch,
    isSaved: document === saved && save.kind === 'saved',
    canUndo: history.past.length > 0,
    canRedo: history.future.length > 0,
    edit,
    undo: () => step('undo'),
    redo: () => step('redo'),
    reload,
    retry: () => setSave({ kind: 'pending' }),
  };
}
