import Head from 'expo-router/head';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { ScrollView, StyleSheet, TextInput, useWindowDimensions, View } from 'react-native';
import type { DraftDetail } from '@shared/api/procedure-types';
import { addCheck, deleteCheck, replaceCheck, setStart } from '@shared/editor/document-edits';
import { type Direction, neighbour } from '@shared/editor/neighbours';
import { CHECK_KINDS } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FormError } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/loading-state';
import { Heading, Text } from '@/components/ui/text';
import { CheckFormPanel } from '@/features/procedures/components/check-form-panel';
import { CheckList } from '@/features/procedures/components/check-list';
import { OutcomesEditor } from '@/features/procedures/components/outcomes-editor';
import { PreviewPanel } from '@/features/procedures/components/preview-panel';
import { ProblemsPanel } from '@/features/procedures/components/problems-panel';
import { ProcedureDiagram } from '@/features/procedures/components/procedure-diagram';
import { VersionCompareLoader, type VersionPick } from '@/features/procedures/components/version-compare';
import { VersionsPanel } from '@/features/procedures/components/versions-panel';
import { useDraftEditor } from '@/features/procedures/use-draft-editor';
import { keyOf } from '@/features/procedures/editor-keys';
import { useShortcutKeys } from '@/lib/use-shortcut-keys';
import { useDraft, useProcedure } from '@/hooks/use-procedures';
import { api, ApiError } from '@/lib/api';
import { radius, space, type, useBreakpoints, useTheme } from '@/lib/theme';

type SidePanel = 'checks' | 'check' | 'preview' | 'versions';
const SIDE_PANELS: { key: Exclude<SidePanel, 'checks'>; label: string }[] = [
  { key: 'check', label: 'Check' },
  { key: 'preview', label: 'Preview' },
  { key: 'versions', label: 'Versions' },
];
type Comparison = { before: VersionPick; after: VersionPick };

export function EditorScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const procedure = useProcedure(id);
  const draft = useDraft(id);
  const colors = useTheme();
  const title = procedure.data?.procedure.title ?? 'Procedure';
  const noDraft = draft.error instanceof ApiError && draft.error.status === 404 && draft.error.code === 'no_draft';
  return (
    <View style={[styles.screen, { backgroundColor: colors.background }]} testID="editor-screen">
      <Head>
        <title>{`${title} · Probepath`}</title>
      </Head>
      {procedure.error ? (
        <ErrorState title="Couldn't open the procedure" error={procedure.error} onRetry={() => void procedure.mutate()} />
      ) : noDraft && procedure.data ? (
        <NoDraft
          procedureId={id}
          title={title}
          latest={procedure.data.procedure.latestVersion?.number ?? null}
          onBack={() => router.navigate('/procedures')}
          onDraftStarted={() => void draft.mutate()}
        />
      ) : draft.error ? (
        <ErrorState title="Couldn't open the draft" error={draft.error} onRetry={() => void draft.mutate()} />
      ) : !draft.data || !procedure.data ? (
        <LoadingState label="Opening the draft…" />
      ) : (
        <Editor key={draft.data.draft.revision} procedureId={id} title={title} loaded={draft.data.draft} onCopied={(copyId) => router.replace(`/procedures/${copyId}`)} onBack={() => router.navigate('/procedures')} onDraftStarted={() => void draft.mutate()} />
      )}
    </View>
  );
}

/** A procedure without a draft: its versions, from any of which a new draft can start. */
function NoDraft({ procedureId, title, latest, onBack, onDraftStarted }: { procedureId: string; title: string; latest: number | null; onBack: () => void; onDraftStarted: () => void }) {
  const colors = useTheme();
  const [comparing, setComparing] = useState<Comparison | null>(null);
  const [error, setError] = useState<string | null>(null);
  return (
    <View style={styles.editor} testID="no-draft-screen">
      <View style={[styles.header, { borderBottomColor: colors.border, backgroundColor: colors.surface }]}>
        <Button testID="editor-back" label="Procedures" icon="back" variant="quiet" onPress={onBack} />
        <View style={styles.titles}>
          <Heading>{title}</Heading>
          <Text variant="small" tone="textMuted">
            No draft
          </Text>
        </View>
      </View>
      {comparing ? (
        <VersionCompareLoader procedureId={procedureId} before={comparing.before} after={comparing.after} draft={null} onClose={() => setComparing(null)} />
      ) : (
        <View style={styles.columns}>
          <ScrollView style={styles.middle} contentContainerStyle={styles.pad}>
            <FormError message={error} />
            <EmptyState
              testID="no-draft"
              icon="procedures"
              title="No draft to edit"
              body={`${title} has no draft. Start one from a version; the published versions stay as they are.`}
              action={
                latest
                  ? {
                      label: `New draft from version ${latest}`,
                      testID: 'new-draft',
                      onPress: async () => {
                        try {
                          await api(`/api/procedures/${procedureId}/draft`, 'POST', { fromVersion: latest });
                          onDraftStarted();
                        } catch (e) {
                          setError(e instanceof Error ? e.message : 'The draft could not be started. Try again.');
                        }
                      },
                    }
                  : undefined
              }
            />
          </ScrollView>
          <ScrollView style={[styles.right, { borderLeftColor: colors.border }]} contentContainerStyle={styles.pad}>
            <VersionsPanel procedureId={procedureId} onDraftStarted={onDraftStarted} onCompare={(before, after) => setComparing({ before, after })} />
          </ScrollView>
        </View>
      )}
    </View>
  );
}

function Editor({ procedureId, title, loaded, onCopied, onBack, onDraftStarted }: { procedureId: string; title: string; loaded: DraftDetail; onCopied: (id: string) => void; onBack: () => void; onDraftStarted: () => void }) {
  const colors = useTheme();
  const { isDesk, width } = useBreakpoints();
  const { height } = useWindowDimensions();
  const editor = useDraftEditor(procedureId, loaded);
  const { document, problems } = editor;
  const [selectedId, select] = useState<string | null>(document.startCheckId);
  const setSelectedId = (id: string | null) => {
    select(id);
    setConfirmDelete(false);
  };
  const [note, setNote] = useState('');
  const [publishing, setPublishing] = useState(false);
  const [message, setMessage] = useState<{ tone: 'error' | 'done'; text: string } | null>(null);
  const [panel, setPanel] = useState<SidePanel>('check');
  const [comparing, setComparing] = useState<Comparison | null>(null);
  const flagged = useMemo(() => new Set(problems.map((p) => p.checkId)), [problems]);
  const selected = document.checks.find((c) => c.id === selectedId) ?? null;
  const [confirmDelete, setConfirmDelete] = useState(false);
  const canDelete = selected !== null && document.checks.length > 1;
  const move = (direction: Direction) => {
    const next = selectedId ? neighbour(document, selectedId, direction) : document.startCheckId;
    if (next) setSelectedId(next);
  };
  const removeSelected = () => {
    if (!selected) return;
    editor.edit(deleteCheck(document, selected.id));
    setSelectedId(null);
    setConfirmDelete(false);
  };
  useShortcutKeys(keyOf, {
    undo: editor.undo,
    redo: editor.redo,
    up: () => move('up'),
    down: () => move('down'),
    left: () => move('left'),
    right: () => move('right'),
    delete: () => {
      if (!canDelete) return;
      setPanel('check');
      setConfirmDelete(true);
    },
  });

  const publish = async () => {
    setPublishing(true);
    setMessage(null);
    try {
      const result = await api<{ version: number }>(`/api/procedures/${procedureId}/draft/publish`, 'POST', { revision: editor.revision, note: note.trim() });
      setMessage({ tone: 'done', text: `Published as version ${result.version}. Technicians can start it now.` });
      onBack();
    } catch (error) {
      setMessage({ tone: 'error', text: error instanceof Error ? error.message : 'Publishing failed. Try again.' });
    } finally {
      setPublishing(false);
    }
  };
  const keepCopy = async () => {
    try {
      const { procedure } = await api<{ procedure: { id: string } }>(`/api/procedures/${procedureId}/copy`, 'POST', { document });
      onCopied(procedure.id);
    } catch (error) {
      setMessage({ tone: 'error', text: error instanceof Error ? error.message : 'The copy could not be made. Try again.' });
    }
  };

  // A desk has the check list, the diagram and the side panel side by side. A tablet sideways keeps the diagram
  // beside one panel and moves the check list into a tab of it; upright, that panel goes under the diagram.
  const arrangement = isDesk ? 'desk' : width > height ? 'beside' : 'stacked';
  const sidePanels = isDesk ? SIDE_PANELS : [{ key: 'checks' as const, label: 'Checks' }, ...SIDE_PANELS];
  const shownPanel = panel === 'checks' && isDesk ? 'check' : panel;
  // Away from a desk the list shares the panel with the form, so picking a check opens its form.
  const pick = (id: string) => {
    setSelectedId(id);
    if (!isDesk) setPanel('check');
  };
  const checksPanel = (
    <>
      <View style={styles.addRow}>
        {CHECK_KINDS.map((k) => (
          <Button key={k} testID={`add-${k}`} label={k} icon="plus" style={styles.addKind} onPress={() => {
            const added = addCheck(document, k);
            editor.edit(added.document);
            pick(added.id);
          }} />
        ))}
      </View>
      <ProblemsPanel problems={problems} onSelect={pick} />
      <CheckList document={document} selectedId={selectedId} flagged={flagged} onSelect={pick} />
    </>
  );

  const saveWords = { saved: 'All changes saved', pending: 'Unsaved changes…', saving: 'Saving…', conflict: 'Not saved: conflict', failed: 'Not saved' }[editor.save.kind];
  const canPublish = problems.length === 0 && editor.isSaved && note.trim().length > 0;

  return (
    <View style={styles.editor}>
      <View style={[styles.header, { borderBottomColor: colors.border, backgroundColor: colors.surface }]}>
        <Button testID="editor-back" label="Procedures" icon="back" variant="quiet" onPress={onBack} />
        <View style={styles.titles}>
          <Heading>{title}</Heading>
          <Text variant="small" tone="textMuted" testID="save-state">
            {`Draft, revision ${editor.revision} · ${saveWords}`}
          </Text>
        </View>
        <Button testID="undo" label="Undo" disabled={!editor.canUndo} onPress={editor.undo} />
        <Button testID="redo" label="Redo" disabled={!editor.canRedo} onPress={editor.redo} />
        <TextInput
          testID="publish-note"
          aria-label="Change note for this version"
          placeholder="What changed in this version?"
          placeholderTextColor={colors.textMuted}
          value={note}
          onChangeText={setNote}
          style={[styles.note, type.body, { color: colors.text, borderColor: colors.borderStrong, backgroundColor: colors.surface }]}
        />
        <Button
          testID="publish"
          variant="primary"
          label="Publish"
          ariaLabel={problems.length ? `Publish (fix ${problems.length} problems first)` : 'Publish'}
          disabled={!canPublish}
          loading={publishing}
          onPress={() => void publish()}
        />
      </View>
      {editor.save.kind === 'conflict' ? (
        <View style={[styles.banner, { backgroundColor: colors.warningSoft }]} role="alert" testID="conflict">
          <Text style={styles.grow}>{`${editor.save.message} Your changes are still here and were not saved.`}</Text>
          <Button testID="conflict-reload" label="Reload theirs" onPress={() => void editor.reload()} />
          <Button testID="conflict-copy" label="Keep mine as a copy" variant="primary" onPress={() => void keepCopy()} />
        </View>
      ) : editor.save.kind === 'failed' ? (
        <View style={[styles.banner, { backgroundColor: colors.dangerSoft }]} role="alert" testID="save-failed">
          <Text style={styles.grow}>{`${editor.save.message} Your changes are kept on this screen.`}</Text>
          <Button testID="save-retry" label="Try saving again" onPress={editor.retry} />
        </View>
      ) : null}
      {confirmDelete && selected ? (
        <View style={[styles.banner, { backgroundColor: colors.dangerSoft }]} role="alert" testID="confirm-delete">
          <Text style={styles.grow}>{`Delete “${selected.title}”? Outcomes that lead to it will be flagged until you re-point them; Undo brings it back.`}</Text>
          <Button testID="confirm-delete-yes" variant="danger" label="Delete check" onPress={removeSelected} />
          <Button testID="confirm-delete-no" label="Keep it" onPress={() => setConfirmDelete(false)} />
        </View>
      ) : null}
      {message ? <View style={styles.message}>{message.tone === 'error' ? <FormError message={message.text} /> : <Text tone="success">{message.text}</Text>}</View> : null}
      {comparing ? (
        <VersionCompareLoader procedureId={procedureId} before={comparing.before} after={comparing.after} draft={document} onClose={() => setComparing(null)} />
      ) : (
      <View style={[styles.columns, arrangement === 'stacked' && styles.stacked]}>
        {arrangement === 'desk' ? (
          <ScrollView style={[styles.left, { borderRightColor: colors.border }]} contentContainerStyle={styles.pad}>
            {checksPanel}
          </ScrollView>
        ) : null}
        <View style={styles.middle}>
          <ProcedureDiagram document={document} selectedId={selectedId} flagged={flagged} onSelect={setSelectedId} shortcuts />
        </View>
        <ScrollView
          style={arrangement === 'stacked' ? [styles.below, { borderTopColor: colors.border }] : [styles.right, arrangement === 'beside' && styles.rightNarrow, { borderLeftColor: colors.border }]}
          contentContainerStyle={styles.pad}
        >
          <View style={styles.tabs} role="group" aria-label="Side panel">
            {sidePanels.map((p) => (
              <Button key={p.key} testID={`panel-${p.key}`} label={p.label} selected={shownPanel === p.key} onPress={() => setPanel(p.key)} style={styles.tab} />
            ))}
          </View>
          {shownPanel === 'checks' ? (
            checksPanel
          ) : shownPanel === 'preview' ? (
            <PreviewPanel document={document} onShowCheck={setSelectedId} />
          ) : shownPanel === 'versions' ? (
            <VersionsPanel procedureId={procedureId} onDraftStarted={onDraftStarted} onCompare={(before, after) => setComparing({ before, after })} />
          ) : selected ? (
            <>
              <CheckFormPanel key={`${selected.id}:${editor.epoch}`} procedureId={procedureId} check={selected} document={document} onChange={(next, group) => editor.edit(replaceCheck(document, selected.id, next), group)} />
              <OutcomesEditor check={selected} document={document} onEdit={(next) => editor.edit(next)} onSelect={setSelectedId} />
              <View style={styles.addRow}>
                {selected.id !== document.startCheckId ? <Button testID="make-start" label="Make this the start" onPress={() => editor.edit(setStart(document, selected.id))} /> : null}
                <Button testID="delete-check" variant="danger" label="Delete check" disabled={!canDelete} onPress={() => setConfirmDelete(true)} />
              </View>
            </>
          ) : (
            <Text tone="textMuted">Select a check in the list or the diagram to edit it.</Text>
          )}
        </ScrollView>
      </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  screen: { flex: 1 },
  editor: { flex: 1 },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.sm, borderBottomWidth: 1 },
  titles: { flex: 1, minWidth: 200 },
  note: { minHeight: 48, minWidth: 260, borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md },
  banner: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, padding: space.md },
  message: { padding: space.md },
  grow: { flex: 1, minWidth: 240 },
  columns: { flex: 1, flexDirection: 'row' },
  left: { width: 280, flexGrow: 0, borderRightWidth: 1 },
  middle: { flex: 1, padding: space.md },
  right: { width: 400, flexGrow: 0, borderLeftWidth: 1 },
  rightNarrow: { width: 360 },
  stacked: { flexDirection: 'column' },
  below: { flex: 1.1, borderTopWidth: 1 },
  pad: { padding: space.md, gap: space.lg },
  addRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  addKind: { flexBasis: '46%', flexGrow: 1, paddingHorizontal: space.sm },
  tabs: { flexDirection: 'row', gap: space.xs },
  tab: { flex: 1, paddingHorizontal: space.sm },
});
