import { useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { type ChoiceKey, isDay, lastDays, NO_FILTERS, type ReplayFilters } from '@/features/replays/replay-filters';
import { radius, space, type, useTheme } from '@/lib/theme';

const CHOICE_LABELS: Record<ChoiceKey, string> = { procedure: 'Procedure', finding: 'Finding', machine: 'Machine model', technician: 'Technician' };
const PRESETS = [7, 30, 90] as const;

interface FilterBarProps {
  filters: ReplayFilters;
  options: Record<ChoiceKey, { value: string; count: number }[]>;
  onChange: (filters: ReplayFilters) => void;
}

/** One button per filter showing its value; pressing it opens its choices below the row. */
export function ReplayFilterBar({ filters, options, onChange }: FilterBarProps) {
  const c = useTheme();
  const [open, setOpen] = useState<ChoiceKey | 'dates' | null>(null);
  const toggle = (key: ChoiceKey | 'dates') => setOpen((o) => (o === key ? null : key));
  const any = JSON.stringify(filters) !== JSON.stringify(NO_FILTERS);
  const dates = filters.from || filters.to ? `${filters.from ?? '…'} to ${filters.to ?? '…'}` : 'Any time';

  return (
    <View style={styles.bar} testID="replay-filters">
      <View style={styles.triggers}>
        {(Object.keys(CHOICE_LABELS) as ChoiceKey[]).map((key) => (
          <Button
            key={key}
            testID={`filter-${key}`}
            label={`${CHOICE_LABELS[key]}: ${filters[key] ?? 'Any'}`}
            ariaLabel={`${CHOICE_LABELS[key]}: ${filters[key] ?? 'Any'}, ${open === key ? 'close' : 'open'} the choices`}
            selected={open === key || filters[key] !== null}
            onPress={() => toggle(key)}
          />
        ))}
        <Button testID="filter-dates" label={`Concluded: ${dates}`} ariaLabel={`Concluded: ${dates}, ${open === 'dates' ? 'close' : 'open'} the date choices`} selected={open === 'dates' || dates !== 'Any time'} onPress={() => toggle('dates')} />
        {any ? <Button testID="filter-clear" label="Clear filters" variant="quiet" onPress={() => onChange(NO_FILTERS)} /> : null}
      </View>
      {open && open !== 'dates' ? (
        <View style={[styles.panel, { borderColor: c.border, backgroundColor: c.surface }]} role="group" aria-label={`${CHOICE_LABELS[open]} choices`}>
          {[{ value: null, count: 0 }, ...options[open]].map((option) => (
            <Button
              key={option.value ?? 'any'}
              testID={`filter-${open}-${option.value ?? 'any'}`}
              label={option.value === null ? 'Any' : `${option.value} (${option.count})`}
              selected={filters[open] === option.value}
              onPress={() => {
                onChange({ ...filters, [open]: option.value });
                setOpen(null);
              }}
            />
          ))}
        </View>
      ) : null}
      {open === 'dates' ? <DatePanel filters={filters} onChange={onChange} onDone={() => setOpen(null)} /> : null}
    </View>
  );
}

function DatePanel({ filters, onChange, onDone }: { filters: ReplayFilters; onChange: (f: ReplayFilters) => void; onDone: () => void }) {
  const c = useTheme();
  const [from, setFrom] = useState(filters.from ?? '');
  const [to, setTo] = useState(filters.to ?? '');
  const bad = [from, to].some((d) => d !== '' && !isDay(d));
  const apply = () => {
    if (bad) return;
    onChange({ ...filters, from: from || null, to: to || null });
    onDone();
  };
  const field = (label: string, value: string, set: (v: string) => void, testID: string) => (
    <View style={styles.field}>
      <Text nativeID={`${testID}-label`} variant="bodyStrong">
        {label}
      </Text>
      <TextInput
        testID={testID}
        aria-labelledby={`${testID}-label`}
        value={value}
        onChangeText={set}
        onSubmitEditing={apply}
        placeholder="YYYY-MM-DD"
        placeholderTextColor={c.textMuted}
        inputMode="numeric"
        style={[styles.input, type.mono, { color: c.text, borderColor: c.borderStrong, backgroundColor: c.surface }]}
      />
    </View>
  );
  return (
    <View style={[styles.panel, styles.datePanel, { borderColor: c.border, backgroundColor: c.surface }]} role="group" aria-label="Date choices">
      <View style={styles.presets}>
        {PRESETS.map((days) => (
          <Button
            key={days}
            testID={`filter-dates-${days}`}
            label={`Past ${days} days`}
            onPress={() => {
              onChange({ ...filters, ...lastDays(days, new Date()) });
              onDone();
            }}
          />
        ))}
        <Button
          testID="filter-dates-any"
          label="Any time"
          onPress={() => {
            onChange({ ...filters, from: null, to: null });
            onDone();
          }}
        />
      </View>
      <View style={styles.range}>
        {field('From', from, setFrom, 'filter-from')}
        {field('To', to, setTo, 'filter-to')}
        <Button testID="filter-dates-apply" label="Apply dates" variant="primary" disabled={bad} onPress={apply} />
      </View>
      {bad ? (
        <Text variant="small" tone="danger">
          Write dates as year-month-day, e.g. 2026-03-14.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm },
  triggers: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  panel: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, borderWidth: 1, borderRadius: radius.lg, padding: space.md },
  datePanel: { flexDirection: 'column', gap: space.md },
  presets: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  range: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.md },
  field: { gap: space.xs },
  input: { minHeight: 48, width: 168, borderWidth: 1, borderRadius: radius.md, paddingHorizontal: space.md },
});
