import { useField } from 'formik';
import { StyleSheet, View } from 'react-native';
import { checkVin } from '@shared/engine/vin';
import { Icon } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

/**
 * What the VIN's structure and North American check digit say, under the VIN field. A warning only:
 * machines built for other markets need not carry a check digit, and small engines have no VIN at all.
 */
export function VinCheck({ name }: { name: string }) {
  const colors = useTheme();
  const [field, meta] = useField<string>(name);
  const vin = field.value.trim();
  if (!vin || (vin.length < 17 && !meta.touched)) return null;
  const check = checkVin(vin);
  const message = check.ok ? check.warning : check.message;
  if (!message) {
    return (
      <View testID="vin-check" role="status" style={styles.row}>
        <Icon name="check" size={20} color={colors.success} />
        <Text variant="small">Check digit {check.ok ? check.checkDigit.found : ''} is right.</Text>
      </View>
    );
  }
  return (
    <View testID="vin-check" role="status" style={[styles.row, styles.warning, { backgroundColor: colors.warningSoft, borderLeftColor: colors.warning }]}>
      <Icon name="alert" size={20} color={colors.warning} />
      <Text variant="small" style={styles.text}>
        {message}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  warning: { borderLeftWidth: 4, borderRadius: radius.sm, padding: space.sm },
  text: { flex: 1 },
});
