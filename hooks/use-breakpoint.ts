import { useWindowDimensions } from 'react-native';

import { wideBreakpoint } from '@/constants/theme';

/** `wide` from 768 px: side navigation and roomier layouts; below it, the phone layout. */
export function useBreakpoint(): { width: number; wide: boolean } {
  const { width } = useWindowDimensions();
  return { width, wide: width >= wideBreakpoint };
}
