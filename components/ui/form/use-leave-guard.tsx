import { useNavigation } from 'expo-router';
import { type NavigationAction, usePreventRemove } from 'expo-router/react-navigation';
import { useCallback, useEffect, useState } from 'react';

import { ConfirmDialog } from '../confirm-dialog';
import { useUnloadWarning } from './use-unload-warning';

/**
 * Asks before a form with unsaved changes is left, by the app's navigation or by closing the tab.
 * `leave(go)` is the way out on purpose (after saving): the guard steps aside, then `go` runs.
 */
export function useLeaveGuard(unsaved: boolean) {
  const navigation = useNavigation();
  const [going, setGoing] = useState<(() => void) | null>(null);
  const [asked, setAsked] = useState<NavigationAction | null>(null);
  const guarding = unsaved && going === null;
  usePreventRemove(guarding, ({ data }) => setAsked(data.action));
  useUnloadWarning(guarding);
  // Runs after the render that turned the guard off, so the navigation is not stopped again.
  useEffect(() => going?.(), [going]);
  const leave = useCallback((go: () => void) => setGoing(() => go), []);

  const prompt = (
    <ConfirmDialog
      testID="leave-guard"
      visible={asked !== null}
      title="Leave without saving?"
      message="The changes on this page have not been saved. If you leave now, they are lost."
      confirmLabel="Leave and lose the changes"
      cancelLabel="Keep editing"
      onCancel={() => setAsked(null)}
      onConfirm={() => {
        const action = asked;
        setAsked(null);
        if (action) leave(() => navigation.dispatch(action));
      }}
    />
  );
  return { leave, prompt };
}
