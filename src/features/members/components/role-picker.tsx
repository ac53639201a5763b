import { StyleSheet, View } from 'react-native';
import { ROLE_LABELS, ROLES, type Role } from '@shared/auth/roles';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/lib/theme';

interface RolePickerProps {
  value: Role;
  onChange: (role: Role) => void;
  testID: string;
  /** The role being saved right now, shown as busy. */
  pending?: Role | null;
  disabled?: boolean;
}

/** The four roles as toggle buttons; the chosen one is pressed and outlined. */
export function RolePicker({ value, onChange, testID, pending = null, disabled = false }: RolePickerProps) {
  return (
    <View style={styles.wrap}>
      <Text variant="bodyStrong" nativeID={`${testID}-label`}>
        Role
      </Text>
      <View role="group" aria-labelledby={`${testID}-label`} style={styles.row}>
        {ROLES.map((role) => (
          <Button
            key={role}
            testID={`${testID}-${role}`}
            label={ROLE_LABELS[role]}
            selected={value === role}
            loading={pending === role}
            disabled={disabled}
            onPress={() => onChange(role)}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
