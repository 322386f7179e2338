import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { type z } from 'zod';

import { Button } from '@/components/ui/button';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { bindForm } from '@/components/ui/form/binding';
import { dateCodec, textCodec } from '@/components/ui/form/codecs';
import { FormDate, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { reportHeaderSchema } from '@/shared/schemas/condition';

import { type DraftFinding, FindingForm } from './finding-form';
import { FindingsList } from './findings-list';
import { today } from './today';

type HeaderValues = { examinerName: string; examinedOn: string; notes: string };
export type CheckHeader = z.output<typeof reportHeaderSchema>;

const headerBinding = bindForm<HeaderValues, CheckHeader>(reportHeaderSchema, {
  examinerName: { read: textCodec, blank: { required: 'Enter who examined the piece.' } },
  examinedOn: { read: dateCodec, blank: { required: 'Enter the day of the check.' } },
  notes: { read: textCodec },
});

type CheckFormProps = {
  testID: string;
  examinerName: string;
  /** Where the findings start: none at dispatch, the dispatch check's on arrival. */
  startFrom: readonly DraftFinding[];
  submitLabel: string;
  onSubmit: (check: CheckHeader & { findings: DraftFinding[] }) => Promise<void>;
  onCancel?: () => void;
};

/**
 * One piece's condition check: who and when, each finding with its photo, and notes. In good
 * light, before and after every move (Collections Trust, Spectrum, "Condition checking").
 */
export function CheckForm({
  testID,
  examinerName,
  startFrom,
  submitLabel,
  onSubmit,
  onCancel,
}: CheckFormProps) {
  const [findings, setFindings] = useState<DraftFinding[]>([...startFrom]);
  const [adding, setAdding] = useState(false);
  const { control, formState, submit } = useSchemaForm(headerBinding, {
    examinerName,
    examinedOn: today(),
    notes: '',
  });
  const field = { control } as const;
  return (
    <View style={styles.form} role="form" aria-label="Condition check">
      <FieldRow>
        <FieldCell basis={200}>
          <FormText
            {...field}
            name="examinerName"
            testID={`${testID}-examiner`}
            label="Examined by"
          />
        </FieldCell>
        <FieldCell basis={180}>
          <FormDate {...field} name="examinedOn" testID={`${testID}-date`} label="On" />
        </FieldCell>
      </FieldRow>
      <Text variant="label">Findings</Text>
      <FindingsList
        testID={`${testID}-findings`}
        findings={findings}
        onRemove={(index) => setFindings((all) => all.filter((_, i) => i !== index))}
      />
      {adding ? (
        <FindingForm
          testID={`${testID}-finding`}
          onAdd={(finding) => {
            setFindings((all) => [...all, finding]);
            setAdding(false);
          }}
          onCancel={() => setAdding(false)}
        />
      ) : (
        <View style={styles.start}>
          <Button
            testID={`${testID}-add-finding`}
            label="Add a finding"
            variant="secondary"
            onPress={() => setAdding(true)}
          />
        </View>
      )}
      <FormText
        {...field}
        name="notes"
        testID={`${testID}-notes`}
        label="Notes (optional)"
        multiline
      />
      <FormFooter
        name={testID}
        errors={formState.errors}
        submitLabel={submitLabel}
        busyLabel="Saving the check…"
        busy={formState.isSubmitting}
        onSubmit={submit((header) => onSubmit({ ...header, findings }))}
      >
        {onCancel ? (
          <Button label="Close without saving" variant="quiet" onPress={onCancel} />
        ) : null}
      </FormFooter>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  start: { alignSelf: 'flex-start' },
});
