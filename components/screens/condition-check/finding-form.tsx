import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { type z } from 'zod';

import { Button } from '@/components/ui/button';
import { bindForm } from '@/components/ui/form/binding';
import { choiceCodec, numberCodec, textCodec } from '@/components/ui/form/codecs';
import { FormChoice, FormNumber, FormSelect, FormText } from '@/components/ui/form/fields';
import { useSchemaForm } from '@/components/ui/form/use-schema-form';
import { type AttachedPhoto, OnePhotoField } from '@/components/ui/one-photo-field';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';
import { useConditionPhotoMutation } from '@/hooks/queries/consignments';
import { findingKindWords } from '@/shared/condition/words';
import {
  type FindingGrade,
  findingInputSchema,
  type FindingKind,
  findingKinds,
} from '@/shared/schemas/condition';

/** A finding as the check holds it before it is sent, with its photo's address to show it. */
export type DraftFinding = {
  kind: FindingKind;
  grade: FindingGrade;
  location: string | null;
  sizeMm: number | null;
  notes: string | null;
  photoFileId: number | null;
  photoUrl: string | null;
};

type FindingValues = {
  kind: FindingKind;
  grade: FindingGrade;
  location: string;
  sizeMm: string;
  notes: string;
};

const findingBinding = bindForm<FindingValues, z.output<typeof findingInputSchema>>(
  findingInputSchema,
  {
    kind: { read: choiceCodec },
    grade: { read: choiceCodec },
    location: { read: textCodec },
    sizeMm: { read: numberCodec },
    notes: { read: textCodec },
  },
);

const emptyFinding: FindingValues = {
  kind: 'chip',
  grade: 'slight',
  location: '',
  sizeMm: '',
  notes: '',
};

const gradeOptions = [
  { value: 'slight', label: 'Slight' },
  { value: 'marked', label: 'Marked' },
  { value: 'serious', label: 'Serious' },
];

/** One thing found on a piece: what, how serious, where, how big, and a photo of it. */
export function FindingForm({
  testID,
  onAdd,
  onCancel,
}: {
  testID: string;
  onAdd: (finding: DraftFinding) => void;
  onCancel: () => void;
}) {
  const upload = useConditionPhotoMutation();
  const [photo, setPhoto] = useState<AttachedPhoto | null>(null);
  const { control, submit } = useSchemaForm(findingBinding, emptyFinding);
  const field = { control } as const;

  return (
    <View style={styles.form} role="group" aria-label="A finding">
      <FormSelect
        {...field}
        name="kind"
        testID={`${testID}-kind`}
        label="What"
        options={findingKinds.map((kind) => ({ value: kind, label: findingKindWords[kind] }))}
      />
      <FormChoice
        {...field}
        name="grade"
        testID={`${testID}-grade`}
        label="How serious"
        options={gradeOptions}
      />
      <FormText
        {...field}
        name="location"
        testID={`${testID}-location`}
        label="Where on the piece (optional)"
        hint="Rim, foot ring, handle, inside…"
      />
      <FormNumber
        {...field}
        name="sizeMm"
        testID={`${testID}-size`}
        label="Size (optional)"
        unit="mm"
      />
      <FormText
        {...field}
        name="notes"
        testID={`${testID}-notes`}
        label="Notes (optional)"
        multiline
      />
      <OnePhotoField
        upload={upload}
        photo={photo}
        onChange={setPhoto}
        addLabel="Add a photo"
        imageLabel="Photo of the finding"
        testID={`${testID}-photo`}
      />
      <View style={styles.buttons}>
        <Button
          testID={`${testID}-add`}
          label="Add this finding"
          disabled={upload.isPending}
          onPress={submit(async (finding) => {
            onAdd({
              kind: finding.kind,
              grade: finding.grade,
              location: finding.location ?? null,
              sizeMm: finding.sizeMm ?? null,
              notes: finding.notes ?? null,
              photoFileId: photo?.fileId ?? null,
              photoUrl: photo?.url ?? null,
            });
          })}
        />
        <Button label="Never mind" variant="quiet" onPress={onCancel} />
      </View>
      <Text variant="small">The overall grade of a check is that of its most serious finding.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  form: {
    gap: spacing.md,
    padding: spacing.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: palette.hairline,
    backgroundColor: palette.paper,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});

/** A recorded finding as the start of a later check: the same kind, grade, place and photo. */
export function draftFrom(finding: {
  kind: FindingKind;
  grade: FindingGrade;
  location: string | null;
  sizeMm: number | null;
  notes: string | null;
  photoUrl: string | null;
}): DraftFinding {
  const fileId = finding.photoUrl ? Number(/(\d+)$/.exec(finding.photoUrl)?.[1]) : NaN;
  return {
    kind: finding.kind,
    grade: finding.grade,
    location: finding.location,
    sizeMm: finding.sizeMm,
    notes: finding.notes,
    photoFileId: Number.isInteger(fileId) ? fileId : null,
    photoUrl: finding.photoUrl,
  };
}
