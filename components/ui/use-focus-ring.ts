import { useState } from 'react';

import { palette } from '@/constants/theme';

/** A visible focus ring for keyboard users on the web, drawn outside the control. */
export const focusRing = {
  outlineColor: palette.accent,
  outlineStyle: 'solid',
  outlineWidth: 3,
  outlineOffset: 2,
} as const;

export function useFocusRing() {
  const [focused, setFocused] = useState(false);
  return {
    focused,
    focusProps: { onFocus: () => setFocused(true), onBlur: () => setFocused(false) },
  };
}
