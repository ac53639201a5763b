import { Redirect, Slot, useRouter, useSegments } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { ROLE_LABELS, sectionsFor } from '@shared/auth/roles';
import type { SessionUser } from '@shared/api/types';
import { BrandMark } from '@/components/ui/brand-mark';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Text } from '@/components/ui/text';
import { OfflineBanner } from '@/features/shell/offline-banner';
import { SECTION_NAV } from '@/features/shell/sections';
import { useSession } from '@/lib/session';
import { layout, space, useBreakpoints, useTheme } from '@/lib/theme';

/** The layout of every signed-in page: sends strangers to sign-in, then frames the page for the screen size. */
export function SignedInShell() {
  const { session } = useSession();
  const colors = useTheme();
  if (session.status === 'signed-out') return <Redirect href="/sign-in" />;
  if (session.status === 'loading') {
    return (
      <View style={[styles.fill, { backgroundColor: colors.background }]}>
        <LoadingState label="Opening your shop…" />
      </View>
    );
  }
  if (session.status === 'unreachable') {
    return (
      <View style={[styles.fill, styles.center, { backgroundColor: colors.background }]}>
        <ErrorState title="Can't reach Probepath" error={session.error} onRetry={session.retry} />
      </View>
    );
  }
  return <Shell user={session.user} onRetry={session.unreachable?.retry ?? null} />;
}

/** `onRetry` is set while the server can't be reached; the page then runs from what the device holds. */
function Shell({ user, onRetry }: { user: SessionUser; onRetry: (() => void) | null }) {
  const { isWide } = useBreakpoints();
  const colors = useTheme();
  const router = useRouter();
  const insets = useSafeAreaInsets();
  const { signOut } = useSession();
  // Only marks the current section; access is checked by each section's route (sectionRoute).
  const segments = useSegments() as string[];
  const here = segments[1];
  const allowed = sectionsFor(user.role);

  const navItems = allowed.map((section) => (
    <Button
      key={section}
      testID={`nav-${section}`}
      label={SECTION_NAV[section].label}
      icon={SECTION_NAV[section].icon}
      variant={isWide ? 'nav' : 'tab'}
      selected={here === section}
      onPress={() => router.navigate(`/${section}`)}
    />
  ));

  if (isWide) {
    return (
      <View style={[styles.fill, styles.row, { backgroundColor: colors.background }]}>
        <View
          role="navigation"
          aria-label="Sections"
          style={[styles.sidebar, { backgroundColor: colors.chrome, paddingTop: insets.top + space.xl }]}
        >
          <View style={styles.sidebarHead}>
            <BrandMark onChrome />
            <Text variant="bodyStrong" tone="onChrome" testID="shell-shop-name">
              {user.shopName}
            </Text>
          </View>
          <View style={styles.navList}>{navItems}</View>
          <View style={[styles.sidebarFoot, { borderTopColor: colors.chromeSelected }]}>
            <View style={styles.who} testID="shell-user">
              <Text variant="bodyStrong" tone="onChrome">
                {user.name}
              </Text>
              <Text variant="small" tone="onChromeMuted">
                {ROLE_LABELS[user.role]}
              </Text>
            </View>
            <Button
              testID="nav-account"
              label="Account"
              icon="account"
              variant="nav"
              selected={here === 'account'}
              onPress={() => router.navigate('/account')}
            />
            <Button testID="sign-out" label="Sign out" icon="signOut" variant="nav" onPress={() => void signOut()} />
          </View>
        </View>
        <View role="main" style={styles.fill}>
          {onRetry ? <OfflineBanner onRetry={onRetry} /> : null}
          <Slot />
        </View>
      </View>
    );
  }

  return (
    <View style={[styles.fill, { backgroundColor: colors.background }]}>
      <View style={[styles.topBar, { backgroundColor: colors.chrome, paddingTop: insets.top }]}>
        <Text variant="bodyStrong" tone="onChrome" numberOfLines={1} style={styles.fill} testID="shell-shop-name">
          {user.shopName}
        </Text>
        <Button
          testID="nav-account"
          label="Account"
          icon="account"
          variant="nav"
          hideLabel
          selected={here === 'account'}
          onPress={() => router.navigate('/account')}
        />
      </View>
      <View role="main" style={styles.fill}>
        {onRetry ? <OfflineBanner onRetry={onRetry} /> : null}
        <Slot />
      </View>
      <View
        role="navigation"
        aria-label="Sections"
        style={[styles.tabBar, { backgroundColor: colors.surface, borderTopColor: colors.border, paddingBottom: insets.bottom }]}
      >
        {navItems}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1 },
  center: { justifyContent: 'center' },
  row: { flexDirection: 'row' },
  sidebar: { width: layout.sidebarWidth, paddingHorizontal: space.md, paddingBottom: space.lg, gap: space.xl },
  sidebarHead: { paddingHorizontal: space.sm, gap: space.sm },
  navList: { flex: 1, gap: space.xs },
  sidebarFoot: { borderTopWidth: 1, paddingTop: space.lg, gap: space.xs },
  who: { paddingHorizontal: space.lg, paddingBottom: space.sm },
  topBar: { flexDirection: 'row', alignItems: 'center', paddingLeft: space.lg, paddingRight: space.xs, minHeight: 56 },
  tabBar: { flexDirection: 'row', borderTopWidth: 1 },
});
