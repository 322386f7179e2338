import { type CSSProperties, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '@/components/ui/card';
import { Choice } from '@/components/ui/choice';
import { Text } from '@/components/ui/text';
import { palette, radii, spacing } from '@/constants/theme';

type MessageBodyProps = { text: string; html: string | null; testID: string };
type BodyView = 'html' | 'text';

const views: { value: BodyView; label: string }[] = [
  { value: 'html', label: 'As sent' },
  { value: 'text', label: 'Plain text' },
];

/** Links in the message open in a new tab, never inside the frame. */
function withNewTabLinks(html: string): string {
  const base = '<base target="_blank">';
  return /<head[^>]*>/i.test(html) ? html.replace(/<head[^>]*>/i, (h) => h + base) : base + html;
}

const inlinePicture = /(<img\b[^>]*?)\s+src\s*=\s*(["'])cid:[^"']*\2/gi;

/**
 * Pictures carried inside the message (`cid:`) are its attachments, which the page lists below:
 * the frame shows their descriptions instead of asking for addresses that lead nowhere.
 */
function withoutInlinePictures(html: string): string {
  return html.replace(inlinePicture, '$1');
}

/**
 * Web: the HTML part as the recipient sees it, in a sandboxed frame (no scripts, no forms, an
 * origin of its own, so the message can neither run nor reach the app), or the plain-text part.
 */
export function MessageBody({ text, html, testID }: MessageBodyProps) {
  const [view, setView] = useState<BodyView>(html ? 'html' : 'text');
  return (
    <View style={styles.stack}>
      {html ? (
        <Choice
          label="Show the message"
          options={views}
          value={view}
          onChange={setView}
          testID={`${testID}-view`}
        />
      ) : null}
      {html && view === 'html' ? (
        <iframe
          title="The message as it was sent"
          data-testid={`${testID}-html`}
          sandbox="allow-popups allow-popups-to-escape-sandbox"
          referrerPolicy="no-referrer"
          srcDoc={withNewTabLinks(withoutInlinePictures(html))}
          style={frameStyle}
        />
      ) : (
        <Card>
          <Text testID={testID} selectable>
            {text}
          </Text>
        </Card>
      )}
    </View>
  );
}

const frameStyle: CSSProperties = {
  width: '100%',
  height: 560,
  border: `1px solid ${palette.hairline}`,
  borderRadius: radii.lg,
  backgroundColor: palette.surface,
  boxSizing: 'border-box',
};

const styles = StyleSheet.create({ stack: { gap: spacing.md } });
