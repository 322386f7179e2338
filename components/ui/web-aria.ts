/**
 * ARIA attributes react-native-web renders but React Native's types do not declare. Spread the
 * result onto a View or Text; native platforms ignore it.
 */
export function webAria(attributes: { 'aria-level'?: number; 'aria-current'?: 'page' }): object {
  return attributes;
}
