import { Image } from 'expo-image';
import { StyleSheet, View } from 'react-native';

import { EmptyView } from '@/components/ui/status-views';
import { palette, radii, spacing } from '@/constants/theme';
import { useBreakpoint } from '@/hooks/use-breakpoint';
import { type Work } from '@/shared/schemas/work';

/** The photographs, given room: the cover large, the rest beside or under it. */
export function WorkPhotos({ work }: { work: Work }) {
  const { wide } = useBreakpoint();
  const photos = [...work.photos].sort((a, b) => a.position - b.position);
  const [cover, ...rest] = photos;
  if (!cover) {
    return (
      <EmptyView
        title="No photos yet"
        message="Add photos from Edit; the first one is the cover."
      />
    );
  }
  return (
    <View testID="work-gallery" style={[styles.gallery, wide && styles.galleryWide]}>
      <Image
        testID="work-cover"
        source={{ uri: cover.url }}
        accessibilityLabel={`${work.title}, cover photo`}
        contentFit="cover"
        style={[styles.cover, wide && styles.coverWide]}
      />
      {rest.length > 0 ? (
        <View style={[styles.rest, wide && styles.restWide]}>
          {rest.map((photo, index) => (
            <Image
              key={photo.id}
              source={{ uri: photo.url }}
              accessibilityLabel={`${work.title}, photo ${index + 2}`}
              contentFit="cover"
              style={styles.more}
            />
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  gallery: { gap: spacing.md },
  galleryWide: { flexDirection: 'row', alignItems: 'flex-start' },
  cover: {
    width: '100%',
    aspectRatio: 1,
    borderRadius: radii.lg,
    backgroundColor: palette.sunken,
  },
  coverWide: { width: 520, maxWidth: '65%' },
  rest: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  restWide: { flex: 1 },
  more: { width: 150, aspectRatio: 1, borderRadius: radii.md, backgroundColor: palette.sunken },
});
