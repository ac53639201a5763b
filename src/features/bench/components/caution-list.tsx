import { StyleSheet, View } from 'react-native';
import { Icon } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

/** Said before every diagnosis, whatever the procedure's own cautions. */
export const MANUAL_FIRST = "The machine's service manual, local codes and licensed practice come first. Probepath guides the checks; it does not replace them.";

/** Safety cautions, set apart from the instructions: a warning band, a caution shape and the word "Caution". */
export function CautionList({ cautions, testID }: { cautions: readonly string[]; testID: string }) {
  const colors = useTheme();
  if (!cautions.length) return null;
  return (
    <View testID={testID} role="list" aria-label="Cautions" style={styles.list}>
      {cautions.map((caution) => (
        <View key={caution} role="listitem" style={[styles.item, { backgroundColor: colors.warningSoft, borderLeftColor: colors.warning }]}>
          <Icon name="caution" size={26} color={colors.warning} />
          <Text style={styles.text}>
            <Text variant="bodyStrong">Caution: </Text>
            {caution}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, borderLeftWidth: 6, borderRadius: radius.md, padding: space.md },
  text: { flex: 1 },
});
