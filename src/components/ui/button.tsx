import { ActivityIndicator, Pressable, type StyleProp, StyleSheet, View, type ViewStyle } from 'react-native';
import { Icon, type IconName } from '@/components/ui/icon';
import { Text } from '@/components/ui/text';
import { layout, type Palette, radius, space, type, useTheme } from '@/lib/theme';

/**
 * primary/secondary/danger/quiet are actions; `tab` (phone tab bar) and `nav`
 * (wide sidebar) move between sections; `row` opens one item of a list. A
 * selected tab/nav/row is announced as the current page, a selected secondary
 * button as pressed; each shows a bar or outline, so selection never rests on
 * colour alone.
 */
type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet' | 'tab' | 'nav' | 'row';

export interface ButtonProps {
  /** Visible text and accessible name. */
  label: string;
  /** A second line under the label, for `row` buttons. */
  description?: string;
  /** A fuller accessible name that starts with the label, e.g. "Revoke invite for …". */
  ariaLabel?: string;
  testID: string;
  onPress?: () => void;
  variant?: ButtonVariant;
  icon?: IconName;
  loading?: boolean;
  disabled?: boolean;
  selected?: boolean;
  /** For icon-only buttons: the label is still the accessible name. */
  hideLabel?: boolean;
  style?: StyleProp<ViewStyle>;
}

export function Button({
  label,
  ariaLabel,
  description,
  testID,
  onPress,
  variant = 'secondary',
  icon,
  loading = false,
  disabled = false,
  selected,
  hideLabel = false,
  style,
}: ButtonProps) {
  const colors = useTheme();
  const look = looks(colors)[variant];
  const inactive = disabled || loading;
  const isNavigation = variant === 'tab' || variant === 'nav' || variant === 'row';
  const foreground = selected && look.selectedForeground ? look.selectedForeground : look.foreground;

  return (
    <Pressable
      testID={testID}
      role="button"
      // Named by what it shows (label and description), unless the label is hidden or a fuller name is given.
      aria-label={ariaLabel ?? (hideLabel ? label : undefined)}
      aria-disabled={inactive}
      aria-busy={loading}
      aria-current={isNavigation && selected ? 'page' : undefined}
      aria-pressed={!isNavigation && selected !== undefined ? selected : undefined}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed, hovered }) => [
        styles.base,
        variant === 'primary' || variant === 'danger' ? styles.primarySize : null,
        variant === 'tab' ? styles.tab : variant === 'nav' ? styles.nav : variant === 'row' ? styles.row : styles.action,
        hideLabel ? styles.iconOnly : null,
        { backgroundColor: selected && look.selectedBackground ? look.selectedBackground : look.background },
        look.border ? { borderColor: selected ? colors.primary : look.border, borderWidth: selected ? 2 : 1 } : null,
        (pressed || hovered) && !inactive ? { opacity: 0.86 } : null,
        inactive && !loading ? styles.disabled : null,
        style,
      ]}
    >
      {selected && isNavigation && !hideLabel ? (
        <View style={[variant === 'tab' ? styles.tabMarker : styles.sideMarker, { backgroundColor: colors.signal }]} />
      ) : null}
      {loading ? <ActivityIndicator color={foreground} size="small" /> : icon ? <Icon name={icon} color={foreground} size={variant === 'tab' ? 26 : 22} /> : null}
      {hideLabel ? null : (
        <View style={variant === 'nav' || variant === 'row' ? styles.labels : null}>
          <Text
            numberOfLines={variant === 'tab' ? 1 : undefined}
            style={[variant === 'tab' ? type.label : type.bodyStrong, { color: foreground }]}
          >
            {label}
          </Text>
          {description ? (
            <Text variant="small" tone="textMuted">
              {description}
            </Text>
          ) : null}
        </View>
      )}
    </Pressable>
  );
}

interface Look {
  background: string;
  foreground: string;
  border?: string;
  selectedBackground?: string;
  selectedForeground?: string;
}

function looks(c: Palette): Record<ButtonVariant, Look> {
  return {
    primary: { background: c.primary, foreground: c.onPrimary },
    danger: { background: c.danger, foreground: c.onDanger },
    secondary: { background: c.surface, foreground: c.text, border: c.borderStrong, selectedBackground: c.primarySoft },
    quiet: { background: 'transparent', foreground: c.primary },
    tab: { background: 'transparent', foreground: c.textMuted, selectedForeground: c.primary },
    nav: { background: 'transparent', foreground: c.onChromeMuted, selectedBackground: c.chromeSelected, selectedForeground: c.onChrome },
    row: { background: c.surface, foreground: c.text, selectedBackground: c.primarySoft },
  };
}

const styles = StyleSheet.create({
  base: {
    minHeight: layout.minTouch,
    minWidth: layout.minTouch,
    borderRadius: radius.md,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
  },
  action: { paddingHorizontal: space.lg, paddingVertical: space.sm },
  primarySize: { minHeight: layout.primaryTouch, paddingHorizontal: space.xl },
  iconOnly: { paddingHorizontal: space.sm },
  tab: { flex: 1, flexDirection: 'column', gap: 2, minHeight: 60, paddingVertical: space.sm, borderRadius: 0 },
  tabMarker: { position: 'absolute', top: 0, left: '22%', right: '22%', height: 4, borderBottomLeftRadius: 4, borderBottomRightRadius: 4 },
  nav: { justifyContent: 'flex-start', paddingHorizontal: space.lg, minHeight: 48, gap: space.md },
  row: { justifyContent: 'flex-start', alignItems: 'flex-start', paddingHorizontal: space.lg, paddingVertical: space.md, borderRadius: 0 },
  sideMarker: { position: 'absolute', left: 0, top: 8, bottom: 8, width: 4, borderTopRightRadius: 4, borderBottomRightRadius: 4 },
  labels: { flexShrink: 1, gap: 2 },
  disabled: { opacity: 0.55 },
});
