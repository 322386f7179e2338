import { type Href, Link } from 'expo-router';
import { type ReactNode } from 'react';
import { Pressable, type PressableProps, StyleSheet } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';

import { focusRing, useFocusRing } from './use-focus-ring';

type CardPressableProps = Omit<PressableProps, 'style' | 'children'> & { children: ReactNode };

function CardPressable({ children, ...props }: CardPressableProps) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      role="link"
      {...focusProps}
      {...props}
      style={({ pressed }) => [styles.card, pressed && styles.pressed, focused && focusRing]}
    >
      {children}
    </Pressable>
  );
}

/** A card the whole of which opens a page: a plinth that is also a link. */
export function LinkCard({
  href,
  label,
  testID,
  children,
}: {
  href: Href;
  /** What a screen reader says for the card. */
  label: string;
  testID?: string;
  children: ReactNode;
}) {
  return (
    <Link href={href} asChild>
      <CardPressable accessibilityLabel={label} testID={testID}>
        {children}
      </CardPressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: palette.surface,
    borderColor: palette.hairline,
    borderWidth: 1,
    borderRadius: radii.lg,
    padding: spacing.lg,
    gap: spacing.sm,
  },
  pressed: { backgroundColor: palette.sunken },
});
