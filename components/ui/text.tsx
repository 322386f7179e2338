import { type ReactNode } from 'react';
import { StyleSheet, Text as NativeText, type TextProps as NativeTextProps } from 'react-native';

import { typeScale, type TypeVariant } from '@/constants/theme';

import { webAria } from './web-aria';

export type TextProps = NativeTextProps & { variant?: TypeVariant; children?: ReactNode };

/** Text in the product's type scale; body text unless a variant says otherwise. */
export function Text({ variant = 'body', style, ...props }: TextProps) {
  return <NativeText {...props} style={[typeScale[variant], style]} />;
}

const headingVariants = { 1: 'title', 2: 'heading', 3: 'subheading' } as const;

/** A heading in Literata, exposed to assistive technology with its level (h1, h2, h3 on the web). */
export function Heading({ level = 1, style, ...props }: NativeTextProps & { level?: 1 | 2 | 3 }) {
  return (
    <NativeText
      role="heading"
      {...webAria({ 'aria-level': level })}
      {...props}
      style={[typeScale[headingVariants[level]], styles.heading, style]}
    />
  );
}

const styles = StyleSheet.create({
  heading: { marginBottom: 0 },
});
