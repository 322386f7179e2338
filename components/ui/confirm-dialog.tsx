import { Modal, StyleSheet, View } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';

import { Button } from './button';
import { Heading, Text } from './text';

type ConfirmDialogProps = {
  visible: boolean;
  title: string;
  message: string;
  /** What pressing it will do, in words: "Leave and lose the changes". */
  confirmLabel: string;
  cancelLabel: string;
  onConfirm: () => void;
  onCancel: () => void;
  testID: string;
};

/** A question that must be answered before going on, for a step that loses something. */
export function ConfirmDialog({
  visible,
  title,
  message,
  confirmLabel,
  cancelLabel,
  onConfirm,
  onCancel,
  testID,
}: ConfirmDialogProps) {
  return (
    <Modal visible={visible} transparent animationType="none" onRequestClose={onCancel}>
      <View style={styles.backdrop}>
        <View testID={testID} role="alertdialog" aria-label={title} style={styles.dialog}>
          <Heading level={2}>{title}</Heading>
          <Text>{message}</Text>
          <View style={styles.buttons}>
            <Button testID={`${testID}-cancel`} label={cancelLabel} onPress={onCancel} />
            <Button
              testID={`${testID}-confirm`}
              label={confirmLabel}
              variant="danger"
              onPress={onConfirm}
            />
          </View>
        </View>
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  backdrop: {
    flex: 1,
    justifyContent: 'center',
    alignItems: 'center',
    padding: spacing.lg,
    backgroundColor: 'rgba(43, 39, 36, 0.45)',
  },
  dialog: {
    width: '100%',
    maxWidth: 440,
    gap: spacing.md,
    padding: spacing.xl,
    borderRadius: radii.lg,
    backgroundColor: palette.surface,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
