import { useLocalSearchParams, useRouter } from 'expo-router';
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
import { SearchField } from '@/components/ui/search-field';
import { type Column, Table } from '@/components/ui/table';
import { Text } from '@/components/ui/text';
import { ChipRow } from '@/features/procedures/components/chip-row';
import { CreateProcedureForm } from '@/features/procedures/components/create-procedure-form';
import { ExportButton } from '@/features/procedures/components/export-button';
import { ImportButton } from '@/features/procedures/components/import-button';
import {
  applyFilters,
  blockingFilters,
  familyOptions,
  filterQuery,
  isFiltered,
  NO_FILTERS,
  type ProcedureFilters,
  readFilters,
  SORTS,
  VERSION_STATES,
} from '@/features/procedures/procedure-filters';
import { useDuplicateProcedure, useImportProcedure, useProcedures } from '@/hooks/use-procedures';
import { ApiError } from '@/lib/api';
import { formatDateTime } from '@/lib/format';
import { space, useBreakpoints } from '@/lib/theme';

export function ProceduresScreen() {
  const router = useRouter();
  const { isDesk } = useBreakpoints();
  const procedures = useProcedures();
  const importer = useImportProcedure();
  const duplicator = useDuplicateProcedure();
  const params = useLocalSearchParams<{ q?: string; family?: string; state?: string; sort?: string }>();
  const filters = readFilters(params);
  // The search box keeps its own text so typing never waits on the URL; the URL follows it.
  const [query, setQuery] = useState(filters.q);
  const shownFilters = { ...filters, q: query };
  const setFilters = (next: ProcedureFilters) => {
    setQuery(next.q);
    router.setParams(filterQuery(next));
  };
  const [creating, setCreating] = useState(false);
  const [actionError, setActionError] = useState<string | null>(null);
  const [duplicating, setDuplicating] = useState<string | null>(null);
  const open = (id: string) => router.navigate(`/procedures/${id}`);

  const all = procedures.data?.procedures;
  const rows = useMemo(() => applyFilters(all ?? [], shownFilters), [all, shownFilters.q, shownFilters.family, shownFilters.state, shownFilters.sort]);
  const families = useMemo(() => familyOptions(all ?? []), [all]);

  const onFile = async (content: unknown) => {
    setActionError(null);
    if (content instanceof Error) return setActionError(content.message);
    try {
      const { procedure } = await importer.trigger(content);
      open(procedure.id);
    } catch (error) {
      setActionError(error instanceof ApiError ? error.message : 'The file could not be imported. Try again.');
    }
  };

  const duplicate = async (p: ProcedureSummary) => {
    setActionError(null);
    setDuplicating(p.id);
    try {
      const { procedure } = await duplicator.trigger(p.id);
      open(procedure.id);
    } catch (error) {
      setActionError(error instanceof ApiError ? error.message : `${p.title} could not be duplicated. Try again.`);
    } finally {
      setDuplicating(null);
    }
  };

  const actions = (p: ProcedureSummary) => (
    <View style={styles.rowActions}>
      <Button testID={`open-${p.id}`} label="Open" ariaLabel={`Open ${p.title}`} onPress={() => open(p.id)} />
      <Button testID={`duplicate-${p.id}`} label="Duplicate" ariaLabel={`Duplicate ${p.title} as a new procedure`} loading={duplicating === p.id} onPress={() => void duplicate(p)} />
      <ExportButton procedureId={p.id} label="Export" ariaLabel={`Export ${p.title} as a file`} testID={`export-${p.id}`} />
    </View>
  );

  const columns: Column<ProcedureSummary>[] = [
    { title: 'Procedure', flex: 2.2, render: (p) => <TitleCell procedure={p} /> },
    { title: 'Family', flex: 1.4, render: (p) => <Text>{p.family}</Text> },
    { title: 'Version', flex: 1.2, render: (p) => <VersionBadges procedure={p} /> },
    { title: 'Last edited', flex: 1.3, render: (p) => <Edited procedure={p} /> },
    { title: 'Runs', flex: 0.5, render: (p) => <Text style={styles.number}>{p.timesRun}</Text> },
    { title: 'Actions', flex: 1.6, render: actions },
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
      <FormError testID="import-error" message={actionError} />
      {creating ? (
        <Card>
          <CreateProcedureForm onCreated={open} onCancel={() => setCreating(false)} />
        </Card>
      ) : null}
      {procedures.error ? (
        <ErrorState title="Couldn't load the procedures" error={procedures.error} onRetry={() => void procedures.mutate()} />
      ) : !all ? (
        <LoadingState label="Loading procedures…" />
      ) : all.length === 0 ? (
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
              <SearchField
                label="Search"
                value={query}
                onChange={(q) => setFilters({ ...filters, q })}
                onSubmit={() => rows.length === 1 && open(rows[0].id)}
                placeholder="Title, complaint or family"
                testID="procedure-search"
              />
            </View>
            <ChipRow label="Sort by" testID="sort" value={filters.sort} onChange={(sort) => setFilters({ ...shownFilters, sort })} options={SORTS.map((s) => ({ value: s.key, label: s.label }))} />
          </View>
          <View style={styles.tools}>
            <ChipRow
              label="Versions"
              testID="filter-state"
              value={filters.state ?? ''}
              onChange={(state) => setFilters({ ...shownFilters, state: state || null })}
              options={[{ value: '' as const, label: 'Any' }, ...VERSION_STATES]}
            />
            <ChipRow
              label="Machine family"
              testID="filter-family"
              value={filters.family ?? ''}
              onChange={(family) => setFilters({ ...shownFilters, family: family || null })}
              options={[{ value: '', label: 'Any' }, ...families.map((f) => ({ value: f.value, label: `${f.label} (${f.count})` }))]}
            />
          </View>
          <View style={styles.countRow}>
            <Text tone="textMuted" testID="procedure-count">
              {rows.length === all.length ? `${all.length} procedures` : `${rows.length} of ${all.length} procedures match`}
            </Text>
            {isFiltered(shownFilters) ? <Button testID="filters-clear" variant="quiet" label="Clear filters" onPress={() => setFilters({ ...NO_FILTERS, sort: filters.sort })} /> : null}
          </View>
          {rows.length === 0 ? (
            <NoMatches all={all} filters={shownFilters} familyLabel={families.find((f) => f.value === filters.family)?.label ?? filters.family ?? ''} onChange={setFilters} />
          ) : isDesk ? (
            <Table label="Procedures" testID="procedures-table" columns={columns} rows={rows} rowKey={(p) => p.id} />
          ) : (
            <View style={styles.cards} testID="procedure-cards">
              {rows.map((p) => (
                <Card key={p.id} testID={`procedure-card-${p.id}`} style={styles.card}>
                  <TitleCell procedure={p} />
                  <Text tone="textMuted">{p.family}</Text>
                  <VersionBadges procedure={p} />
                  <Edited procedure={p} />
                  {actions(p)}
                </Card>
              ))}
            </View>
          )}
        </View>
      )}
    </Screen>
  );
}

const FILTER_WORDS = { q: 'The search', family: 'The machine family filter', state: 'The versions filter' } as const;
const CLEAR_WORDS = { q: 'the search', family: 'the machine family', state: 'the versions filter' } as const;

/** Nothing passes: say which filter hides everything and offer to clear just that one. */
function NoMatches({ all, filters, familyLabel, onChange }: { all: ProcedureSummary[]; filters: ProcedureFilters; familyLabel: string; onChange: (f: ProcedureFilters) => void }) {
  const blocking = blockingFilters(all, filters);
  const value = { q: `“${filters.q.trim()}”`, family: `“${familyLabel}”`, state: `“${VERSION_STATES.find((s) => s.value === filters.state)?.label ?? ''}”` };
  const cleared = (key: 'q' | 'family' | 'state') => ({ ...filters, [key]: key === 'q' ? '' : null });
  if (blocking.length === 0) {
    return (
      <EmptyState
        testID="no-matches"
        icon="procedures"
        title="No procedure matches"
        body="No procedure fits the search and all the filters together. Clear them to see every procedure."
        action={{ label: 'Clear filters', testID: 'no-matches-clear', onPress: () => onChange({ ...NO_FILTERS, sort: filters.sort }) }}
      />
    );
  }
  const first = blocking[0];
  const body = blocking.map((b) => `${FILTER_WORDS[b.key]} ${value[b.key]} hides every procedure the rest let through; without it, ${b.without} would show.`).join(' ');
  return (
    <View style={styles.section}>
      <EmptyState
        testID="no-matches"
        icon="procedures"
        title="No procedure matches"
        body={body}
        action={{ label: `Clear ${CLEAR_WORDS[first.key]}`, testID: `no-matches-clear-${first.key}`, onPress: () => onChange(cleared(first.key)) }}
      />
      {blocking.slice(1).map((b) => (
        <Button key={b.key} testID={`no-matches-clear-${b.key}`} label={`Or clear ${CLEAR_WORDS[b.key]}`} variant="quiet" style={styles.center} onPress={() => onChange(cleared(b.key))} />
      ))}
    </View>
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
  toolsDesk: { flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap', columnGap: space.xl },
  search: { flexGrow: 1, minWidth: 260 },
  countRow: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.md, minHeight: 44 },
  cards: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  card: { flexGrow: 1, flexBasis: 340, gap: space.sm },
  cell: { gap: 2 },
  badges: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  number: { fontVariant: ['tabular-nums'] },
  rowActions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  center: { alignSelf: 'center' },
});
