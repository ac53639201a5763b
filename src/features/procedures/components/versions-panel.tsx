import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { VersionSummary } from '@shared/api/procedure-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { FormError } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/loading-state';
import { Heading, Text } from '@/components/ui/text';
import { ChipRow } from '@/features/procedures/components/chip-row';
import { ExportButton } from '@/features/procedures/components/export-button';
import { versionName, type VersionPick } from '@/features/procedures/components/version-compare';
import { useProcedure } from '@/hooks/use-procedures';
import { api } from '@/lib/api';
import { formatDateTime } from '@/lib/format';
import { radius, space, useTheme } from '@/lib/theme';

interface Props {
  procedureId: string;
  /** Called once a draft was started from a version, so the screen opens it. */
  onDraftStarted: () => void;
  onCompare: (before: VersionPick, after: VersionPick) => void;
}

const STATUS_BADGE = {
  draft: { tone: 'warning', icon: 'note' },
  published: { tone: 'success', icon: 'check' },
  retired: { tone: 'neutral', icon: 'lock' },
} as const;

/**
 * Every version of the procedure, newest first, with who published it and why; a new draft from any
 * version, retiring a published one (after a confirmation), and a comparison of any two.
 */
export function VersionsPanel({ procedureId, onDraftStarted, onCompare }: Props) {
  const procedure = useProcedure(procedureId);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<number | null>(null);
  // The draft first, then the newest number down.
  const versions = [...(procedure.data?.procedure.versions ?? [])].sort((a, b) => (b.number ?? Infinity) - (a.number ?? Infinity));
  const picks: VersionPick[] = versions.map((v) => v.number ?? 'draft');
  const [before, setBefore] = useState<VersionPick | null>(null);
  const [after, setAfter] = useState<VersionPick | null>(null);

  if (procedure.error) return <ErrorState title="Couldn't load the versions" error={procedure.error} onRetry={() => void procedure.mutate()} />;
  if (!procedure.data) return <LoadingState label="Loading the versions…" />;
  const hasDraft = versions.some((v) => v.status === 'draft');
  // By default the newest against the one before it.
  const shownAfter = after ?? picks[0] ?? null;
  const shownBefore = before ?? picks.find((p) => p !== shownAfter) ?? null;

  const run = async (key: string, action: () => Promise<unknown>) => {
    setBusy(key);
    setError(null);
    try {
      await action();
      await procedure.mutate();
    } catch (e) {
      setError(e instanceof Error ? e.message : 'That did not work. Try again.');
    } finally {
      setBusy(null);
    }
  };
  const startDraft = (number: number) =>
    run(`draft-${number}`, async () => {
      await api(`/api/procedures/${procedureId}/draft`, 'POST', { fromVersion: number });
      onDraftStarted();
    });
  const retire = (number: number) =>
    run(`retire-${number}`, async () => {
      await api(`/api/procedures/${procedureId}/versions/${number}/retire`, 'POST');
      setConfirming(null);
    });

  return (
    <View style={styles.panel} testID="versions-panel">
      <Heading level={2}>Versions</Heading>
      <FormError testID="versions-error" message={error} />
      {versions.map((v) => (
        <VersionRow
          key={v.number ?? 'draft'}
          procedureId={procedureId}
          version={v}
          hasDraft={hasDraft}
          busy={busy}
          confirming={confirming === v.number}
          onStartDraft={startDraft}
          onAskRetire={setConfirming}
          onRetire={retire}
        />
      ))}
      {picks.length >= 2 && shownBefore !== null && shownAfter !== null ? (
        <View style={styles.compare} testID="compare-picker">
          <Heading level={3} variant="bodyStrong">
            Compare two versions
          </Heading>
          <ChipRow label="From" testID="compare-from" value={String(shownBefore)} onChange={(v) => setBefore(v === 'draft' ? v : Number(v))} options={picks.map((p) => ({ value: String(p), label: versionName(p) }))} />
          <ChipRow label="To" testID="compare-to" value={String(shownAfter)} onChange={(v) => setAfter(v === 'draft' ? v : Number(v))} options={picks.map((p) => ({ value: String(p), label: versionName(p) }))} />
          <Button testID="compare-open" variant="primary" label="Show the comparison" disabled={shownBefore === shownAfter} onPress={() => onCompare(shownBefore, shownAfter)} />
          {shownBefore === shownAfter ? (
            <Text variant="small" tone="textMuted">
              Pick two different versions.
            </Text>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

interface RowProps {
  procedureId: string;
  version: VersionSummary;
  hasDraft: boolean;
  busy: string | null;
  confirming: boolean;
  onStartDraft: (number: number) => void;
  onAskRetire: (number: number | null) => void;
  onRetire: (number: number) => void;
}

function VersionRow({ procedureId, version: v, hasDraft, busy, confirming, onStartDraft, onAskRetire, onRetire }: RowProps) {
  const colors = useTheme();
  const badge = STATUS_BADGE[v.status];
  const name = v.number === null ? 'Draft' : `Version ${v.number}`;
  return (
    <View style={[styles.row, { borderColor: colors.border, backgroundColor: colors.surface }]} testID={`version-${v.number ?? 'draft'}`}>
      <View style={styles.rowHead}>
        <Text variant="bodyStrong" style={styles.grow}>
          {name}
        </Text>
        <Badge label={v.status} tone={badge.tone} icon={badge.icon} />
      </View>
      <Text variant="small" tone="textMuted">
        {v.publishedAt ? `Published ${formatDateTime(v.publishedAt)}${v.publishedBy ? ` by ${v.publishedBy}` : ''}` : `Revision ${v.revision}, saved ${formatDateTime(v.updatedAt)}`}
        {` · ${v.checkCount} checks`}
      </Text>
      {v.number !== null ? (
        <Text testID={`version-${v.number}-note`} tone={v.note ? 'text' : 'textMuted'}>
          {v.note ?? 'No change note.'}
        </Text>
      ) : null}
      {v.number !== null ? (
        <View style={styles.actions}>
          {hasDraft ? null : (
            <Button testID={`version-${v.number}-new-draft`} label="New draft from this" loading={busy === `draft-${v.number}`} onPress={() => onStartDraft(v.number!)} />
          )}
          <ExportButton procedureId={procedureId} version={v.number} label="Export" ariaLabel={`Export version ${v.number} as a file`} testID={`version-${v.number}-export`} />
          {v.status === 'published' && !confirming ? <Button testID={`version-${v.number}-retire`} label="Retire" onPress={() => onAskRetire(v.number)} /> : null}
        </View>
      ) : null}
      {confirming && v.number !== null ? (
        <View style={[styles.confirm, { backgroundColor: colors.warningSoft, borderLeftColor: colors.warning }]} role="alert" testID={`version-${v.number}-confirm`}>
          <Text>{`Retire version ${v.number}? No new diagnosis can start on it; diagnoses already running on it finish on it. It stays readable.`}</Text>
          <View style={styles.actions}>
            <Button testID={`version-${v.number}-retire-confirm`} variant="danger" label={`Retire version ${v.number}`} loading={busy === `retire-${v.number}`} onPress={() => onRetire(v.number!)} />
            <Button testID={`version-${v.number}-retire-cancel`} label="Keep it" onPress={() => onAskRetire(null)} />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: space.md },
  row: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  rowHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  grow: { flex: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs, marginTop: space.xs },
  confirm: { borderLeftWidth: 5, borderRadius: radius.sm, padding: space.sm, gap: space.sm },
  compare: { gap: space.sm },
});
