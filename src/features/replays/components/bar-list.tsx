import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

export interface Bar {
  key: string;
  label: string;
  value: number;
  /** The value in words, printed beside the bar. */
  text: string;
}

/** A horizontal bar chart whose numbers are printed too, so it reads without the picture. */
export function BarList({ bars, label, testID }: { bars: Bar[]; label: string; testID?: string }) {
  const c = useTheme();
  const most = Math.max(0, ...bars.map((b) => b.value));
  return (
    <View role="list" aria-label={label} style={styles.list} testID={testID}>
      {bars.map((b) => (
        <View key={b.key} role="listitem" style={styles.item}>
          <View style={styles.words}>
            <Text style={styles.grow}>{b.label}</Text>
            <Text variant="bodyStrong">{b.text}</Text>
          </View>
          <View style={[styles.track, { backgroundColor: c.surfaceSunken }]}>
            <View style={[styles.bar, { backgroundColor: c.primary, width: `${most > 0 ? Math.max(2, (100 * b.value) / most) : 0}%` }]} />
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  item: { gap: space.xs },
  words: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md },
  grow: { flex: 1 },
  track: { height: 12, borderRadius: radius.sm, overflow: 'hidden' },
  bar: { height: 12, borderRadius: radius.sm },
});
