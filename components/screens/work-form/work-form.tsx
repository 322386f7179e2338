import { type ReactNode, useEffect } from 'react';
import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { type FormBinding } from '@/components/ui/form/binding';
import {
  FormChoice,
  FormMeasure,
  FormMoney,
  FormNumber,
  FormText,
} from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { type FoodUse } from '@/shared/schemas/work';
import { foodSafeNote } from '@/shared/works/food-use';

import { ConeHint } from './cone-hint';
import { type WorkFormValues } from './work-form-values';

const foodUseOptions: { value: FoodUse; label: string }[] = [
  { value: 'food-safe', label: 'Food-safe (my declaration)' },
  { value: 'decorative', label: 'Decorative only' },
  { value: 'not-stated', label: 'Not stated' },
];

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <Card style={styles.section}>
      <Heading level={2}>{title}</Heading>
      {children}
    </Card>
  );
}

type WorkFormProps<Parsed> = {
  mode: 'create' | 'update';
  defaultValues: WorkFormValues;
  binding: FormBinding<WorkFormValues, Parsed>;
  currency: string;
  /** Throws the server's error, which the form places on its fields. */
  onSubmit: (values: Parsed) => Promise<void>;
  submitLabel: string;
  busyLabel: string;
  /** Photos, shown between the fields and the button. */
  photos?: ReactNode;
  /** A problem after saving that is not about a field. */
  afterNotice?: ReactNode;
  /** Told whenever the fields come to differ from what they started as, or stop differing. */
  onDirtyChange?: (dirty: boolean) => void;
};

/** Every field of a work, grouped as a maker thinks of them; used to create and to edit. */
export function WorkForm<Parsed>({
  mode,
  defaultValues,
  binding,
  currency,
  onSubmit,
  submitLabel,
  busyLabel,
  photos,
  afterNotice,
  onDirtyChange,
}: WorkFormProps<Parsed>) {
  const { control, formState, submit } = useSchemaForm(binding, defaultValues);
  const dirty = formState.isDirty;
  useEffect(() => onDirtyChange?.(dirty), [dirty, onDirtyChange]);
  const firing = useWatch({ control, name: 'firingTempC' });
  const foodUse = useWatch({ control, name: 'foodUse' });
  const field = { control } as const;

  return (
    <View style={styles.form} role="form" aria-label={mode === 'create' ? 'New work' : 'Edit work'}>
      <Section title="The piece">
        <FieldRow>
          <FieldCell basis={160}>
            <FormText
              {...field}
              name="stockNumber"
              testID="work-stockNumber"
              label="Stock number"
              hint={
                mode === 'create' ? 'The next in your pattern; change it if you like.' : undefined
              }
            />
          </FieldCell>
          <FieldCell basis={120}>
            <FormNumber {...field} name="year" testID="work-year" label="Year made" unit="" />
          </FieldCell>
        </FieldRow>
        <FormText {...field} name="title" testID="work-title" label="Title" />
        <FieldRow>
          <FieldCell basis={180}>
            <FormText {...field} name="series" testID="work-series" label="Series (optional)" />
          </FieldCell>
          <FieldCell basis={180}>
            <FormText
              {...field}
              name="category"
              testID="work-category"
              label="Category (optional)"
              hint="Jar, bowl, vase…"
            />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Materials and firing">
        <FieldRow>
          <FieldCell basis={200}>
            <FormText {...field} name="clayBody" testID="work-clayBody" label="Clay body" />
          </FieldCell>
          <FieldCell basis={200}>
            <FormText {...field} name="glaze" testID="work-glaze" label="Glaze" />
          </FieldCell>
        </FieldRow>
        <FormNumber
          {...field}
          name="firingTempC"
          testID="work-firingTempC"
          label="Firing temperature"
          unit="°C"
        />
        <ConeHint temperatureText={firing} />
        <FieldRow>
          <FieldCell basis={200}>
            <FormText
              {...field}
              name="atmosphere"
              testID="work-atmosphere"
              label="Atmosphere"
              hint="Oxidation, reduction, soda…"
            />
          </FieldCell>
          <FieldCell basis={200}>
            <FormText
              {...field}
              name="kiln"
              testID="work-kiln"
              label="Kiln type"
              hint="Electric, gas, wood…"
            />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Size and weight">
        <Text variant="small">
          Type the unit you measured in, such as 14 cm or 1.2 kg; a number alone is in mm or g.
        </Text>
        <FieldRow>
          <FieldCell basis={140}>
            <FormMeasure
              {...field}
              name="heightMm"
              testID="work-heightMm"
              label="Height"
              unit="mm"
            />
          </FieldCell>
          <FieldCell basis={140}>
            <FormMeasure {...field} name="widthMm" testID="work-widthMm" label="Width" unit="mm" />
          </FieldCell>
          <FieldCell basis={140}>
            <FormMeasure {...field} name="depthMm" testID="work-depthMm" label="Depth" unit="mm" />
          </FieldCell>
          <FieldCell basis={140}>
            <FormMeasure {...field} name="weightG" testID="work-weightG" label="Weight" unit="g" />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Price">
        <FieldRow>
          <FieldCell basis={180}>
            <FormMoney
              {...field}
              name="retailPrice"
              testID="work-retailPrice"
              label="Retail price"
              hint={`What a buyer pays, in ${currency}.`}
              currency={currency}
            />
          </FieldCell>
          <FieldCell basis={180}>
            <FormMoney
              {...field}
              name="costPrice"
              testID="work-costPrice"
              label="Cost (optional)"
              hint="Never shown to venues."
              currency={currency}
            />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Food use and care">
        <FormChoice
          {...field}
          name="foodUse"
          testID="work-foodUse"
          label="Food use"
          options={foodUseOptions}
        />
        <Text variant="small">
          {foodUse === 'food-safe'
            ? foodSafeNote
            : 'Shown and labelled as “decorative — not for food use”.'}
        </Text>
        <FormText
          {...field}
          name="careNotes"
          testID="work-careNotes"
          label="Care notes (optional)"
          hint="Printed on labels: washing, display, handling."
          multiline
        />
      </Section>

      <Section title="Notes">
        <FormText
          {...field}
          name="notes"
          testID="work-notes"
          label="Notes for the studio (optional)"
          multiline
        />
      </Section>

      {photos}

      <FormFooter
        name="work"
        errors={formState.errors}
        submitLabel={submitLabel}
        busyLabel={busyLabel}
        busy={formState.isSubmitting}
        onSubmit={submit(onSubmit)}
      >
        {afterNotice}
      </FormFooter>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  section: { gap: spacing.md },
});
