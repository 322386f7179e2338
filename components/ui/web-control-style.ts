import { fonts, palette, radii, spacing, touchTarget } from '@/constants/theme';

/** The look of the browser's own controls (drop-downs, date inputs), matching the text fields. */
export const webControlStyle = {
  minHeight: touchTarget + 4,
  paddingLeft: spacing.md,
  paddingRight: spacing.md,
  borderWidth: 1,
  borderStyle: 'solid',
  borderColor: palette.outline,
  borderRadius: radii.md,
  backgroundColor: palette.surface,
  color: palette.ink,
  fontFamily: fonts.body,
  fontSize: 17,
  boxSizing: 'border-box',
  width: '100%',
} as const;
