import { Image } from 'expo-image';
import { StyleSheet, View } from 'react-native';

import { palette, radii, spacing } from '@/constants/theme';

import { Button } from './button';
import { Notice } from './notice';
import { StateGlyph } from './state-mark';
import { Text } from './text';

export type PhotoTile = { key: string; uri: string; label: string };

type PhotoStripProps = {
  photos: readonly PhotoTile[];
  onAdd: () => void;
  onMove: (key: string, offset: -1 | 1) => void;
  onMakeCover: (key: string) => void;
  onRemove: (key: string) => void;
  /** 0–1 while photos are being sent, null otherwise. */
  progress?: number | null;
  busy?: boolean;
  error?: string | null;
  testID: string;
};

function Progress({ value, testID }: { value: number; testID: string }) {
  const percent = Math.round(value * 100);
  return (
    <View style={styles.progress}>
      <Text variant="small" testID={`${testID}-progress-text`}>
        {percent < 100 ? `Sending photos… ${percent}%` : 'Photos sent; making thumbnails…'}
      </Text>
      <View
        testID={`${testID}-progress`}
        role="progressbar"
        aria-label="Photo upload"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        style={styles.track}
      >
        <View style={[styles.fill, { width: `${percent}%` }]} />
      </View>
    </View>
  );
}

/**
 * A work's photos, cover first: add several at once, move one earlier or later, make one the
 * cover, remove one. Works the same for photos already saved and ones still to be sent.
 */
export function PhotoStrip({
  photos,
  onAdd,
  onMove,
  onMakeCover,
  onRemove,
  progress = null,
  busy = false,
  error = null,
  testID,
}: PhotoStripProps) {
  return (
    <View testID={testID} style={styles.strip}>
      {error ? <Notice message={error} testID={`${testID}-error`} /> : null}
      {photos.length === 0 ? (
        <Text variant="small">No photos yet. The first one added becomes the cover.</Text>
      ) : (
        <View role="list" aria-label="Photos, cover first" style={styles.grid}>
          {photos.map((photo, index) => {
            const n = index + 1;
            return (
              <View
                key={photo.key}
                role="listitem"
                testID={`${testID}-tile-${index}`}
                style={styles.tile}
              >
                <Image
                  source={{ uri: photo.uri }}
                  accessibilityLabel={photo.label}
                  contentFit="cover"
                  style={styles.image}
                />
                {index === 0 ? (
                  <View style={styles.coverMark}>
                    <StateGlyph shape="square" color={palette.accent} />
                    <Text variant="label">Cover</Text>
                  </View>
                ) : (
                  <Text variant="small">{`Photo ${n}`}</Text>
                )}
                <View style={styles.controls}>
                  <Button
                    testID={`${testID}-earlier-${index}`}
                    label="Earlier"
                    accessibilityLabel={`Move photo ${n} earlier`}
                    variant="secondary"
                    disabled={busy || index === 0}
                    onPress={() => onMove(photo.key, -1)}
                  />
                  <Button
                    testID={`${testID}-later-${index}`}
                    label="Later"
                    accessibilityLabel={`Move photo ${n} later`}
                    variant="secondary"
                    disabled={busy || index === photos.length - 1}
                    onPress={() => onMove(photo.key, 1)}
                  />
                </View>
                <View style={styles.controls}>
                  {index > 0 ? (
                    <Button
                      testID={`${testID}-cover-${index}`}
                      label="Make cover"
                      accessibilityLabel={`Make photo ${n} the cover`}
                      variant="secondary"
                      disabled={busy}
                      onPress={() => onMakeCover(photo.key)}
                    />
                  ) : null}
                  <Button
                    testID={`${testID}-remove-${index}`}
                    label="Remove"
                    accessibilityLabel={`Remove photo ${n}`}
                    variant="quiet"
                    disabled={busy}
                    onPress={() => onRemove(photo.key)}
                  />
                </View>
              </View>
            );
          })}
        </View>
      )}
      {progress !== null ? <Progress value={progress} testID={testID} /> : null}
      <View style={styles.add}>
        <Button
          testID={`${testID}-add`}
          label="Add photos"
          variant="secondary"
          disabled={busy}
          onPress={onAdd}
        />
        <Text variant="small">
          JPEG, PNG, WebP, GIF, AVIF or TIFF, up to 15 MB each; choose several at once.
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  strip: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  tile: {
    flexGrow: 1,
    flexBasis: 140,
    maxWidth: 220,
    gap: spacing.sm,
    padding: spacing.sm,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: palette.hairline,
    backgroundColor: palette.surface,
  },
  image: {
    width: '100%',
    aspectRatio: 1,
    borderRadius: radii.md,
    backgroundColor: palette.sunken,
  },
  coverMark: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  controls: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  add: { gap: spacing.xs, alignItems: 'flex-start' },
  progress: { gap: spacing.xs },
  track: {
    height: 8,
    borderRadius: radii.round,
    backgroundColor: palette.sunken,
    overflow: 'hidden',
  },
  fill: { height: '100%', backgroundColor: palette.accent },
});
