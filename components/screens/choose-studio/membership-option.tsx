import { Pressable, StyleSheet, View } from 'react-native';

import { StateGlyph } from '@/components/ui/state-mark';
import { Heading, Text } from '@/components/ui/text';
import { focusRing, useFocusRing } from '@/components/ui/use-focus-ring';
import { palette, radii, spacing, touchTarget } from '@/constants/theme';
import { type Membership } from '@/shared/schemas/membership';

function roleLine(membership: Membership): string {
  switch (membership.role) {
    case 'owner':
      return 'Owner';
    case 'assistant':
      return 'Studio assistant';
    case 'gallery':
      return membership.venueName ? `Staff at ${membership.venueName}` : 'Venue staff';
  }
}

type MembershipOptionProps = {
  membership: Membership;
  inUse: boolean;
  opening: boolean;
  disabled: boolean;
  onChoose: () => void;
};

export function MembershipOption({
  membership,
  inUse,
  opening,
  disabled,
  onChoose,
}: MembershipOptionProps) {
  const { focused, focusProps } = useFocusRing();
  const role = roleLine(membership);
  return (
    <Pressable
      testID={`membership-option-${membership.id}`}
      role="button"
      accessibilityLabel={`${membership.studioName}, ${role}${inUse ? ', in use now' : ''}`}
      accessibilityState={{ disabled, busy: opening, selected: inUse }}
      disabled={disabled}
      onPress={onChoose}
      {...focusProps}
      style={({ pressed }) => [
        styles.option,
        inUse && styles.inUse,
        pressed && styles.pressed,
        focused && focusRing,
      ]}
    >
      <View style={styles.text}>
        <Heading level={2} style={styles.name}>
          {membership.studioName}
        </Heading>
        <Text variant="small">{role}</Text>
      </View>
      {opening ? (
        <Text variant="label">Opening…</Text>
      ) : inUse ? (
        <View style={styles.inUseMark}>
          <StateGlyph shape="dot" color={palette.accent} />
          <Text variant="label">In use</Text>
        </View>
      ) : (
        <Text variant="label" style={styles.open}>
          Open
        </Text>
      )}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  option: {
    minHeight: touchTarget + 20,
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: palette.outline,
    backgroundColor: palette.surface,
  },
  inUse: { borderColor: palette.accent, borderWidth: 2 },
  pressed: { backgroundColor: palette.sunken },
  text: { flex: 1, gap: spacing.xxs },
  name: { fontSize: 20 },
  inUseMark: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  open: { color: palette.accent },
});
