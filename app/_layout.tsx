import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Stack } from 'expo-router';
import { useState } from 'react';

import { fontAssets, palette } from '@/constants/theme';
import { createQueryClient } from '@/hooks/query-config';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts(fontAssets);
  const [queryClient] = useState(createQueryClient);

  // Without its fonts the page would reflow once they arrive; a failed load falls back to system fonts.
  if (!fontsLoaded && !fontError) return null;

  return (
    <QueryClientProvider client={queryClient}>
      <Stack
        screenOptions={{ headerShown: false, contentStyle: { backgroundColor: palette.paper } }}
      />
    </QueryClientProvider>
  );
}
