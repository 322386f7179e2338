import { Link } from 'expo-router';
import { Pressable, type PressableProps, StyleSheet } from 'react-native';

import { counted } from '@/components/ui/format';
import { StateMark } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { palette, radii, spacing } from '@/constants/theme';

import { type MailRow } from './mail-columns';
import { mailKindWords, outboxLook, whenWords } from './mail-words';

function CardPressable({
  message,
  ...props
}: Omit<PressableProps, 'style' | 'children'> & { message: MailRow }) {
  const { focused, focusProps } = useFocusRing();
  const look = outboxLook(message);
  const when = whenWords(message, message.timeZone);
  return (
    <Pressable
      role="link"
      testID={`mail-card-${message.id}`}
      accessibilityLabel={`${message.subject}, to ${message.to}, ${look.word}, ${when}`}
      {...focusProps}
      {...props}
      style={({ pressed }) => [styles.card, pressed && styles.pressed, focused && focusRing]}
    >
      <StateMark look={look} />
      <Heading level={3} numberOfLines={2}>
        {message.subject}
      </Heading>
      <Text numberOfLines={1}>{`To ${message.to}`}</Text>
      <Text variant="small">
        {[
          mailKindWords[message.kind],
          when,
          message.attachments.length > 0 ? counted(message.attachments.length, 'file') : null,
        ]
          .filter(Boolean)
          .join(' · ')}
      </Text>
      {message.state !== 'sent' && message.lastError ? (
        <Text variant="small" numberOfLines={2} style={styles.error}>
          {message.lastError}
        </Text>
      ) : null}
    </Pressable>
  );
}

/** A message on a phone: its state first, then what it was and to whom. */
export function MailCard({ message }: { message: MailRow }) {
  return (
    <Link href={{ pathname: '/mail/[id]', params: { id: String(message.id) } }} asChild>
      <CardPressable message={message} />
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    gap: spacing.xs,
    padding: spacing.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: palette.hairline,
    backgroundColor: palette.surface,
  },
  pressed: { backgroundColor: palette.sunken },
  error: { color: palette.danger },
});
