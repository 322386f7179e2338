import { type ReactNode } from 'react';
import { type FieldErrors, type FieldValues } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

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
      <View style={styles.submit}>
        <Button
          testID={`${name}-submit`}
          label={submitLabel}
          busyLabel={busyLabel}
          busy={busy}
          onPress={onSubmit}
        />
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  submit: { alignSelf: 'flex-start' },
});
