import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { useLeaveGuard } from '@/components/ui/form/use-leave-guard';
import { Screen } from '@/components/ui/screen';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { useToast } from '@/components/ui/toast';
import { spacing } from '@/constants/theme';
import { useWorkQuery, useWorkUpdateMutation } from '@/hooks/queries/works';

import { PhotoManager } from './photo-manager';
import { WorkForm } from './work-form';
import { workBinding, workValues } from './work-form-values';

export function WorkEditScreen({ id }: { id: number }) {
  const router = useRouter();
  const work = useWorkQuery(id);
  const update = useWorkUpdateMutation(id);
  const toast = useToast();
  const [dirty, setDirty] = useState(false);
  const guard = useLeaveGuard(dirty);
  const back = { pathname: '/works/[id]', params: { id: String(id) } } as const;

  return (
    <Screen testID="work-edit-screen">
      {work.isPending ? (
        <LoadingView message="Fetching the work…" />
      ) : work.isError ? (
        <ErrorView error={work.error} onRetry={() => work.refetch()} />
      ) : (
        <>
          <View style={styles.heading}>
            <TextLink href={back} label={`Back to ${work.data.title}`} dismissTo />
            <Heading level={1}>Edit {work.data.stockNumber}</Heading>
            <Text variant="small">
              Changes are saved when you press Save changes; photos save as you go.
            </Text>
          </View>
          <Card style={styles.photos}>
            <Heading level={2}>Photos</Heading>
            <PhotoManager work={work.data} />
          </Card>
          <WorkForm
            mode="update"
            defaultValues={workValues(work.data)}
            binding={workBinding('update', work.data.retailPrice.currency)}
            currency={work.data.retailPrice.currency}
            submitLabel="Save changes"
            busyLabel="Saving…"
            onDirtyChange={setDirty}
            onSubmit={async (values) => {
              const saved = await update.mutateAsync(values);
              guard.leave(() => {
                router.dismissTo(back);
                toast({ testID: 'work-saved', message: `Saved ‘${saved.title}’.` });
              });
            }}
          />
          {guard.prompt}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  photos: { gap: spacing.md },
});
