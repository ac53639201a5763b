import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { CHECK_KINDS, type ProcedureDocument } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { SearchField } from '@/components/ui/search-field';
import { space } from '@/lib/theme';

const GROUP_TITLES = { measure: 'Measurements', observe: 'Observations', task: 'Tasks', finding: 'Findings' } as const;

/** The checks grouped by kind, filterable by title or id (Enter selects the first match); the selected one is marked. */
export function CheckList({ document, selectedId, flagged, onSelect }: { document: ProcedureDocument; selectedId: string | null; flagged: ReadonlySet<string>; onSelect: (id: string) => void }) {
  const [filter, setFilter] = useState('');
  const words = filter.trim().toLowerCase();
  const shown = document.checks.filter((c) => !words || `${c.title} ${c.id}`.toLowerCase().includes(words));
  return (
    <View style={styles.list} testID="check-list">
      <SearchField label="Filter checks" value={filter} onChange={setFilter} onSubmit={() => shown[0] && onSelect(shown[0].id)} testID="check-filter" />
      {CHECK_KINDS.map((kind) => {
        const checks = shown.filter((c) => c.kind === kind);
        if (!checks.length) return null;
        return (
          <View key={kind} style={styles.group}>
            <Text variant="label" tone="textMuted">
              {`${GROUP_TITLES[kind].toUpperCase()} · ${checks.length}`}
            </Text>
            {checks.map((c) => (
              <Button
                key={c.id}
                testID={`check-item-${c.id}`}
                variant="row"
                label={c.title}
                description={`${c.id}${c.id === document.startCheckId ? ' · start' : ''}${flagged.has(c.id) ? ' · needs fixing' : ''}`}
                selected={c.id === selectedId}
                onPress={() => onSelect(c.id)}
              />
            ))}
          </View>
        );
      })}
      {shown.length === 0 ? <Text tone="textMuted">No check matches “{filter.trim()}”.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  group: { gap: 2 },
});
