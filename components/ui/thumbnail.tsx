import { Image } from 'expo-image';
import { StyleSheet, View } from 'react-native';

import { palette, radii } from '@/constants/theme';
import { type Photo } from '@/shared/schemas/work';

import { Text } from './text';

/** The cover photo, square; a quiet blank square with a word when there is none. */
export function Thumbnail({
  photos,
  size,
  label,
}: {
  photos: readonly Photo[];
  size: number;
  label: string;
}) {
  const cover = [...photos].sort((a, b) => a.position - b.position)[0];
  const box = { width: size, height: size };
  if (!cover) {
    return (
      <View style={[styles.blank, box]}>
        <Text variant="small" style={styles.blankText}>
          No photo
        </Text>
      </View>
    );
  }
  return (
    <Image
      source={{ uri: cover.thumbnailUrl }}
      accessibilityLabel={label}
      contentFit="cover"
      style={[styles.image, box]}
    />
  );
}

const styles = StyleSheet.create({
  image: { borderRadius: radii.md, backgroundColor: palette.sunken },
  blank: {
    borderRadius: radii.md,
    backgroundColor: palette.sunken,
    alignItems: 'center',
    justifyContent: 'center',
    padding: 4,
  },
  blankText: { fontSize: 12, lineHeight: 16, textAlign: 'center' },
});
