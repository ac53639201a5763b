import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { BrandMark } from '@/components/ui/brand-mark';
import { space, useTheme } from '@/lib/theme';

/** Shown while the fonts load, before anything else can be drawn properly. */
export function SplashScreen() {
  const colors = useTheme();
  return (
    <View testID="splash" role="status" aria-label="Loading Probepath" style={[styles.fill, { backgroundColor: colors.chrome }]}>
      <BrandMark onChrome />
      <ActivityIndicator color={colors.signal} />
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.lg },
});
