import 'react-native';

/** Props and press states React Native Web supports that React Native's own types leave out. */
declare module 'react-native' {
  interface AccessibilityProps {
    'aria-current'?: 'page' | 'step' | 'true' | 'false' | boolean;
    'aria-pressed'?: boolean;
    'aria-invalid'?: boolean;
    'aria-describedby'?: string;
    'aria-level'?: number;
  }
  interface PressableStateCallbackType {
    readonly hovered?: boolean;
    readonly focused?: boolean;
  }
}
