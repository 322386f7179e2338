import { type ReactNode } from 'react';
import { type FieldErrors, type FieldValues } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { spacing } from '@/constants/theme';

import { Button } from './button';
import { Notice } from './notice';

type FormFooterProps = {
  /** Prefix of the testIDs: `<prefix>-form-error`, `<prefix>-form-fields`, `<prefix>-submit`. */
  name: string;
  errors: FieldErrors<FieldValues>;
  submitLabel: string;
  busyLabel: string;
  busy: boolean;
  onSubmit: () => void;
  /** Shown between the notices and the button, e.g. what happens to photos on save. */
  children?: ReactNode;
  /** Beside the button, e.g. a way to close the form without saving. */
  aside?: ReactNode;
  /**
   * The button as wide as the form (phone-first forms used one-handed, such as a sale at the
   * counter), with `aside` under it.
   */
  stretch?: boolean;
};

/**
 * The end of a form: the server's form-level message, or a count of fields that need another
 * look (their messages sit by them), then the submit button.
 */
export function FormFooter({
  name,
  errors,
  submitLabel,
  busyLabel,
  busy,
  onSubmit,
  children,
  aside,
  stretch = false,
}: FormFooterProps) {
  const formError = errors.root?.server?.message;
  const fieldCount = Object.keys(errors).filter((key) => key !== 'root').length;
  const one = fieldCount === 1;
  return (
    <>
      {formError ? <Notice testID={`${name}-form-error`} message={formError} /> : null}
      {!formError && fieldCount > 0 ? (
        <Notice
          testID={`${name}-form-fields`}
          message={`${one ? 'One field needs' : `${fieldCount} fields need`} another look; see the messages by ${one ? 'it' : 'them'}.`}
        />
      ) : null}
      {children}
      <View style={stretch ? styles.stretched : styles.buttons}>
        <Button
          testID={`${name}-submit`}
          label={submitLabel}
          busyLabel={busyLabel}
          busy={busy}
          onPress={onSubmit}
          size={stretch ? 'large' : 'regular'}
        />
        {aside}
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  buttons: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.sm,
  },
  stretched: { alignSelf: 'stretch', gap: spacing.sm },
});
