import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

export interface Column<T> {
  title: string;
  /** Share of the row's width. */
  flex: number;
  render: (row: T) => ReactNode;
}

interface TableProps<T> {
  label: string;
  columns: Column<T>[];
  rows: T[];
  rowKey: (row: T) => string;
  testID?: string;
}

/** Rows and columns for wide screens; phones show the same data as cards. */
export function Table<T>({ label, columns, rows, rowKey, testID }: TableProps<T>) {
  const colors = useTheme();
  return (
    <View
      testID={testID}
      role="table"
      aria-label={label}
      style={[styles.table, { borderColor: colors.border, backgroundColor: colors.surface }]}
    >
      <View role="row" style={[styles.row, { backgroundColor: colors.surfaceSunken }]}>
        {columns.map((column) => (
          <View key={column.title} role="columnheader" style={[styles.cell, { flex: column.flex }]}>
            <Text variant="label" tone="textMuted">
              {column.title.toUpperCase()}
            </Text>
          </View>
        ))}
      </View>
      {rows.map((row) => (
        <View
          key={rowKey(row)}
          testID={`${testID}-row-${rowKey(row)}`}
          role="row"
          style={[styles.row, styles.bodyRow, { borderTopColor: colors.border }]}
        >
          {columns.map((column) => (
            <View key={column.title} role="cell" style={[styles.cell, { flex: column.flex }]}>
              {column.render(row)}
            </View>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.sm },
  bodyRow: { borderTopWidth: 1, minHeight: 60 },
  cell: { paddingHorizontal: space.sm, paddingVertical: space.md, justifyContent: 'center', alignItems: 'flex-start' },
});
