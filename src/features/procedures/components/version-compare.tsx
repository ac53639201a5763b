import { type ReactNode, useMemo, useState } from 'react';
import { type LayoutChangeEvent, ScrollView, StyleSheet, View } from 'react-native';
import { diffVersions, isUnchanged, type FieldChange, type VersionDiff } from '@shared/editor/version-diff';
import { bestArrangement } from '@shared/editor/viewport';
import type { ProcedureDocument } from '@shared/engine/procedure';
import { Badge } from '@/components/ui/badge';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Button } from '@/components/ui/button';
import { Heading, Text } from '@/components/ui/text';
import { type DiagramMark, ProcedureDiagram } from '@/features/procedures/components/procedure-diagram';
import { useProcedureVersion } from '@/hooks/use-procedures';
import { layoutProcedure } from '@/lib/procedure-layout';
import { radius, space, useTheme } from '@/lib/theme';

export interface ComparedVersion {
  /** "Version 2" or "Draft". */
  name: string;
  document: ProcedureDocument;
}

/** A published or retired version by number, or the draft being edited. */
export type VersionPick = number | 'draft';

export const versionName = (pick: VersionPick) => (pick === 'draft' ? 'Draft' : `Version ${pick}`);

/** Loads the two versions picked (the draft comes from the editor as it is now) and compares them. */
export function VersionCompareLoader({ procedureId, before, after, draft, onClose }: { procedureId: string; before: VersionPick; after: VersionPick; draft: ProcedureDocument | null; onClose: () => void }) {
  const a = useProcedureVersion(procedureId, before === 'draft' ? null : before);
  const b = useProcedureVersion(procedureId, after === 'draft' ? null : after);
  const docOf = (pick: VersionPick, loaded: typeof a) => (pick === 'draft' ? draft : (loaded.data?.version.document ?? null));
  const error = a.error ?? b.error;
  if (error) return <ErrorState title="Couldn't open the versions to compare" error={error} onRetry={() => void Promise.all([a.mutate(), b.mutate()])} />;
  const first = docOf(before, a);
  const second = docOf(after, b);
  if (!first || !second) return <LoadingState label="Opening the versions…" />;
  return <VersionCompare before={{ name: versionName(before), document: first }} after={{ name: versionName(after), document: second }} onClose={onClose} />;
}

const NO_FLAGS: ReadonlySet<string> = new Set();
const PANE_GAP = space.md;
/** A pane's heading and zoom tools above its drawing. */
const PANE_CHROME = 64;

/**
 * Two versions side by side: each diagram marks what differs (removed and changed on the earlier one, new
 * and changed on the later one), and the list beside them says what changed, field by field.
 */
export function VersionCompare({ before, after, onClose }: { before: ComparedVersion; after: ComparedVersion; onClose: () => void }) {
  const colors = useTheme();
  const diff = useMemo(() => diffVersions(before.document, after.document), [before.document, after.document]);
  const marks = useMemo(() => marksOf(diff), [diff]);
  const [area, setArea] = useState({ width: 0, height: 0 });
  const arrangement = useMemo(
    () => (area.width ? bestArrangement([layoutProcedure(before.document), layoutProcedure(after.document)], area, PANE_GAP, PANE_CHROME) : 'row'),
    [area, before.document, after.document],
  );
  // The measured box includes its padding on each side.
  const onLayout = (e: LayoutChangeEvent) => setArea({ width: e.nativeEvent.layout.width - 2 * space.md, height: e.nativeEvent.layout.height - 2 * space.md });
  return (
    <View style={styles.wrap} testID="version-compare">
      <View style={[styles.head, { borderBottomColor: colors.border }]}>
        <Heading level={2} style={styles.grow}>{`${before.name} → ${after.name}`}</Heading>
        <Button testID="compare-close" label="Close comparison" onPress={onClose} />
      </View>
      <View style={styles.body}>
        <View style={[styles.diagrams, arrangement === 'column' && styles.stacked]} onLayout={onLayout} testID={`compare-diagrams-${arrangement}`}>
          <View style={styles.side}>
            <ProcedureDiagram testID="compare-before" label={before.name} heading={before.name} document={before.document} selectedId={null} flagged={NO_FLAGS} marks={marks.before} />
          </View>
          <View style={styles.side}>
            <ProcedureDiagram testID="compare-after" label={after.name} heading={after.name} document={after.document} selectedId={null} flagged={NO_FLAGS} marks={marks.after} />
          </View>
        </View>
        <ScrollView style={[styles.list, { borderLeftColor: colors.border }]} contentContainerStyle={styles.listPad} testID="compare-changes">
          {isUnchanged(diff) ? <Text testID="compare-unchanged">The two versions are the same.</Text> : <Changes diff={diff} before={before.document} after={after.document} />}
        </ScrollView>
      </View>
    </View>
  );
}

/** Checks whose own content changed, or whose outcomes now lead elsewhere, count as changed on both diagrams. */
function marksOf(diff: VersionDiff): { before: Map<string, DiagramMark>; after: Map<string, DiagramMark> } {
  const changed = new Set([...diff.changed.map((c) => c.id), ...diff.repointed.map((r) => r.checkId)]);
  const before = new Map<string, DiagramMark>(diff.removed.map((c) => [c.id, 'removed']));
  const after = new Map<string, DiagramMark>(diff.added.map((c) => [c.id, 'added']));
  for (const id of changed) {
    before.set(id, 'changed');
    after.set(id, 'changed');
  }
  return { before, after };
}

function Changes({ diff, before, after }: { diff: VersionDiff; before: ProcedureDocument; after: ProcedureDocument }) {
  const titleIn = (doc: ProcedureDocument, id: string | null) => (id === null ? 'nothing' : (doc.checks.find((c) => c.id === id)?.title ?? `“${id}”`));
  return (
    <View style={styles.sections}>
      <Section title="Added" count={diff.added.length} testID="compare-added">
        {diff.added.map((c) => (
          <Text key={c.id}>{`${c.title} (${c.kind} · ${c.id})`}</Text>
        ))}
      </Section>
      <Section title="Removed" count={diff.removed.length} testID="compare-removed">
        {diff.removed.map((c) => (
          <Text key={c.id}>{`${c.title} (${c.kind} · ${c.id})`}</Text>
        ))}
      </Section>
      <Section title="Changed" count={diff.changed.length} testID="compare-changed">
        {diff.changed.map((c) => (
          <View key={c.id} style={styles.changed} testID={`compare-changed-${c.id}`}>
            <Text variant="bodyStrong">{c.title}</Text>
            <FieldTable fields={c.fields} />
          </View>
        ))}
      </Section>
      <Section title="Outcomes re-pointed" count={diff.repointed.length} testID="compare-repointed">
        {diff.repointed.map((r) => (
          <Text key={`${r.checkId}:${r.outcome}`}>
            <Text variant="bodyStrong">{`${titleIn(after, r.checkId)}, ${r.outcome}: `}</Text>
            {`${titleIn(before, r.before)} → ${titleIn(after, r.after)}`}
          </Text>
        ))}
      </Section>
      {diff.procedure.length ? (
        <Section title="Whole procedure" count={diff.procedure.length} testID="compare-procedure">
          <FieldTable fields={diff.procedure} />
        </Section>
      ) : null}
    </View>
  );
}

function Section({ title, count, testID, children }: { title: string; count: number; testID: string; children: ReactNode }) {
  if (!count) return null;
  return (
    <View style={styles.section} testID={testID}>
      <View style={styles.sectionHead}>
        <Heading level={3} variant="bodyStrong">
          {title}
        </Heading>
        <Badge label={String(count)} tone="neutral" />
      </View>
      {children}
    </View>
  );
}

/** Field, before and after in three columns, so the two versions read side by side. */
function FieldTable({ fields }: { fields: FieldChange[] }) {
  const colors = useTheme();
  return (
    <View style={[styles.table, { borderColor: colors.border }]} role="table">
      <View style={[styles.tr, { backgroundColor: colors.surfaceSunken }]} role="row">
        {['Field', 'Before', 'After'].map((h) => (
          <Text key={h} variant="label" tone="textMuted" style={styles.td} role="columnheader">
            {h}
          </Text>
        ))}
      </View>
      {fields.map((f) => (
        <View key={f.field} style={[styles.tr, { borderTopColor: colors.border }, styles.rowLine]} role="row">
          <Text variant="small" style={styles.td} role="cell">
            {f.field}
          </Text>
          <Text variant="small" tone={f.before === null ? 'textMuted' : 'text'} style={styles.td} role="cell">
            {f.before ?? '(none)'}
          </Text>
          <Text variant="small" tone={f.after === null ? 'textMuted' : 'text'} style={styles.td} role="cell">
            {f.after ?? '(none)'}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flex: 1 },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.sm, borderBottomWidth: 1 },
  grow: { flex: 1 },
  body: { flex: 1, flexDirection: 'row' },
  diagrams: { flex: 1, flexDirection: 'row', gap: PANE_GAP, padding: space.md },
  stacked: { flexDirection: 'column' },
  side: { flex: 1 },
  list: { width: 380, flexGrow: 0, borderLeftWidth: 1 },
  listPad: { padding: space.md },
  sections: { gap: space.lg },
  section: { gap: space.sm },
  sectionHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  changed: { gap: space.xs },
  table: { borderWidth: 1, borderRadius: radius.sm, overflow: 'hidden' },
  tr: { flexDirection: 'row' },
  rowLine: { borderTopWidth: 1 },
  td: { flex: 1, padding: space.xs, flexShrink: 1 },
});
