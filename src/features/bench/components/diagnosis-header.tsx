import { StyleSheet, View } from 'react-native';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { layout, space, useTheme } from '@/lib/theme';

/** Which machine and procedure this is, and (on a phone) the switch between the check and the path. */
export function DiagnosisHeader({ detail, steps, view, onToggle }: { detail: DiagnosisDetail; steps: number; view: 'check' | 'path'; onToggle: (() => void) | null }) {
  const colors = useTheme();
  return (
    <View style={[styles.bar, { backgroundColor: colors.surface, borderBottomColor: colors.border }]} testID="diagnosis-header">
      <View style={styles.titles}>
        <Text variant="bodyStrong" numberOfLines={1}>
          {detail.machine}
        </Text>
        <Text variant="small" tone="textMuted" numberOfLines={1}>
          {detail.customerName} · {detail.procedureTitle} v{detail.versionNumber}
        </Text>
      </View>
      {onToggle ? (
        <Button
          testID="toggle-path"
          icon={view === 'path' ? 'back' : 'path'}
          label={view === 'path' ? 'Check' : `Path (${steps})`}
          ariaLabel={view === 'path' ? 'Back to the check' : `Path: ${steps} steps`}
          selected={view === 'path'}
          onPress={onToggle}
          style={styles.toggle}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.sm, borderBottomWidth: 1 },
  titles: { flex: 1, gap: 2 },
  toggle: { minHeight: layout.primaryTouch },
});
