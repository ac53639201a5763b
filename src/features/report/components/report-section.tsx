import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Heading } from '@/components/ui/text';
import { space, useTheme } from '@/lib/theme';

/** A titled part of the report, ruled off from the one above. */
export function ReportSection({ title, children, testID }: { title: string; children: ReactNode; testID?: string }) {
  const colors = useTheme();
  return (
    <View style={styles.section} testID={testID}>
      <View style={[styles.rule, { borderBottomColor: colors.border }]}>
        <Heading level={2} tone="primary">
          {title}
        </Heading>
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  rule: { borderBottomWidth: 1, paddingBottom: space.xs },
});
