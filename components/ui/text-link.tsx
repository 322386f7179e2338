import { type Href, Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet } from 'react-native';

import { palette, touchTarget } from '@/constants/theme';

import { Text } from './text';
import { focusRing, useFocusRing } from './use-focus-ring';

type LinkPressableProps = Omit<PressableProps, 'style' | 'children'> & { label: string };

function LinkPressable({ label, ...props }: LinkPressableProps) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      role="link"
      {...focusProps}
      {...props}
      style={({ pressed }) => [styles.link, pressed && styles.pressed, focused && focusRing]}
    >
      <Text variant="bodyStrong" style={styles.text}>
        {label}
      </Text>
    </Pressable>
  );
}

/**
 * An underlined link in running text or a table cell, with a full-size target. `dismissTo` goes
 * back to the page when it is already open underneath, as "Back to …" should.
 */
export function TextLink({
  href,
  label,
  testID,
  dismissTo,
}: {
  href: Href;
  label: string;
  testID?: string;
  dismissTo?: boolean;
}) {
  return (
    <Link href={href} asChild dismissTo={dismissTo}>
      <LinkPressable label={label} testID={testID} />
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { minHeight: touchTarget, justifyContent: 'center' },
  pressed: { opacity: 0.7 },
  text: { color: palette.accent, textDecorationLine: 'underline' },
});
