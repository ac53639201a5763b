import { StyleSheet, View } from 'react-native';
import { ROLE_DUTIES, ROLE_LABELS } from '@shared/auth/roles';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { useSession, useUser } from '@/lib/session';
import { space, useBreakpoints } from '@/lib/theme';

export function AccountScreen() {
  const user = useUser();
  const { signOut } = useSession();
  const { isWide } = useBreakpoints();
  return (
    <Screen testID="account-screen" title="Account" width="form">
      <Card testID="account-card">
        <View style={styles.who}>
          <Heading level={2}>{user.name}</Heading>
          <Text tone="textMuted">{user.email}</Text>
        </View>
        <Badge label={ROLE_LABELS[user.role]} tone="primary" />
        <Text>{ROLE_DUTIES[user.role]}</Text>
        <Text tone="textMuted">Member of {user.shopName}.</Text>
      </Card>
      <View style={styles.signOut}>
        <Text tone="textMuted">On a shared shop phone, sign out so the next person works under their own name.</Text>
        <Button testID="account-sign-out" label="Sign out" icon="signOut" variant="primary" onPress={() => void signOut()} style={isWide && styles.start} />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  who: { gap: space.xs },
  signOut: { gap: space.md },
  start: { alignSelf: 'flex-start' },
});
