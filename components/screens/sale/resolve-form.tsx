import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { type z } from 'zod';

import { Button } from '@/components/ui/button';
import { bindForm } from '@/components/ui/form/binding';
import { dateCodec, textCodec } from '@/components/ui/form/codecs';
import { FormDate, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { FormFooter } from '@/components/ui/form-footer';
import { type AttachedPhoto, OnePhotoField } from '@/components/ui/one-photo-field';
import { Heading, Text } from '@/components/ui/text';
import { spacing } from '@/constants/theme';
import { useLinePhotoMutation } from '@/hooks/queries/sales';
import { type LineResolve, lineResolveSchema, type ResolveState } from '@/shared/schemas/sale';

import { dateProblem, type DateWindow } from './sale-rules';

/** The fields the form holds; the state and the photo are added when it is sent. */
const headerSchema = lineResolveSchema.pick({ on: true, note: true });
type ResolveValues = { on: string; note: string };
type ResolveBody = z.output<typeof headerSchema>;

/** How each way out reads in a form: its heading, the note's label, and the button. */
const words: Record<
  ResolveState,
  { heading: string; note: string; hint?: string; submit: string; noteRequired?: string }
> = {
  returned: {
    heading: 'Returned to the maker',
    note: 'Note (optional)',
    hint: 'How it went back: by hand, by carrier with a tracking number…',
    submit: 'Confirm the return',
  },
  damaged: {
    heading: 'Damaged',
    note: 'What happened',
    hint: 'What the damage is, where on the piece, and how it came about.',
    submit: 'Record the damage',
    noteRequired: 'Say what happened to the piece.',
  },
  lost: {
    heading: 'Lost',
    note: 'What is known',
    hint: 'When it was last seen, and who has been told.',
    submit: 'Record it as lost',
    noteRequired: 'Say what is known of the loss.',
  },
  withdrawn: {
    heading: 'Withdraw from this consignment',
    note: 'Note (optional)',
    hint: 'Why it comes off this consignment: a commission, another show…',
    submit: 'Withdraw the piece',
  },
};

function bindingFor(state: ResolveState, window: DateWindow) {
  const schema = headerSchema.superRefine((body, ctx) => {
    const problem = dateProblem(body.on, window);
    if (problem) ctx.addIssue({ code: 'custom', path: ['on'], message: problem });
  });
  const required = words[state].noteRequired;
  return bindForm<ResolveValues, ResolveBody>(schema, {
    on: { read: dateCodec, blank: { required: 'Enter the day.' } },
    note: { read: textCodec, ...(required ? { blank: { required } } : {}) },
  });
}

/**
 * A piece out that leaves the consignment other than by a sale: returned, damaged (with a photo
 * of the damage), lost or withdrawn. Confirmed with the day and a note.
 */
export function ResolveForm({
  state,
  lineId,
  window,
  testID,
  onSubmit,
  onCancel,
}: {
  state: ResolveState;
  lineId: number;
  window: DateWindow;
  testID: string;
  onSubmit: (body: LineResolve) => Promise<void>;
  onCancel: () => void;
}) {
  const upload = useLinePhotoMutation(lineId);
  const [photo, setPhoto] = useState<AttachedPhoto | null>(null);
  const { control, formState, submit } = useSchemaForm(bindingFor(state, window), {
    on: window.today,
    note: '',
  });
  const w = words[state];

  return (
    <View style={styles.form} role="form" aria-label={w.heading}>
      <Heading level={3}>{w.heading}</Heading>
      <FormDate control={control} name="on" testID={`${testID}-date`} label="On" />
      <FormText
        control={control}
        name="note"
        testID={`${testID}-note`}
        label={w.note}
        hint={w.hint}
        multiline
      />
      {state === 'damaged' ? (
        <OnePhotoField
          upload={upload}
          photo={photo}
          onChange={setPhoto}
          addLabel="Add a photo of the damage"
          imageLabel="Photo of the damage"
          testID={`${testID}-photo`}
        />
      ) : null}
      {state === 'damaged' || state === 'lost' ? (
        <Text variant="small">The consignment’s terms say who insures the piece at the venue.</Text>
      ) : null}
      <FormFooter
        name={testID}
        errors={formState.errors}
        submitLabel={w.submit}
        busyLabel="Saving…"
        busy={formState.isSubmitting || upload.isPending}
        onSubmit={submit((body) =>
          onSubmit({ state, ...body, photoFileId: photo?.fileId ?? null }),
        )}
        stretch
        aside={<Button label="Never mind" variant="quiet" onPress={onCancel} />}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
});
