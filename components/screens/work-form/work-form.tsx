import { type ReactNode } from 'react';
import {
  type Control,
  Controller,
  type Resolver,
  type SubmitHandler,
  useForm,
  useWatch,
} from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { FieldCell, FieldRow } from '@/components/ui/field-row';
import { serverErrors } from '@/components/ui/form-errors';
import { FormFooter } from '@/components/ui/form-footer';
import { MoneyField } from '@/components/ui/money-field';
import { NumberField } from '@/components/ui/number-field';
import { Heading, Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { spacing } from '@/constants/theme';
import { type FoodUse } from '@/shared/schemas/work';

import { ConeHint } from './cone-hint';
import { foodSafeNote } from './food-use-note';
import { type WorkField, workFieldFor, type WorkFormValues } from './work-form-values';

type FieldProps = {
  control: Control<WorkFormValues, unknown, object>;
  name: Exclude<WorkField, 'foodUse'>;
  label: string;
  hint?: string;
};

function PlainField({
  control,
  name,
  label,
  hint,
  multiline = false,
}: FieldProps & { multiline?: boolean }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <TextField
          ref={field.ref}
          testID={`work-${name}`}
          label={label}
          hint={hint}
          value={field.value}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
          multiline={multiline}
        />
      )}
    />
  );
}

function MeasureField({ control, name, label, unit }: FieldProps & { unit: string }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <NumberField
          ref={field.ref}
          testID={`work-${name}`}
          label={label}
          unit={unit}
          value={field.value}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}

function PriceField({ control, name, label, hint, currency }: FieldProps & { currency: string }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <MoneyField
          ref={field.ref}
          testID={`work-${name}`}
          label={label}
          hint={hint}
          currency={currency}
          value={field.value}
          onChangeText={field.onChange}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}

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

type WorkFormProps<Parsed extends object> = {
  mode: 'create' | 'update';
  defaultValues: WorkFormValues;
  resolver: Resolver<WorkFormValues, unknown, Parsed>;
  currency: string;
  /** Throws the server's error, which the form places on its fields. */
  onSubmit: (values: Parsed) => Promise<void>;
  submitLabel: string;
  busyLabel: string;
  /** Photos, shown between the fields and the button. */
  photos?: ReactNode;
  /** A problem after saving that is not about a field. */
  afterNotice?: ReactNode;
};

/** Every field of a work, grouped as a maker thinks of them; used to create and to edit. */
export function WorkForm<Parsed extends object>({
  mode,
  defaultValues,
  resolver,
  currency,
  onSubmit,
  submitLabel,
  busyLabel,
  photos,
  afterNotice,
}: WorkFormProps<Parsed>) {
  const { control, handleSubmit, setError, formState } = useForm<WorkFormValues, unknown, Parsed>({
    resolver,
    defaultValues,
  });
  const firing = useWatch({ control, name: 'firingTempC' });
  const foodUse = useWatch({ control, name: 'foodUse' });
  const plainControl = control as unknown as Control<WorkFormValues, unknown, object>;

  const save: SubmitHandler<Parsed> = async (values) => {
    try {
      await onSubmit(values);
    } catch (error) {
      const message = serverErrors(error, workFieldFor, (field, e) => setError(field, e));
      if (message !== null) setError('root.server', { message });
    }
  };
  const submit = handleSubmit(save);

  return (
    <View style={styles.form} role="form" aria-label={mode === 'create' ? 'New work' : 'Edit work'}>
      <Section title="The piece">
        <FieldRow>
          <FieldCell basis={160}>
            <PlainField
              control={plainControl}
              name="stockNumber"
              label="Stock number"
              hint={
                mode === 'create' ? 'The next in your pattern; change it if you like.' : undefined
              }
            />
          </FieldCell>
          <FieldCell basis={120}>
            <MeasureField control={plainControl} name="year" label="Year made" unit="" />
          </FieldCell>
        </FieldRow>
        <PlainField control={plainControl} name="title" label="Title" />
        <FieldRow>
          <FieldCell basis={180}>
            <PlainField control={plainControl} name="series" label="Series (optional)" />
          </FieldCell>
          <FieldCell basis={180}>
            <PlainField
              control={plainControl}
              name="category"
              label="Category (optional)"
              hint="Jar, bowl, vase…"
            />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Materials and firing">
        <FieldRow>
          <FieldCell basis={200}>
            <PlainField control={plainControl} name="clayBody" label="Clay body" />
          </FieldCell>
          <FieldCell basis={200}>
            <PlainField control={plainControl} name="glaze" label="Glaze" />
          </FieldCell>
        </FieldRow>
        <MeasureField
          control={plainControl}
          name="firingTempC"
          label="Firing temperature"
          unit="°C"
        />
        <ConeHint temperatureText={firing} />
        <FieldRow>
          <FieldCell basis={200}>
            <PlainField
              control={plainControl}
              name="atmosphere"
              label="Atmosphere"
              hint="Oxidation, reduction, soda…"
            />
          </FieldCell>
          <FieldCell basis={200}>
            <PlainField
              control={plainControl}
              name="kiln"
              label="Kiln type"
              hint="Electric, gas, wood…"
            />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Size and weight">
        <FieldRow>
          <FieldCell basis={140}>
            <MeasureField control={plainControl} name="heightMm" label="Height" unit="mm" />
          </FieldCell>
          <FieldCell basis={140}>
            <MeasureField control={plainControl} name="widthMm" label="Width" unit="mm" />
          </FieldCell>
          <FieldCell basis={140}>
            <MeasureField control={plainControl} name="depthMm" label="Depth" unit="mm" />
          </FieldCell>
          <FieldCell basis={140}>
            <MeasureField control={plainControl} name="weightG" label="Weight" unit="g" />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Price">
        <FieldRow>
          <FieldCell basis={180}>
            <PriceField
              control={plainControl}
              name="retailPrice"
              label="Retail price"
              hint="What a buyer pays, in pounds and pence."
              currency={currency}
            />
          </FieldCell>
          <FieldCell basis={180}>
            <PriceField
              control={plainControl}
              name="costPrice"
              label="Cost (optional)"
              hint="Never shown to venues."
              currency={currency}
            />
          </FieldCell>
        </FieldRow>
      </Section>

      <Section title="Food use and care">
        <Controller
          control={control}
          name="foodUse"
          render={({ field, fieldState }) => (
            <Choice
              testID="work-foodUse"
              label="Food use"
              options={foodUseOptions}
              value={field.value}
              onChange={field.onChange}
              error={fieldState.error?.message}
            />
          )}
        />
        <Text variant="small">
          {foodUse === 'food-safe'
            ? foodSafeNote
            : 'Shown and labelled as “decorative — not for food use”.'}
        </Text>
        <PlainField
          control={plainControl}
          name="careNotes"
          label="Care notes (optional)"
          hint="Printed on labels: washing, display, handling."
          multiline
        />
      </Section>

      <Section title="Notes">
        <PlainField
          control={plainControl}
          name="notes"
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
        onSubmit={submit}
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
