import Head from 'expo-router/head';
import { useRouter } from 'expo-router';
import { ScrollView, StyleSheet } from 'react-native';
import { ROLE_LABELS, type Role, type Section, sectionsFor } from '@shared/auth/roles';
import { EmptyState } from '@/components/ui/empty-state';
import { SECTION_NAV } from '@/features/shell/sections';
import { useTheme } from '@/lib/theme';

/** Shown instead of a section the member's role may not use, e.g. when its address is typed in. */
export function SectionUnavailable({ section, role }: { section: Section; role: Role }) {
  const router = useRouter();
  const colors = useTheme();
  const home = sectionsFor(role)[0];
  const label = SECTION_NAV[section].label;
  return (
    <ScrollView style={{ backgroundColor: colors.background }} contentContainerStyle={styles.center}>
      <Head>
        <title>Not available · Probepath</title>
      </Head>
      <EmptyState
        testID="section-unavailable"
        icon="lock"
        title={`${label} is not available for your role`}
        body={`As ${articled(ROLE_LABELS[role])} you can use ${sectionsFor(role)
          .map((s) => SECTION_NAV[s].label)
          .join(', ')}. If you need ${label}, ask your shop owner to change your role.`}
        action={{
          label: `Go to ${SECTION_NAV[home].label}`,
          testID: 'section-unavailable-home',
          onPress: () => router.replace(`/${home}`),
        }}
      />
    </ScrollView>
  );
}

function articled(noun: string) {
  return /^[AEIOU]/.test(noun) ? `an ${noun.toLowerCase()}` : `a ${noun.toLowerCase()}`;
}

const styles = StyleSheet.create({
  center: { flexGrow: 1, justifyContent: 'center' },
});
