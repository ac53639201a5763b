import Head from 'expo-router/head';
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { Heading, Text } from '@/components/ui/text';
import { layout, space, useBreakpoints, useTheme } from '@/lib/theme';

interface ScreenProps {
  title: string;
  subtitle?: string;
  /** Buttons beside the title. */
  actions?: ReactNode;
  /** `form` narrows the body to a readable column; `content` uses the capped page width. */
  width?: 'content' | 'form';
  testID: string;
  children: ReactNode;
}

/** A page: scrolls, titles itself (also in the browser tab) and caps its width on wide screens. */
export function Screen({ title, subtitle, actions, width = 'content', testID, children }: ScreenProps) {
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  return (
    <ScrollView
      testID={testID}
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={[styles.scroll, { padding: isWide ? space.xxl : space.lg }]}
    >
      <Head>
        <title>{`${title} · Probepath`}</title>
      </Head>
      <View style={styles.column}>
        <View style={styles.header}>
          <View style={styles.titles}>
            <Heading>{title}</Heading>
            {subtitle ? <Text tone="textMuted">{subtitle}</Text> : null}
          </View>
          {actions}
        </View>
        {width === 'form' ? <View style={styles.form}>{children}</View> : children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1 },
  column: { width: '100%', maxWidth: layout.maxContentWidth, alignSelf: 'center', gap: space.xl },
  form: { width: '100%', maxWidth: layout.maxFormWidth, gap: space.xl },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titles: { flexShrink: 1, gap: space.xs },
});
