import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import type { JobView } from '@shared/api/workshop-types';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SearchField } from '@/components/ui/search-field';
import { Heading, Text } from '@/components/ui/text';
import { useProcedures } from '@/hooks/use-procedures';
import { space } from '@/lib/theme';

/** Step 2: a published procedure for the complaint, those written for this machine's family first. */
export function ProcedurePicker({ job, onPick }: { job: JobView; onPick: (procedure: ProcedureSummary) => void }) {
  const procedures = useProcedures();
  const [filter, setFilter] = useState('');
  const ranked = useMemo(() => {
    const words = filter.toLowerCase().split(/\s+/).filter(Boolean);
    const runnable = (procedures.data?.procedures ?? []).filter((p) => p.latestPublished !== null);
    return runnable
      .filter((p) => words.every((w) => `${p.title} ${p.complaint} ${p.family}`.toLowerCase().includes(w)))
      .map((p) => ({ procedure: p, fits: fitsMachine(p, job) }))
      .sort((a, b) => Number(b.fits) - Number(a.fits));
  }, [procedures.data, filter, job]);

  if (procedures.error) return <ErrorState title="Can't load the procedures" error={procedures.error} onRetry={() => void procedures.mutate()} />;
  if (!procedures.data) return <LoadingState label="Loading procedures…" />;

  return (
    <View style={styles.wrap}>
      <SearchField testID="start-procedure-filter" label="Filter by complaint or machine family" placeholder="e.g. no spark, charging, Tessa" value={filter} onChange={setFilter} />
      {ranked.map(({ procedure: p, fits }) => (
        <Card key={p.id} testID={`start-procedure-${p.id}`}>
          <View style={styles.head}>
            <Heading level={3} style={styles.grow}>
              {p.title}
            </Heading>
            {fits ? <Badge tone="success" icon="check" label="Fits this machine" /> : null}
          </View>
          <Text variant="small" tone="textMuted">
            {p.complaint} · {p.family} · version {p.latestPublished}
          </Text>
          <Button testID={`pick-procedure-${p.id}`} variant={fits ? 'primary' : 'secondary'} label="Use this procedure" ariaLabel={`Use the procedure ${p.title}`} onPress={() => onPick(p)} />
        </Card>
      ))}
      {ranked.length ? null : (
        <Text tone="textMuted">
          No published procedure matches. Try other words, or ask a lead to publish one for this complaint.
        </Text>
      )}
    </View>
  );
}

/** The model's name ("Tessa" of "Tessa 650") or the make appears in the procedure's family of machines. */
function fitsMachine(p: ProcedureSummary, job: JobView): boolean {
  const family = p.family.toLowerCase();
  const names = job.machine.model.toLowerCase().split(/[\s-]+/).filter((w) => /^[a-z]{3,}$/.test(w));
  return names.some((n) => family.includes(n));
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.sm },
  grow: { flexGrow: 1, flexShrink: 1 },
});
