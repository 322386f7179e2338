import { createContext, type ReactNode, useCallback, useContext, useEffect, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { palette, radii, spacing, touchTarget } from '@/constants/theme';

import { Text } from './text';
import { useFocusRing } from './use-focus-ring';

export type Toast = {
  message: string;
  /** One way to take back what the message confirms, such as "Undo". */
  action?: { label: string; onPress: () => void };
  testID?: string;
};

type Shown = Toast & { id: number };

/** Long enough to read it and reach its action; the change it confirms can be undone elsewhere too. */
const showFor = { plain: 5_000, withAction: 10_000 };

const ToastContext = createContext<(toast: Toast) => void>(() => undefined);

/** Shows a short message at the foot of the screen that confirms what was just done; a newer one replaces it. */
export const useToast = () => useContext(ToastContext);

function ToastButton({
  label,
  onPress,
  testID,
}: {
  label: string;
  onPress: () => void;
  testID?: string;
}) {
  const { focused, focusProps } = useFocusRing();
  return (
    <Pressable
      role="button"
      testID={testID}
      onPress={onPress}
      {...focusProps}
      style={({ pressed }) => [styles.button, pressed && styles.pressed, focused && styles.focused]}
    >
      <Text variant="label" style={styles.buttonLabel}>
        {label}
      </Text>
    </Pressable>
  );
}

/** Holds the one toast on screen, over the foot of the content it wraps. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toast, setToast] = useState<Shown | null>(null);
  const show = useCallback(
    (next: Toast) => setToast((current) => ({ ...next, id: (current?.id ?? 0) + 1 })),
    [],
  );
  useEffect(() => {
    if (!toast) return;
    const timer = setTimeout(
      () => setToast((current) => (current?.id === toast.id ? null : current)),
      toast.action ? showFor.withAction : showFor.plain,
    );
    return () => clearTimeout(timer);
  }, [toast]);
  const testID = toast?.testID ?? 'toast';

  return (
    <ToastContext.Provider value={show}>
      {children}
      {/* Always there, so a screen reader hears each new message as it arrives. */}
      <View role="status" aria-live="polite" pointerEvents="box-none" style={styles.dock}>
        {toast ? (
          <View testID={testID} style={styles.toast}>
            <Text style={styles.message} testID={`${testID}-message`}>
              {toast.message}
            </Text>
            {toast.action ? (
              <ToastButton
                label={toast.action.label}
                testID={`${testID}-action`}
                onPress={() => {
                  setToast(null);
                  toast.action?.onPress();
                }}
              />
            ) : null}
            <ToastButton label="Dismiss" onPress={() => setToast(null)} />
          </View>
        ) : null}
      </View>
    </ToastContext.Provider>
  );
}

const styles = StyleSheet.create({
  dock: {
    position: 'absolute',
    left: spacing.lg,
    right: spacing.lg,
    bottom: spacing.lg,
    alignItems: 'center',
  },
  toast: {
    width: '100%',
    maxWidth: 560,
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: spacing.xs,
    paddingVertical: spacing.xs,
    paddingLeft: spacing.lg,
    paddingRight: spacing.xs,
    borderRadius: radii.md,
    backgroundColor: palette.ink,
    boxShadow: '0 4px 16px rgba(43, 39, 36, 0.25)',
  },
  message: { flexGrow: 1, flexShrink: 1, flexBasis: 180, color: palette.paper },
  button: {
    minHeight: touchTarget,
    minWidth: touchTarget,
    paddingHorizontal: spacing.md,
    justifyContent: 'center',
    alignItems: 'center',
    borderRadius: radii.sm,
  },
  pressed: { backgroundColor: palette.inkMuted },
  // The usual ring would vanish against ink.
  focused: {
    outlineColor: palette.accentSoft,
    outlineStyle: 'solid',
    outlineWidth: 3,
    outlineOffset: -3,
  },
  buttonLabel: { color: palette.accentSoft, textDecorationLine: 'underline' },
});
