import { type CSSProperties } from 'react';

import { fonts, palette, radii, spacing, touchTarget } from '@/constants/theme';

type DownloadLinkProps = { href: string; fileName: string; label: string; testID: string };

/** A real link with `download`, so the browser saves the file with the session cookie. */
export function DownloadLink({ href, fileName, label, testID }: DownloadLinkProps) {
  return (
    <a href={href} download={fileName} data-testid={testID} style={linkStyle}>
      {label}
    </a>
  );
}

const linkStyle: CSSProperties = {
  minHeight: touchTarget,
  boxSizing: 'border-box',
  display: 'inline-flex',
  alignItems: 'center',
  justifyContent: 'center',
  paddingLeft: spacing.lg,
  paddingRight: spacing.lg,
  border: `1px solid ${palette.outline}`,
  borderRadius: radii.md,
  backgroundColor: palette.surface,
  color: palette.ink,
  fontFamily: fonts.bodyStrong,
  fontSize: 15,
  textDecoration: 'none',
};
