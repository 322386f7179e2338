import { StyleSheet } from 'react-native';

import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';

type MessageBodyProps = { text: string; html: string | null; testID: string };

/** Native: the plain-text part, which every message has. */
export function MessageBody({ text, testID }: MessageBodyProps) {
  return (
    <Card>
      <Text testID={testID} selectable style={styles.text}>
        {text}
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({ text: { flexShrink: 1 } });
