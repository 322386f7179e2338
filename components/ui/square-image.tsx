import { Image } from 'expo-image';
import { StyleSheet, View } from 'react-native';

import { palette, radii } from '@/constants/theme';

import { Text } from './text';

/** A picture cropped square, or a quiet blank square saying there is none. */
export function SquareImage({
  uri,
  size,
  label,
}: {
  uri: string | null;
  size: number;
  label: string;
}) {
  const box = { width: size, height: size };
  if (uri === null) {
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
      source={{ uri }}
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
