import { Platform, type ViewStyle } from 'react-native';

/**
 * A box that stays at an edge of the scrolling screen while the rest of its container scrolls past
 * it, on the web. React Native's types know no `sticky`, which react-native-web hands to CSS as it
 * is; native keeps the box in its place.
 */
export function stickyOnWeb(edge: 'top' | 'bottom', offset = 0): ViewStyle {
  return (Platform.OS === 'web' ? { position: 'sticky', [edge]: offset } : {}) as ViewStyle;
}
