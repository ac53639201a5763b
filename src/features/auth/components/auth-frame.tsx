import Head from 'expo-router/head';
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { BrandMark } from '@/components/ui/brand-mark';
import { Card } from '@/components/ui/card';
import { Heading, Text } from '@/components/ui/text';
import { SpecBarSketch } from '@/features/auth/components/spec-bar-sketch';
import { layout, space, useBreakpoints, useTheme } from '@/lib/theme';

interface AuthFrameProps {
  title: string;
  intro?: string;
  testID: string;
  children: ReactNode;
}

/** The pages before sign-in: what Probepath is on one side, the form on the other (stacked on a phone). */
export function AuthFrame({ title, intro, testID, children }: AuthFrameProps) {
  const colors = useTheme();
  const { isWide } = useBreakpoints();
  return (
    <ScrollView
      testID={testID}
      style={{ backgroundColor: colors.background }}
      contentContainerStyle={[styles.page, isWide && styles.pageWide]}
    >
      <Head>
        <title>{`${title} · Probepath`}</title>
      </Head>
      <View style={[styles.story, { backgroundColor: colors.chrome }, isWide && styles.storyWide]}>
        <BrandMark onChrome />
        {isWide ? (
          <View style={styles.storyBody}>
            <Text variant="display" tone="onChrome">
              One check at a time, down to the faulty part.
            </Text>
            <Text tone="onChromeMuted">
              Procedures written once by your lead technicians, followed at the bench with the meter in hand, and
              replayed by apprentices.
            </Text>
            <SpecBarSketch />
          </View>
        ) : null}
      </View>
      <View style={[styles.formSide, isWide && styles.formSideWide]}>
        <Card style={styles.card}>
          <Heading>{title}</Heading>
          {intro ? <Text tone="textMuted">{intro}</Text> : null}
          {children}
        </Card>
        <Text variant="small" tone="textMuted" style={styles.footnote}>
          Probepath guides your checks; the machine&apos;s service manual and your shop&apos;s safety practice come first.
        </Text>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flexGrow: 1 },
  pageWide: { flexDirection: 'row' },
  story: { paddingHorizontal: space.lg, paddingVertical: space.md },
  storyWide: { flex: 1, maxWidth: 560, paddingHorizontal: space.xxxl, paddingVertical: space.xxxl },
  storyBody: { flex: 1, justifyContent: 'center', gap: space.xl },
  formSide: { padding: space.lg, gap: space.lg },
  formSideWide: { flex: 1, justifyContent: 'center', alignItems: 'center', padding: space.xxxl },
  card: { width: '100%', maxWidth: layout.maxFormWidth, gap: space.lg },
  footnote: { maxWidth: layout.maxFormWidth, textAlign: 'center', alignSelf: 'center' },
});
