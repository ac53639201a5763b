import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';
import { Text } from '@/components/ui/text';
import { space, useTheme } from '@/lib/theme';

/** The Probepath wordmark: a probe lead ending in an amber tip. */
export function BrandMark({ onChrome = false }: { onChrome?: boolean }) {
  const colors = useTheme();
  const ink = onChrome ? colors.onChrome : colors.text;
  return (
    <View style={styles.row} aria-label="Probepath" role="img">
      <Svg width={30} height={30} viewBox="0 0 30 30" aria-hidden>
        <Path d="M4 26C10 26 8 14 15 14s5-10 9-10" fill="none" stroke={ink} strokeWidth={3} strokeLinecap="round" />
        <Circle cx={24.5} cy={4.5} r={3.5} fill={colors.signal} />
      </Svg>
      <Text variant="title" style={{ color: ink }}>
        Probepath
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
