import { Text as NativeText, type TextProps as NativeTextProps } from 'react-native';
import { type Palette, type, useTheme } from '@/lib/theme';

type TextVariant = keyof typeof type;
type Tone = 'text' | 'textMuted' | 'primary' | 'danger' | 'success' | 'warning' | 'onChrome' | 'onChromeMuted';

interface TextProps extends NativeTextProps {
  variant?: TextVariant;
  tone?: Tone;
}

/** Text in the type scale and the current palette. */
export function Text({ variant = 'body', tone = 'text', style, ...rest }: TextProps) {
  const colors: Palette = useTheme();
  return <NativeText {...rest} style={[type[variant], { color: colors[tone] }, style]} />;
}

/** A heading: a title on the page and a landmark for screen readers. */
export function Heading({ level = 1, variant, ...rest }: TextProps & { level?: 1 | 2 | 3 }) {
  const scale: TextVariant = variant ?? (level === 1 ? 'heading' : 'title');
  return <Text role="heading" aria-level={level} variant={scale} {...rest} />;
}
