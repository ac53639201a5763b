import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { FormError } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { type Column, Table } from '@/components/ui/table';
import { Text } from '@/components/ui/text';
import { CreateProcedureForm } from '@/features/procedures/components/create-procedure-form';
import { ExportButton } from '@/features/procedures/components/export-button';
import { ImportButton } from '@/features/procedures/components/import-button';
import { PlainField } from '@/features/procedures/components/search-field';
import { useImportProcedure, useProcedures } from '@/hooks/use-procedures';
import { ApiError } from '@/lib/api';
import { formatDateTime } from '@/lib/format';
import { space, useBreakpoints } from '@/lib/theme';

type SortKey = 'title' | 'edited' | 'runs';
const SORTS: { key: SortKey; label: string }[] = [
  { key: 'title', label: 'Title' },
  { key: 'edited', label: 'Last edited' },
  { key: 'runs', label: 'Times run' },
];

export function ProceduresScreen() {
  const router = useRouter();
  const { isDesk } = useBreakpoints();
  const procedures = useProcedures();
  const importer = useImportProcedure();
  const [query, setQuery] = useState('');
  const [sort, setSort] = useState<SortKey>('title');
  const [creating, setCreating] = useState(false);
  const [importError, setImportError] = useState<string | null>(null);
  const open = (id: string) => router.navigate(`/procedures/${id}`);

  const rows = useMemo(() => {
    const words = query.trim().toLowerCase().split(/\s+/).filter(Boolean);
    const list = (procedures.data?.procedures ?? []).filter((p) => {
      const text = `${p.title} ${p.complaint} ${p.family}`.toLowerCase();
      return words.every((w) => text.includes(w));
    });
    const by: Record<SortKey, (a: ProcedureSummary, b: ProcedureSummary) => number> = {
      title: (a, b) => a.title.localeCompare(b.title),
      edited: (a, b) => b.lastEditedAt.localeCompare(a.lastEditedAt),
      runs: (a, b) => b.timesRun - a.timesRun || a.title.localeCompare(b.title),
    };
    return [...list].sort(by[sort]);
  }, [procedures.data, query, sort]);

  const onFile = async (content: unknown) => {
    setImportError(null);
    if (content instanceof Error) return setImportError(content.message);
    try {
      const { procedure } = await importer.trigger(content);
      open(procedure.id);
    } catch (error) {
      setImportError(error instanceof ApiError ? error.message : 'The file could not be imported. Try again.');
    }
  };

  const columns: Column<ProcedureSummary>[] = [
    { title: 'Procedure', flex: 2.2, render: (p) => <TitleCell procedure={p} /> },
    { title: 'Family', flex: 1.4, render: (p) => <Text>{p.family}</Text> },
    { title: 'Version', flex: 1.3, render: (p) => <VersionBadges procedure={p} /> },
    { title: 'Last edited', flex: 1.4, render: (p) => <Edited procedure={p} /> },
    { title: 'Runs', flex: 0.6, render: (p) => <Text style={styles.number}>{p.timesRun}</Text> },
    {
      title: 'Actions',
      flex: 1.5,
      render: (p) => (
        <View style={styles.rowActions}>
          <Button testID={`open-${p.id}`} label="Open" ariaLabel={`Open ${p.title}`} onPress={() => open(p.id)} />
          <ExportButton procedureId={p.id} label="Export" ariaLabel={`Export ${p.title} as a file`} testID={`export-${p.id}`} />
        </View>
      ),
    },
  ];

  return (
    <Screen
      testID="procedures-screen"
      title="Procedures"
      subtitle="Check sequences, written once and followed at the bench."
      actions={
        <View style={styles.actions}>
          <ImportButton onFile={(c) => void onFile(c)} loading={importer.isMutating} />
          <Button testID="new-procedure" variant="primary" icon="plus" label="New procedure" onPress={() => setCreating(true)} />
        </View>
      }
    >
      <FormError testID="import-error" message={importError} />
      {creating ? (
        <Card>
          <CreateProcedureForm onCreated={open} onCancel={() => setCreating(false)} />
        </Card>
      ) : null}
      {procedures.error ? (
        <ErrorState title="Couldn't load the procedures" error={procedures.error} onRetry={() => void procedures.mutate()} />
      ) : !procedures.data ? (
        <LoadingState label="Loading procedures…" />
      ) : procedures.data.procedures.length === 0 ? (
        <EmptyState
          icon="procedures"
          title="No procedures yet"
          body="Procedures appear here: drafts being written, published versions ready for the bench, and retired ones kept for reference. Write one on a wide screen, or import a Probepath procedure file."
          action={creating ? undefined : { label: 'New procedure', onPress: () => setCreating(true), testID: 'empty-new-procedure' }}
        />
      ) : (
        <View style={styles.section}>
          <View style={[styles.tools, isDesk && styles.toolsDesk]}>
            <View style={styles.search}>
              <PlainField label="Search" value={query} onChange={setQuery} placeholder="Title, complaint or family" testID="procedure-search" />
            </View>
            <View style={styles.sorts} role="group" aria-label="Sort by">
              {SORTS.map((s) => (
                <Button key={s.key} testID={`sort-${s.key}`} label={s.label} selected={sort === s.key} onPress={() => setSort(s.key)} />
              ))}
            </View>
          </View>
          {rows.length === 0 ? (
            <Text tone="textMuted" testID="no-matches">
              No procedure matches “{query.trim()}”. Try fewer words.
            </Text>
          ) : isDesk ? (
            <Table label="Procedures" testID="procedures-table" columns={columns} rows={rows} rowKey={(p) => p.id} />
          ) : (
            <View style={styles.section} testID="procedure-cards">
              {rows.map((p) => (
                <Card key={p.id} testID={`procedure-card-${p.id}`}>
                  <TitleCell procedure={p} />
                  <Text tone="textMuted">{p.family}</Text>
                  <VersionBadges procedure={p} />
                  <Edited procedure={p} />
                  <Button testID={`open-${p.id}`} label="Open" ariaLabel={`Open ${p.title}`} onPress={() => open(p.id)} />
                </Card>
              ))}
            </View>
          )}
        </View>
      )}
    </Screen>
  );
}

function TitleCell({ procedure }: { procedure: ProcedureSummary }) {
  return (
    <View style={styles.cell}>
      <Text variant="bodyStrong">{procedure.title}</Text>
      <Text variant="small" tone="textMuted">
        {procedure.complaint}
      </Text>
    </View>
  );
}

function VersionBadges({ procedure }: { procedure: ProcedureSummary }) {
  const v = procedure.latestVersion;
  return (
    <View style={styles.badges}>
      {v ? (
        <Badge label={`v${v.number} ${v.status}`} tone={v.status === 'published' ? 'success' : 'neutral'} icon={v.status === 'published' ? 'check' : 'lock'} />
      ) : (
        <Badge label="Never published" tone="neutral" />
      )}
      {procedure.hasDraft ? <Badge label="Draft" tone="warning" icon="note" /> : null}
    </View>
  );
}

function Edited({ procedure }: { procedure: ProcedureSummary }) {
  return (
    <View style={styles.cell}>
      <Text variant="small">{formatDateTime(procedure.lastEditedAt)}</Text>
      {procedure.lastEditedBy ? (
        <Text variant="small" tone="textMuted">
          {procedure.lastEditedBy}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  section: { gap: space.lg },
  tools: { gap: space.md },
  toolsDesk: { flexDirection: 'row', alignItems: 'flex-end' },
  search: { flexGrow: 1, minWidth: 260 },
  sorts: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  cell: { gap: 2 },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  number: { fontVariant: ['tabular-nums'] },
  rowActions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
