import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { layout, space, useBreakpoints, useTheme } from '@/lib/theme';

/** A check reads best in one column about this wide, on any screen. */
const COLUMN = layout.maxFormWidth + 200;

/**
 * One check on screen: its content scrolls; the main actions stay in a bar at the bottom, in thumb reach.
 * Keyed by the check, so every new check starts scrolled to the top.
 */
export function StepFrame({ children, actions, testID }: { children: ReactNode; actions: ReactNode; testID: string }) {
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  return (
    <View style={styles.fill} testID={testID}>
      <ScrollView style={styles.fill} contentContainerStyle={[styles.content, { padding: isWide ? space.xl : space.lg }]} keyboardShouldPersistTaps="handled">
        {children}
      </ScrollView>
      <View style={[styles.bar, { backgroundColor: colors.surface, borderTopColor: colors.border }]}>
        <View style={styles.barContent}>{actions}</View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  content: { gap: space.xl, maxWidth: COLUMN, width: '100%', alignSelf: 'center' },
  bar: { borderTopWidth: 1, padding: space.md },
  barContent: { gap: space.md, maxWidth: COLUMN, width: '100%', alignSelf: 'center' },
});
