import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { DownloadLink } from '@/components/ui/download-link';
import { FieldList } from '@/components/ui/field-list';
import { formatDateTime } from '@/components/ui/format';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { StateMark } from '@/components/ui/state-mark';
import { ErrorView, LoadingView } from '@/components/ui/status-views';
import { Heading, Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { spacing } from '@/constants/theme';
import { errorMessage } from '@/hooks/api-errors';
import {
  outboxAttachmentPath,
  useOutboxMessageQuery,
  useOutboxRetryMutation,
} from '@/hooks/queries/outbox';
import { useStudioQuery } from '@/hooks/queries/studio';
import { type OutboxMessage } from '@/shared/schemas/outbox';

import { defaultTimeZone, mailKindWords, outboxLook } from './mail-words';
import { MessageBody } from './message-body';

/** What happened to it, in a sentence, and the one thing to do about it. */
function Outcome({ message, timeZone }: { message: OutboxMessage; timeZone: string }) {
  const retry = useOutboxRetryMutation(message.id);
  const problem = retry.isError ? <Notice message={errorMessage(retry.error)} /> : null;
  if (message.state === 'sent') return null;
  if (message.state === 'failed') {
    return (
      <View style={styles.outcome}>
        <Notice
          testID="message-error"
          message={`This message was not sent. The mail server’s last answer: ${message.lastError ?? 'none'}`}
        />
        <View style={styles.start}>
          <Button
            testID="message-retry"
            label="Send again"
            busyLabel="Queuing…"
            busy={retry.isPending}
            onPress={() => retry.mutate()}
          />
        </View>
        {problem}
      </View>
    );
  }
  if (message.attempts === 0) {
    // Written to go later: a sale e-mail is held a couple of minutes, so sales recorded
    // together go as one message.
    const held =
      message.nextAttemptAt !== null &&
      Date.parse(message.nextAttemptAt) > Date.parse(message.createdAt)
        ? `Waiting to go at ${formatDateTime(message.nextAttemptAt, timeZone)}${message.kind === 'sale' ? ': sales recorded within a few minutes of each other go as one message.' : '.'}`
        : 'Waiting to go: it is sent in a moment.';
    return <Notice tone="info" testID="message-waiting" message={held} />;
  }
  const next = message.nextAttemptAt ? formatDateTime(message.nextAttemptAt, timeZone) : 'soon';
  return (
    <View style={styles.outcome}>
      <Notice
        testID="message-error"
        message={`Not sent yet: ${message.lastError ?? 'the mail server did not answer'}. Saggar tries again at ${next}.`}
      />
      <View style={styles.start}>
        <Button
          testID="message-retry"
          label="Try now"
          variant="secondary"
          busyLabel="Queuing…"
          busy={retry.isPending}
          onPress={() => retry.mutate()}
        />
      </View>
      {problem}
    </View>
  );
}

function MessageDetail({ message }: { message: OutboxMessage }) {
  const timeZone = useStudioQuery().data?.timeZone ?? defaultTimeZone;
  const when = (iso: string | null) => (iso ? formatDateTime(iso, timeZone) : '—');
  return (
    <>
      <View style={styles.heading}>
        <TextLink href="/mail" label="All sent mail" testID="message-back" />
        <StateMark look={outboxLook(message)} testID="message-state" />
        <Heading level={1} testID="message-subject">
          {message.subject}
        </Heading>
      </View>
      <Outcome message={message} timeZone={timeZone} />
      <Card>
        <FieldList
          items={[
            { label: 'From', value: message.from, testID: 'message-from' },
            { label: 'To', value: message.to, testID: 'message-to' },
            { label: 'About', value: mailKindWords[message.kind] },
            { label: 'Written', value: when(message.createdAt), testID: 'message-written' },
            { label: 'Sent', value: when(message.sentAt), testID: 'message-sent-at' },
            { label: 'Attempts', value: String(message.attempts), numeric: true },
            ...(message.messageId ? [{ label: 'Message-ID', value: message.messageId }] : []),
          ]}
        />
      </Card>
      {message.attachments.length > 0 ? (
        <View style={styles.section}>
          <Heading level={2}>Attached</Heading>
          <Text variant="small">
            Each file is made again from the studio’s records when you open it: if they have changed
            since it was sent, it shows them as they are now.
          </Text>
          <View style={styles.files}>
            {message.attachments.map((a) => (
              <DownloadLink
                key={a.index}
                href={outboxAttachmentPath(message.id, a.index)}
                fileName={a.filename}
                label={a.filename}
                testID={`message-attachment-${a.index}`}
              />
            ))}
          </View>
        </View>
      ) : null}
      <View style={styles.section}>
        <Heading level={2}>The message</Heading>
        <MessageBody text={message.text} html={message.html} testID="message-body" />
      </View>
    </>
  );
}

export function MailMessageScreen({ id }: { id: number }) {
  const message = useOutboxMessageQuery(id);
  return (
    <Screen testID="message-screen">
      {message.isPending ? (
        <LoadingView message="Fetching the message…" />
      ) : message.isError ? (
        <ErrorView error={message.error} onRetry={() => message.refetch()} />
      ) : (
        <MessageDetail message={message.data} />
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs, alignItems: 'flex-start' },
  outcome: { gap: spacing.md },
  start: { alignSelf: 'flex-start' },
  section: { gap: spacing.md },
  files: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
