import Head from 'expo-router/head';
import { useRouter } from 'expo-router';
import { ScrollView, StyleSheet } from 'react-native';
import { EmptyState } from '@/components/ui/empty-state';
import { useTheme } from '@/lib/theme';

export function NotFoundScreen() {
  const router = useRouter();
  const colors = useTheme();
  return (
    <ScrollView style={{ backgroundColor: colors.background }} contentContainerStyle={styles.center}>
      <Head>
        <title>Page not found · Probepath</title>
      </Head>
      <EmptyState
        testID="not-found"
        icon="unplugged"
        title="Nothing is connected at this address"
        body="The link may be incomplete, or the page has moved. Start again from your first section."
        action={{ label: 'Go to the start', testID: 'not-found-home', onPress: () => router.replace('/') }}
      />
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  center: { flexGrow: 1, justifyContent: 'center' },
});
